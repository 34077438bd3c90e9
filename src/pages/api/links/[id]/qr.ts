import QRCode from 'qrcode';
import { STAFF } from '../../../../lib/auth/actor';
import { siteUrl } from '../../../../lib/auth/site-url';
import { liveLinkById } from '../../../../lib/db/live-links';
import { NotFoundError } from '../../../../lib/errors';
import { endpoint } from '../../../../lib/http/endpoint';
import { linkAddress, LINK_QR_ERROR_CORRECTION } from '../../../../lib/links/link-code';

/** The link's QR code as SVG (default) or PNG (?format=png), encoding the short /go/CODE address (staff). */
export const GET = endpoint({ access: STAFF }, async ({ params, url }) => {
  const link = await liveLinkById(params.id ?? '');
  if (!link) throw new NotFoundError('No live link has this id.');
  const address = linkAddress(siteUrl(url), link.code);
  const options = { errorCorrectionLevel: LINK_QR_ERROR_CORRECTION, margin: 4 } as const;
  const headers = { 'cache-control': 'no-store', 'content-disposition': `inline; filename="${link.code}"` };
  if (url.searchParams.get('format') === 'png') {
    const png = await QRCode.toBuffer(address, { ...options, type: 'png', width: 1024 });
    return new Response(new Uint8Array(png), { headers: { ...headers, 'content-type': 'image/png' } });
  }
  const svg = await QRCode.toString(address, { ...options, type: 'svg' });
  return new Response(svg, { headers: { ...headers, 'content-type': 'image/svg+xml' } });
});
