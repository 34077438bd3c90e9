/**
 * Puts the request id and the actor (account with role, class session, or anonymous) on Astro.locals, and
 * turns anything an API route failed to catch into the JSON 500 with that request id. Nothing else.
 */
import { defineMiddleware } from 'astro:middleware';
import { actorResolve } from './lib/auth/actor-resolve.server';
import { errorToResponse } from './lib/http/respond';
import { requestIdNew } from './lib/http/request-id';

export const onRequest = defineMiddleware(async (context, next) => {
  const requestId = requestIdNew();
  context.locals.requestId = requestId;
  const isApi = context.url.pathname.startsWith('/api/');
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
