/**
 * Puts the request id and the actor (account with role, class session, or anonymous) on Astro.locals, refuses
 * cross-site state-changing requests (src/lib/http/origin-check.ts) before any route runs, and turns anything an
 * API route failed to catch into the JSON 500 with that request id. Nothing else.
 */
import { defineMiddleware } from 'astro:middleware';
import { actorResolve } from './lib/auth/actor-resolve.server';
import { originAllowedHostnames, originVerdict } from './lib/http/origin-check';
import { errorResponse, errorToResponse } from './lib/http/respond';
import { requestIdNew } from './lib/http/request-id';

// Read once, as astro.config.mjs does for the adapter's host handling: a bad SITE_URL fails at start, not per request.
const ALLOWED_HOSTNAMES = originAllowedHostnames(process.env.SITE_URL);

export const onRequest = defineMiddleware(async (context, next) => {
  const requestId = requestIdNew();
  context.locals.requestId = requestId;
  const isApi = context.url.pathname.startsWith('/api/');
  const verdict = originVerdict(
    { method: context.request.method, url: context.url, headers: context.request.headers },
    ALLOWED_HOSTNAMES,
  );
  if (!verdict.allowed)
    return crossSiteResponse(context.request.method, context.url, verdict.received, isApi, requestId);
  try {
    context.locals.actor = await actorResolve(context);
    const response = await next();
    response.headers.set('x-request-id', requestId);
    return response;
  } catch (err) {
    if (isApi) return errorToResponse(err, requestId);
    console.error(`[${requestId}] unexpected error on ${context.url.pathname}`, err);
    return new Response(`Something went wrong on our side. Quote request id ${requestId} if you report it.`, {
      status: 500,
      headers: { 'content-type': 'text/plain; charset=utf-8', 'x-request-id': requestId },
    });
  }
});

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
