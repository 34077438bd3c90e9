/** URLs of an activity's pages and downloads, and of the kit builder preset for it. */

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
