import type { APIRoute } from 'astro';
import { activityBySlug } from '../../../lib/activities/activity-store.server';
import { activityPaperFromQuery } from '../../../lib/activities/activity-links';
import { dataSheetPdf } from '../../../lib/activities/data-sheet-pdf';
import { kitFonts } from '../../../lib/kit/fonts.server';

/** The student data sheet of an activity; ?paper=a4 for A4, Letter otherwise. */
export const GET: APIRoute = async ({ params, url, rewrite }) => {
  const entry = await activityBySlug(params.slug);
  // Unknown slug: the site's 404 page, with status 404.
  if (!entry) return rewrite('/404');
  const paper = activityPaperFromQuery(url.searchParams);
  const bytes = dataSheetPdf(entry.data, await kitFonts(), paper);
  return new Response(bytes, {
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': `inline; filename="${entry.data.slug}-data-sheet-${paper}.pdf"`,
      'cache-control': 'public, max-age=300',
    },
  });
};
