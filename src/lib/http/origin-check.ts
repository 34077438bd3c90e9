/**
 * Whether a state-changing request comes from this site (cross-site request forgery defence), after OWASP's
 * Cross-Site Request Forgery Prevention Cheat Sheet: "Verifying Origin With Standard Headers" first, then
 * "Fetch Metadata headers" when the browser sent no Origin. Pure: the middleware passes headers and hosts in.
 *
 * The rules, in order:
 * 1. GET, HEAD, OPTIONS and TRACE change nothing and pass.
 * 2. An Origin header decides alone: its host must be the request's own host (host and port; the scheme is not
 *    compared, so a proxy that ends TLS in front of the server does not break same-site posts) or its hostname one
 *    of the allowed hostnames (SITE_URL's host, any port, as Astro's `allowedDomains` matches hosts; loopback
 *    names too, on any port, but only on a local run — see originAllowedHostnames). `Origin: null` (sandboxed
 *    frames, file pages, some redirects) is refused.
 * 3. Without Origin, `Sec-Fetch-Site` decides: `same-origin` and `none` (typed or bookmarked by the user) pass,
 *    `same-site`, `cross-site` and anything unknown are refused.
 * 4. With neither header the sender is a script or a browser older than both headers. Forgery rides on the
 *    victim's cookies, so such a request passes only when it carries no Cookie header: curl, server-to-server
 *    calls and the API tests pass, a cookie-bearing request that proves nothing about its origin does not.
 */

/** Hostnames the server answers for whatever SITE_URL says: the loopback names a local run uses. */
export const ORIGIN_LOOPBACK_HOSTNAMES: readonly string[] = ['127.0.0.1', 'localhost'];

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS', 'TRACE']);
const FETCH_SITE_ALLOWED = new Set(['same-origin', 'none']);

/** The request facts the check reads: its method, its own URL (as the server resolved its host) and headers. */
export interface OriginRequest {
  method: string;
  url: URL;
  headers: Pick<Headers, 'get'>;
}

/** The answer: allowed, or refused with what was received, as a phrase for an error message. */
export type OriginVerdict = { allowed: true } | { allowed: false; received: string };

/**
 * The hostnames other than the request's own that may post here, decided by SITE_URL, the deployment's declared
 * public address (README.md). A local run (npm start, dev and test set SITE_URL to a loopback URL; an empty or
 * missing SITE_URL is treated as local, as src/lib/auth/site-url.ts does) trusts the loopback names on any port,
 * so a page served on one local port may post to another. A deployment (SITE_URL with any other hostname) trusts
 * that hostname alone: a page on some other local port of the server's machine is another site there.
 * Throws on a SITE_URL that is not a URL.
 */
export function originAllowedHostnames(siteUrl: string | undefined): string[] {
  if (!siteUrl) return [...ORIGIN_LOOPBACK_HOSTNAMES];
  if (!URL.canParse(siteUrl))
    throw new Error(`SITE_URL "${siteUrl}" is not an absolute URL such as https://kits.example.org.`);
  const { hostname } = new URL(siteUrl);
  return ORIGIN_LOOPBACK_HOSTNAMES.includes(hostname) ? [...ORIGIN_LOOPBACK_HOSTNAMES] : [hostname];
}

/**
 * Decides whether the request may run: safe methods always; unsafe ones (POST, PUT, PATCH, DELETE, any other)
 * by Origin, else Sec-Fetch-Site, else only without cookies (rules in this module's comment). Hostnames are
 * compared lower-case as URL parsing leaves them.
 */
export function originVerdict(request: OriginRequest, allowedHostnames: readonly string[]): OriginVerdict {
  if (SAFE_METHODS.has(request.method.toUpperCase())) return { allowed: true };
  const origin = request.headers.get('origin');
  if (origin !== null) return originHeaderVerdict(origin.trim(), request.url, allowedHostnames);
  const fetchSite = request.headers.get('sec-fetch-site');
  if (fetchSite !== null) {
    const site = fetchSite.trim().toLowerCase();
    return FETCH_SITE_ALLOWED.has(site) ? { allowed: true } : { allowed: false, received: `Sec-Fetch-Site: ${site}` };
  }
  if (request.headers.get('cookie') === null) return { allowed: true };
  return { allowed: false, received: 'cookies without an Origin or Sec-Fetch-Site header' };
}

/** True when originVerdict allows the request. */
export function originAllowed(request: OriginRequest, allowedHostnames: readonly string[]): boolean {
  return originVerdict(request, allowedHostnames).allowed;
}

function originHeaderVerdict(origin: string, ownUrl: URL, allowedHostnames: readonly string[]): OriginVerdict {
  const refused: OriginVerdict = { allowed: false, received: `Origin: ${origin || '(empty)'}` };
  if (origin === 'null' || !URL.canParse(origin)) return refused;
  const parsed = new URL(origin);
  if (parsed.protocol !== 'http:' && parsed.protocol !== 'https:') return refused;
  if (parsed.host === ownUrl.host || allowedHostnames.includes(parsed.hostname)) return { allowed: true };
  return refused;
}
