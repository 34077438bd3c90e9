/**
 * What the middleware and the API routes may read of a request: the part of Astro's APIContext they use. Astro
 * gives them its whole context under the dev server and for pages; the production server's own API path
 * (src/server/api-serve.ts) builds exactly this much. A route needing more of APIContext adds it here and
 * there, and the type checker points at both.
 */
import type { APIContext, AstroCookieSetOptions } from 'astro';

/** The request's cookies in, and the Set-Cookie of the answer out. */
export interface CookieJar {
  get(name: string): { value: string } | undefined;
  has(name: string): boolean;
  set(name: string, value: string, options?: AstroCookieSetOptions): void;
  delete(name: string, options?: Omit<AstroCookieSetOptions, 'expires' | 'maxAge' | 'encode'>): void;
}

/** The method and headers of a request: what the middleware reads before any route runs. */
export interface RequestHead {
  method: string;
  headers: Pick<Headers, 'get'>;
}

export type RequestContext = Pick<
  APIContext,
  'request' | 'url' | 'params' | 'locals' | 'clientAddress' | 'routePattern' | 'redirect'
> & {
  cookies: CookieJar;
  /**
   * The server's API path gives the head without building `request`, which it builds only when read: a Request
   * with its abort signal costs more than a small route's whole work. Astro's context has none; read the head
   * through `requestHead`.
   */
  head?: RequestHead;
};

/** The request's method and headers, without building a Request that is not built yet. */
export function requestHead(context: Pick<RequestContext, 'request' | 'head'>): RequestHead {
  return context.head ?? context.request;
}
