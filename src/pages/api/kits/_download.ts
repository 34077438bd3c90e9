import { siteUrl } from '../../../lib/auth/site-url';
import type { KitOutput } from '../../../lib/kit/build-kit';
import { kitFileResponse } from '../../../lib/kit/kit-files.server';
import { kitOutputBuild } from '../../../lib/kit/kit-build.server';
import { kitQrUrl, kitRequestForRow, kitVisible } from '../../../lib/kit/saved-kit.server';
import { endpoint } from '../../../lib/http/endpoint';
import type { RequestContext } from '../../../lib/http/request-context';
import { KIT_VIEWERS } from './_access';

/**
 * A GET route serving one file of a saved kit, rebuilt from its inputs (or cached by content hash). The QR code
 * prints the kit's own /go/CODE address, so the paper keeps working when the link is re-targeted; the kit page's
 * once that link is retired.
 */
export function kitDownloadRoute(output: KitOutput) {
  return endpoint({ access: KIT_VIEWERS }, async (context: RequestContext) => {
    const row = await kitVisible(context.locals.actor, context.params.id ?? '');
    const request = { ...(await kitRequestForRow(row)), qrUrl: await kitQrUrl(row, siteUrl(context.url)) };
    const { build } = await kitOutputBuild(request, output, { signal: context.request.signal });
    const q = context.url.searchParams;
    return kitFileResponse(context.request, request, build, output, {
      ...(output === 'svg' ? { sheet: q.get('sheet') } : {}),
      ...(output === 'stl' ? { stlFormat: q.get('format') === 'ascii' ? 'ascii' : 'binary' } : {}),
      disposition: q.get('inline') === '1' ? 'inline' : 'attachment',
    });
  });
}
