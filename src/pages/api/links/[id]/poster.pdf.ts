import { STAFF } from '../../../../lib/auth/actor';
import { siteUrl } from '../../../../lib/auth/site-url';
import { liveLinkById } from '../../../../lib/db/live-links';
import { NotFoundError } from '../../../../lib/errors';
import { endpoint } from '../../../../lib/http/endpoint';
import { kitFonts } from '../../../../lib/kit/fonts.server';
import { linkAddress } from '../../../../lib/links/link-code';
import { linkPosterPdf, LinkPrintQuerySchema } from '../../../../lib/links/link-poster-pdf';
import { parseInput } from '../../../../lib/validation';

/**
 * The link printed as a sheet of bookmarks or a poster (?format=bookmark|poster, ?paper= one of LINK_PRINT_PAPERS,
 * Letter by default; staff).
 */
export const GET = endpoint({ access: STAFF }, async ({ params, url }) => {
  const query = parseInput(LinkPrintQuerySchema, Object.fromEntries(url.searchParams), 'print query');
  const link = await liveLinkById(params.id ?? '');
  if (!link) throw new NotFoundError('No live link has this id.');
  const address = linkAddress(siteUrl(url), link.code);
  const bytes = linkPosterPdf(
    { title: link.title, address, code: link.code },
    query.format,
    query.paper,
    await kitFonts(),
  );
  return new Response(bytes, {
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': `attachment; filename="${link.code}-${query.format}-${query.paper}.pdf"`,
      'cache-control': 'no-store',
    },
  });
});
