/**
 * A saved kit as the API answers it and the pages show it, and the URLs of its page and downloads. Plain
 * data and string building only, so islands can import it.
 */
import type { KitForm } from './kit-settings';

export interface KitView {
  id: string;
  title: string;
  classId: string;
  className: string;
  modelId: string;
  modelTitle: string;
  activitySlug: string | null;
  /** The settings the kit was built from (the model is named by modelId). */
  settings: Omit<KitForm, 'modelId'>;
  scaleDenominator: number;
  sheetSizeId: string;
  copies: number;
  sheetCount: number;
  engineVersion: string;
  /** False when the engine changed since the kit was saved: its files now come out of the newer engine. */
  engineCurrent: boolean;
  contentHash: string;
  createdAt: string;
  updatedAt: string;
  links: KitLinks;
}

export interface KitLinks {
  page: string;
  handout: string;
  pdf: string;
  stl: string;
  stlAscii: string;
  json: string;
  /** One SVG per sheet, in order. */
  svgSheets: string[];
}

/** The page and download URLs of a kit with this id and number of sheets. */
export function kitLinks(id: string, sheetCount: number): KitLinks {
  const api = `/api/kits/${id}`;
  return {
    page: `/kits/${id}`,
    handout: `/kits/${id}/handout`,
    pdf: `${api}.pdf`,
    stl: `${api}.stl`,
    stlAscii: `${api}.stl?format=ascii`,
    json: `${api}.json`,
    svgSheets: Array.from({ length: sheetCount }, (_, i) => `${api}.svg?sheet=${i + 1}`),
  };
}
