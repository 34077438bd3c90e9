import type { KitSettingsLimits, KitForm } from './kit-settings';
import type { KitPreview, ScaleSolution } from './kit-preview.server';

/** Plain data the /kits/new page reads on the server and hands to the KitBuilder island. */
export interface KitBuilderProps {
  models: { id: string; title: string; summary: string }[];
  /** The imported models the account may build (its own and shared ones), listed after the demo models. */
  imports: { id: string; title: string; summary: string }[];
  activities: { slug: string; title: string; models: string[] }[];
  /** The teacher's own classes (empty for staff, who cannot save). */
  classes: { id: string; name: string; gradeBand: string }[];
  sheetSizes: { id: string; label: string }[];
  venues: { id: string; label: string }[];
  /** Preset print beds for the STL. */
  printBeds: { id: string; label: string }[];
  usualScales: number[];
  limits: KitSettingsLimits;
  initial: KitForm;
  initialPreview: KitPreview | null;
  initialSolve: ScaleSolution | null;
  /** Message when the first preview could not be built on the server. */
  initialError: string | null;
  /** The class the builder starts from (its grade band; the save panel's class), or null (the default band). */
  gradeClassId: string | null;
}
