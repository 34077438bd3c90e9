/**
 * The fast path of a printed live link in the server entry: GET or HEAD `/go/CODE` of a live code is answered here
 * with the 302 to its current target, counting the scan (src/lib/db/live-links.ts), before static files,
 * compression and Astro. A profile of `npm run bench:links` showed Astro's page pipeline (render context, the
 * CSP digest it computes for every page, the middleware) and the compression wrapper taking most of a redirect's
 * time while the database waited on the app. The answer carries what the middleware would stamp on it (the
 * security headers, a request id).
 *
 * Anything else goes on to Astro: another method, an unknown or retired code (src/pages/go/[code].astro shows
 * the friendly page), and a failed query, which the page repeats so that a database error is logged and answered
 * in the one place that does so (a failed statement counted nothing).
 */
import type { IncomingMessage, ServerResponse } from 'node:http';
import { liveLinkScan } from '../lib/db/live-links';
import { requestIdNew } from '../lib/http/request-id';
import { linkCodeFromTarget, linkLocation } from '../lib/links/link-code';

/**
 * Answers a live link's scan, or calls `next` (at once when the request is not one: no promise in the way of the
 * other routes); `headers` are the security headers every page carries.
 */
export function liveLinkRedirect(
  req: IncomingMessage,
  res: ServerResponse,
  headers: Record<string, string>,
  next: () => void,
): void {
  const code = req.method === 'GET' || req.method === 'HEAD' ? linkCodeFromTarget(req.url ?? '') : null;
  if (!code) return next();
  liveLinkScan(code).then(
    (target) => {
      if (!target) return next();
      res.writeHead(302, {
        ...headers,
        location: linkLocation(target),
        'cache-control': 'no-store',
        // No body: a length of 0 spares the chunked encoding's terminating chunk.
        'content-length': '0',
        'x-request-id': requestIdNew(),
      });
      res.end();
    },
    () => next(),
  );
}
