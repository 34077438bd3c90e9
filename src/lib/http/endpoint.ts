/**
 * The wrapper every API route uses: checks who may call it, runs the handler, and maps thrown errors to
 * the shared JSON error shape (src/lib/http/respond.ts). A route declares its audiences once, here, so
 * the authorization matrix test can read them and nothing else decides access.
 */
import { actorAdmitted, type Audience } from '../auth/actor';
import { AuthenticationError, ForbiddenError } from '../errors';
import { errorToResponse, json } from './respond';
import type { RequestContext } from './request-context';

export interface EndpointOptions {
  /** Who may call the route. */
  access: readonly Audience[];
}

/** A handler returns a Response, or plain data that is sent as JSON 200. */
export type EndpointHandler = (context: RequestContext) => Promise<Response | unknown> | Response | unknown;

/** An API route's exported method: Astro calls it with its APIContext, the server's API path with a RequestContext. */
export type RouteMethod = (context: RequestContext) => Promise<Response>;

/** Builds an API route's method from its access rule and handler. */
export function endpoint(options: EndpointOptions, handler: EndpointHandler): RouteMethod {
  return async (context) => {
    const requestId = context.locals.requestId;
    try {
      const actor = context.locals.actor;
      if (!actorAdmitted(actor, options.access)) {
        if (actor.kind === 'anonymous') {
          throw new AuthenticationError('Sign in (or open your class with its class code) to do this.');
        }
        throw new ForbiddenError('Your account or class session may not do this.');
      }
      const result = await handler(context);
      return result instanceof Response ? result : json(result);
    } catch (err) {
      return errorToResponse(err, requestId);
    }
  };
}
