/**
 * Puts the request id and the actor (account with role, class session, or anonymous) on Astro.locals, refuses
 * cross-site state-changing requests (src/lib/http/origin-check.ts) before any route runs, and turns anything an
 * API route failed to catch into the JSON 500 with that request id, and a method an API route does not answer into
 * a JSON 405 with Allow. Nothing else. Astro runs it for pages (and for everything under the dev server); the
 * production server's own API path (src/server/api-serve.ts) runs the same `requestHandle`.
 */
import { defineMiddleware } from 'astro:middleware';
import { API_MODULES } from './api-modules';
import { actorResolve } from './lib/auth/actor-resolve.server';
import { originAllowedHostnames, originVerdict } from './lib/http/origin-check';
import { errorResponse, errorToResponse } from './lib/http/respond';
import { requestIdNew } from './lib/http/request-id';
import { cspStyleHashesDropped, pageSecurityHeaders } from './lib/http/security-headers';
import { routeMethodsAllowed, routeModulePaths, routeUrlMalformed } from './lib/http/route-methods';
import { InputError, MethodNotAllowedError, NotFoundError } from './lib/errors';
import { requestHead, type RequestContext } from './lib/http/request-context';
import { serverConfig } from './lib/server-config';

// Read once, as astro.config.mjs does for the adapter's host handling: a bad SITE_URL fails at start, not per request.
const ALLOWED_HOSTNAMES = originAllowedHostnames(serverConfig('SITE_URL'));
const PAGE_SECURITY_HEADERS = Object.entries(pageSecurityHeaders(serverConfig('SITE_URL')));

/**
 * The middleware's work on one request; `next` runs the route. A route that does not export the request's method
 * answers, as Astro's routing does, an empty 404, which becomes the JSON 405 here.
 */
export async function requestHandle(context: RequestContext, next: () => Promise<Response>): Promise<Response> {
  const requestId = requestIdNew();
  context.locals.requestId = requestId;
  const { method, headers } = requestHead(context);
  const isApi = context.url.pathname.startsWith('/api/');
  const unrouted = isApi ? apiUnrouted(context.url, method, context.routePattern) : null;
  if (unrouted) return answerStamped(errorToResponse(unrouted, requestId), requestId);
  const verdict = originVerdict({ method, url: context.url, headers }, ALLOWED_HOSTNAMES);
  if (!verdict.allowed) return crossSiteResponse(method, context.url, verdict.received, isApi, requestId);
  try {
    // A printed live link answers without a session lookup (its page reads no actor).
    context.locals.actor = context.url.pathname.startsWith('/go/')
      ? { kind: 'anonymous' }
      : await actorResolve(context);
    let response = await next();
    // Astro answers a method the route does not export with an empty 404 and then renders the HTML 404 page.
    if (isApi && response.status === 404 && response.body === null)
      response = errorToResponse(await methodNotAllowed(method, context.routePattern), requestId);
    return answerStamped(response, requestId);
  } catch (err) {
    if (isApi) return errorToResponse(err, requestId);
    console.error(`[${requestId}] unexpected error on ${context.url.pathname}`, err);
    return new Response(`Something went wrong on our side. Quote request id ${requestId} if you report it.`, {
      status: 500,
      headers: { 'content-type': 'text/plain; charset=utf-8', 'x-request-id': requestId },
    });
  }
}

export const onRequest = defineMiddleware((context, next) => requestHandle(context, () => next()));

/**
 * Stamps the request id and the security headers of src/lib/http/security-headers.ts on an answer (a header a
 * route set itself wins); on a page, the CSP Astro wrote loses its style hashes so style attributes may apply.
 */
function answerStamped(response: Response, requestId: string): Response {
  response.headers.set('x-request-id', requestId);
  for (const [name, value] of PAGE_SECURITY_HEADERS) if (!response.headers.has(name)) response.headers.set(name, value);
  const csp = response.headers.get('content-security-policy');
  if (csp) response.headers.set('content-security-policy', cspStyleHashesDropped(csp));
  return response;
}

/**
 * The error for an /api/ URL no API route took: malformed percent-encoding (400), or a path Astro refused to
 * match (an encoded dot segment such as /api/%2e%2e/health) and handed to the HTML 404 page (404). Null when an
 * API route took the request.
 */
function apiUnrouted(url: URL, method: string, routePattern: string): InputError | NotFoundError | null {
  if (routeUrlMalformed(url))
    return new InputError(
      `The URL ${url.pathname}${url.search} has a % that does not start an escape such as %20; encode % itself as %25.`,
    );
  if (routePattern.startsWith('/api/')) return null;
  return new NotFoundError(`No API route answers ${method} ${url.pathname}. See README.md for the API map.`);
}

/** The 405 for a method an existing API route does not export, naming the methods it does (for Allow). */
async function methodNotAllowed(method: string, routePattern: string): Promise<MethodNotAllowedError> {
  const path = routeModulePaths(routePattern).find((p) => p in API_MODULES);
  const allowed = path ? routeMethodsAllowed(Object.keys(await API_MODULES[path]!())) : [];
  return new MethodNotAllowedError(
    `${routePattern} does not answer ${method}; it answers ${allowed.join(', ') || 'no method'}.`,
    allowed,
  );
}

/** 403 for a refused cross-site request: the shared JSON error for the API, a short plain page otherwise. */
function crossSiteResponse(method: string, url: URL, received: string, isApi: boolean, requestId: string): Response {
  const message =
    `A ${method} to ${url.pathname} must come from a page of this site (${url.origin}); received ${received}. ` +
    'Browsers add a matching Origin header themselves; scripts may send that header, or send no cookies.';
  if (isApi) return errorResponse(403, { code: 'cross_site', message }, { 'x-request-id': requestId });
  return new Response(`Refused: ${message}\n`, {
    status: 403,
    headers: { 'content-type': 'text/plain; charset=utf-8', 'cache-control': 'no-store', 'x-request-id': requestId },
  });
}
