/**
 * The production server: `node dist/server/serve.mjs` (config/server-entries.mjs builds it beside the adapter's
 * entry.mjs; `npm start` and `npm test` run it). Plain node, no TypeScript loader: a loader's hooks would sit on
 * every dynamic import Astro makes per request. node:http in front of the Astro build, which the node adapter
 * makes in middleware mode:
 *
 * 1. Static files of the build (`dist/client`) through sirv, which lists the folder once at start: API and page
 *    routes never stat the disk. It answers the `.br`/`.gz` twins written at build (config/precompress.mjs) to
 *    clients that accept them; `/_astro/*` names carry a content hash, so they are cached as immutable.
 * 2. Everything else through compression (./compress.ts), then into Astro.
 * 3. The client's address is the socket's: an X-Forwarded-For header is dropped before Astro reads it (Astro
 *    would report its leftmost entry as clientAddress) unless TRUST_PROXY says proxies of ours put it there.
 * 4. A live link's `/go/CODE` is answered before all of that (./live-link-redirect.ts): one query, one 302.
 * 5. Under /api/ a request goes to its route module through our own API path (./api-serve.ts), not through
 *    Astro's page pipeline, and skips the static files; that path compresses what is worth compressing.
 * 6. Under /api/ every answer is JSON, also where Astro is never asked (src/lib/http/raw-target.ts): a target whose
 *    encoded dot segments climb out of /api/ is a JSON 404, and a request node:http cannot parse a JSON 400/431.
 *    An absolute-form target (`GET http://host/path`) is served as its path; one that is no path at all is a 400.
 */
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import { fileURLToPath } from 'node:url';
import sirv from 'sirv';
import { trustedProxyHops } from '../lib/auth/client-ip.server';
import { jobWorkerStart } from '../lib/jobs/worker.server';
import {
  clientErrorAnswer,
  rawTargetAnswer,
  rawTargetLeavesApi,
  rawTargetOriginForm,
  rawTargetUnusable,
} from '../lib/http/raw-target';
import { requestIdNew } from '../lib/http/request-id';
import { pageSecurityHeaders } from '../lib/http/security-headers';
import { apiServe } from './api-serve';
import { compressed } from './compress';
import { liveLinkRedirect } from './live-link-redirect';
import { serverConfig } from '../lib/server-config';

/** Cache-Control of hashed build assets: a new build gives a changed file a new name. */
export const IMMUTABLE_CACHE_CONTROL = 'public, max-age=31536000, immutable';
/** Cache-Control of other static files (favicon): a browser asks again, and gets a 304 by ETag. */
const REVALIDATE_CACHE_CONTROL = 'public, max-age=0, must-revalidate';

type Handler = (req: IncomingMessage, res: ServerResponse, next?: () => void) => void | Promise<void>;

// Both beside this file in the build: the adapter's entry, and the client folder one level up.
const entryUrl = new URL('./entry.mjs', import.meta.url).href;
const { handler: astro } = (await import(/* @vite-ignore */ entryUrl)) as { handler: Handler };
const clientDir = fileURLToPath(new URL('../client/', import.meta.url));

const assets = sirv(clientDir, {
  dev: false,
  etag: true,
  brotli: true,
  gzip: true,
  // Only real files: a page name never resolves to an .html file here.
  extensions: [],
  setHeaders: (res, pathname) =>
    res.setHeader(
      'cache-control',
      pathname.startsWith('/_astro/') ? IMMUTABLE_CACHE_CONTROL : REVALIDATE_CACHE_CONTROL,
    ),
});

const SECURITY_HEADERS = pageSecurityHeaders(serverConfig('SITE_URL'));

/**
 * Puts the request-target in origin-form (an absolute-form target becomes its path, its authority the Host), and
 * answers a target that is no path, or an /api/ target that climbs out of /api/, with the API's JSON error; true
 * when it answered.
 */
function targetRefused(req: IncomingMessage, res: ServerResponse): boolean {
  const absolute = rawTargetOriginForm(req.url ?? '');
  if (absolute) {
    req.url = absolute.path;
    req.headers.host = absolute.host;
  }
  const target = req.url ?? '';
  const refuse = !target.startsWith('/') ? rawTargetUnusable : rawTargetLeavesApi(target) ? rawTargetAnswer : null;
  if (!refuse) return false;
  // An id only for a request answered here: the middleware gives every other request its own.
  const requestId = requestIdNew();
  const { status, body } = refuse(target, requestId);
  res.writeHead(status, {
    ...SECURITY_HEADERS,
    'content-type': 'application/json; charset=utf-8',
    'cache-control': 'no-store',
    'x-request-id': requestId,
  });
  res.end(body);
  return true;
}

const hops = trustedProxyHops();
const server = createServer((req, res) => {
  if (hops === 0) delete req.headers['x-forwarded-for'];
  if (targetRefused(req, res)) return;
  if (req.url!.startsWith('/api/')) return void apiServe(req, res);
  liveLinkRedirect(req, res, SECURITY_HEADERS, () =>
    assets(req, res, () => compressed(req, res, () => void astro(req, res))),
  );
});

// A request node cannot parse: a JSON 400 (431 for an oversize head) instead of node's empty one.
server.on('clientError', (err: NodeJS.ErrnoException, socket) => {
  if (err.code === 'ECONNRESET' || !socket.writable) {
    socket.destroy();
    return;
  }
  socket.end(clientErrorAnswer(err.code, requestIdNew()));
});

const host = serverConfig('HOST');
const port = serverConfig('PORT');
server.listen(port, host, () => console.log(`Kitwright serving http://${host}:${port} from ${clientDir}`));

// The job queue's worker (mail delivery, event reminders) runs in every app instance; KW_JOBS=off leaves it out.
const jobs =
  serverConfig('KW_JOBS') === 'off' || !serverConfig('DATABASE_URL')
    ? null
    : await jobWorkerStart({ connectionString: serverConfig('DATABASE_URL')! });

for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.on(signal, () => {
    void jobs?.stop();
    server.close(() => process.exit(0));
    server.closeAllConnections();
  });
}
