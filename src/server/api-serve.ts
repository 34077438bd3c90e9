/**
 * The production server's API path: a request under /api/ goes straight to its route module, without Astro's
 * page pipeline (route manifest, render context, middleware chain), which cost more than the route itself on
 * small answers. Astro still routes pages, and everything under the dev server. Both paths run the same code:
 *
 * - the request is the node adapter's own (`NodeApp.createRequest`, with the Host check of astro.config.mjs's
 *   allowedDomains), built only when a route reads it: the middleware reads the method and headers from the node
 *   request, and the URL is built on the origin the adapter gives such a request (`requestOrigin`);
 * - the answer is written by the adapter's `NodeApp.writeResponse`, behind the compressor unless it states a
 *   length below the compressor's threshold (the middleware costs more than a small route's whole work);
 * - the route is chosen by src/lib/http/api-route-table.ts, which ranks routes as Astro does;
 * - src/middleware.ts's `requestHandle` runs around the route (request id, origin check, actor, 405, headers);
 * - the route's method is chosen as Astro's endpoint renderer does: the method's export, else ALL, else GET for
 *   HEAD (answered without its body), else an empty 404 that the middleware turns into a 405;
 * - cookies set during the request go out as Set-Cookie headers (src/lib/http/cookie-jar.ts).
 * The context is src/lib/http/request-context.ts's, the part of Astro's APIContext the routes may use.
 */
import type { IncomingMessage, ServerResponse } from 'node:http';
import { NodeApp } from 'astro/app/node';
import { API_MODULES, type ApiModule } from '../api-modules';
import { requestHandle } from '../middleware';
import { apiRoutePattern, apiRouteTable, type ApiRouteMatch } from '../lib/http/api-route-table';
import { cookieJarCreate } from '../lib/http/cookie-jar';
import { originAllowedHostnames } from '../lib/http/origin-check';
import { BytesResponse } from '../lib/http/bytes-response';
import type { RouteMethod } from '../lib/http/endpoint';
import type { RequestContext, RequestHead } from '../lib/http/request-context';
import { errorToResponse } from '../lib/http/respond';
import { requestIdNew } from '../lib/http/request-id';
import { serverConfig } from '../lib/server-config';
import { COMPRESS_THRESHOLD_BYTES, compressed } from './compress';

interface RouteEntry {
  load: () => Promise<ApiModule>;
  /** The module once loaded: later requests skip the import's promise. */
  loaded?: ApiModule;
}

const table = apiRouteTable(
  Object.entries(API_MODULES).flatMap(([key, load]) => {
    const pattern = apiRoutePattern(key.slice('./pages'.length));
    return pattern ? [[pattern, { load } as RouteEntry] as const] : [];
  }),
);
/** The route of any /api/ path no other route takes, and of one that cannot be decoded (the middleware's 400). */
const UNROUTED: ApiRouteMatch<RouteEntry> = {
  route: table.routes.find((r) => r.pattern === '/api/[...path]')!,
  params: {},
};

// As astro.config.mjs gives them to the adapter: a Host header is trusted only when it names this site.
const ALLOWED_DOMAINS = originAllowedHostnames(serverConfig('SITE_URL')).map((hostname) => ({ hostname }));

/** The origins the adapter gave, by the headers that decide them; a few, since a client may send any Host. */
const ORIGINS = new Map<string, string>();
const ORIGINS_MAX = 32;
const ORIGIN_HEADERS = ['host', ':authority', 'x-forwarded-proto', 'x-forwarded-host', 'x-forwarded-port'];

/**
 * The scheme, host and port the adapter's createRequest gives this request's URL, worked out by asking it for
 * a bare GET with the same origin-deciding headers (so its Host and forwarded-header checks decide), once per
 * distinct set of those headers.
 */
function requestOrigin(req: IncomingMessage): string {
  const encrypted = 'encrypted' in req.socket && Boolean(req.socket.encrypted);
  // Each header's value, or a NUL where it is missing (no header value holds one).
  let key = String(encrypted);
  for (const name of ORIGIN_HEADERS) key += `\n${req.headers[name] ?? '\0'}`;
  let origin = ORIGINS.get(key);
  if (origin === undefined) {
    const headers = Object.fromEntries(
      ORIGIN_HEADERS.flatMap((name) => (name in req.headers ? [[name, req.headers[name]]] : [])),
    );
    const probe = { headers, url: '/', method: 'GET', socket: { encrypted } } as unknown as IncomingMessage;
    origin = new URL(NodeApp.createRequest(probe, { allowedDomains: ALLOWED_DOMAINS }).url).origin;
    if (ORIGINS.size >= ORIGINS_MAX) ORIGINS.delete(ORIGINS.keys().next().value!);
    ORIGINS.set(key, origin);
  }
  return origin;
}

/** The request's URL as the adapter builds it: origin and request-target joined as text, the origin alone if that fails. */
function requestUrl(req: IncomingMessage): URL {
  const origin = requestOrigin(req);
  try {
    return new URL(`${origin}${req.url}`);
  } catch {
    return new URL(origin);
  }
}

/** The node request's method and headers, read as a Headers object would give them. */
function nodeRequestHead(req: IncomingMessage): RequestHead {
  return {
    method: req.method ?? 'GET',
    headers: {
      get: (name) => {
        const value = req.headers[name.toLowerCase()];
        return value === undefined ? null : Array.isArray(value) ? value.join(', ') : value;
      },
    },
  };
}

function pathDecoded(pathname: string): string | null {
  try {
    return decodeURI(pathname);
  } catch {
    return null;
  }
}

/** The exported method Astro's endpoint renderer would call for this request method, if any. */
function routeMethod(module: ApiModule, method: string): RouteMethod | undefined {
  const exported = module[method] ?? module.ALL ?? (method === 'HEAD' ? module.GET : undefined);
  return typeof exported === 'function' ? (exported as RouteMethod) : undefined;
}

async function routeAnswer(entry: RouteEntry, context: RequestContext, method: string): Promise<Response> {
  const module = (entry.loaded ??= await entry.load());
  const run = routeMethod(module, method);
  if (!run) return new Response(null, { status: 404 });
  const response = await run(context);
  return method === 'HEAD' ? new Response(null, response) : response;
}

/** Answers one /api/ request. */
export async function apiServe(req: IncomingMessage, res: ServerResponse): Promise<void> {
  const { response, requestBuilt } = await apiAnswer(req);
  const length = response.headers.get('content-length');
  const write = () => answerWrite(req, res, response, requestBuilt);
  if (length !== null && Number(length) < COMPRESS_THRESHOLD_BYTES) write();
  else compressed(req, res, write);
}

/** The answer to an /api/ request, and whether a route built its Request. */
async function apiAnswer(req: IncomingMessage): Promise<{ response: Response; requestBuilt: boolean }> {
  let request: Request | undefined;
  try {
    const url = requestUrl(req);
    const decoded = pathDecoded(url.pathname);
    const { route, params } = (decoded !== null && table.match(decoded)) || UNROUTED;
    const head = nodeRequestHead(req);
    const cookies = cookieJarCreate(head.headers.get('cookie'));
    const forwarded = req.headers['x-forwarded-for'];
    const context = {
      get request() {
        return (request ??= NodeApp.createRequest(req, { allowedDomains: ALLOWED_DOMAINS }));
      },
      head,
      url,
      params,
      locals: {} as App.Locals,
      cookies,
      clientAddress:
        (typeof forwarded === 'string' ? forwarded.split(',')[0]!.trim() : '') || req.socket.remoteAddress || '',
      routePattern: route.pattern,
      redirect: (location: string, status = 302) => new Response(null, { status, headers: { location } }),
    } satisfies RequestContext;
    const response = await requestHandle(context, () => routeAnswer(route.value, context, head.method));
    for (const header of cookies.setCookieHeaders()) response.headers.append('set-cookie', header);
    return { response, requestBuilt: request !== undefined };
  } catch (err) {
    return { response: errorToResponse(err, requestIdNew()), requestBuilt: request !== undefined };
  }
}

/**
 * Writes the answer: a BytesResponse's unread bytes in one go; anything else through the adapter's writer, which
 * also ends the abort-signal watch that building the Request set on the socket.
 */
function answerWrite(req: IncomingMessage, res: ServerResponse, response: Response, requestBuilt: boolean): void {
  if (!requestBuilt && response instanceof BytesResponse && response.bytesUnread) {
    const headers: string[] = [];
    response.headers.forEach((value, name) => {
      if (name !== 'set-cookie') headers.push(name, value);
    });
    for (const cookie of response.headers.getSetCookie()) headers.push('set-cookie', cookie);
    res.writeHead(response.status, headers).end(response.content);
    return;
  }
  NodeApp.writeResponse(response, res).catch((err: unknown) => {
    console.error(`[${res.getHeader('x-request-id') ?? '-'}] could not write the answer to ${req.url}`, err);
    res.destroy();
  });
}
