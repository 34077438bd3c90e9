/** URLs of an activity's pages and downloads, of the kit builder preset for it, and of its data tools. */
import type { DataTool } from './activity-facets';
import type { Activity } from './activity-schema';

/** The kit builder, preset to a demo model and this activity. */
export function activityKitBuilderHref(modelId: string, slug: string): string {
  return `/kits/new?${new URLSearchParams({ model: modelId, activity: slug }).toString()}`;
}

export type ActivityPaper = 'letter' | 'a4';

/** The activity page, its data-sheet PDF and its teacher-guide PDF on the given paper. */
export function activityHrefs(slug: string, paper: ActivityPaper = 'letter') {
  const q = paper === 'letter' ? '' : `?paper=${paper}`;
  return {
    page: `/activities/${slug}`,
    dataSheetPdf: `/activities/${slug}/data-sheet.pdf${q}`,
    guidePdf: `/activities/${slug}/guide.pdf${q}`,
  };
}

/** The paper for a kit's printouts: A4 for a kit on an ISO A sheet (A3, A4, A5), else Letter. */
export function activityPaperForSheet(sheetSizeId: string): ActivityPaper {
  return /^a\d$/.test(sheetSizeId) ? 'a4' : 'letter';
}

/** The paper a query string asks for; Letter unless it says a4. */
export function activityPaperFromQuery(params: URLSearchParams): ActivityPaper {
  return params.get('paper') === 'a4' ? 'a4' : 'letter';
}

/** The page of a data tool (one page per tool under /tools, named like the tool). */
export function dataToolHref(tool: DataTool): string {
  return `/tools/${tool}`;
}

/** The data tools an activity's records feed: the data sheet's tool first, then any other a column names. */
export function activityDataTools(activity: Pick<Activity, 'record'>): DataTool[] {
  const { tool, fields, columns } = activity.record;
  const named = [...fields, ...columns].map((c) => c.tool).filter((t): t is DataTool => t !== undefined);
  return [...new Set([tool, ...named])];
}
