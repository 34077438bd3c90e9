/** Cookie names and lifetimes of the two kinds of session (framework-free, shared with tests). */

/** The lucia session of an account. */
export const USER_SESSION_COOKIE = 'kw_session';
/** A student device's class session (the cookie holds a random token; the database keeps its SHA-256). */
export const CLASS_SESSION_COOKIE = 'kw_class';
/** An account session lasts 30 days and slides: lucia renews it when less than half is left. */
export const USER_SESSION_DAYS = 30;
/** A class session lasts 8 hours, a school day, and is never renewed. */
export const CLASS_SESSION_HOURS = 8;

/** True when cookies must carry Secure: everywhere except plain-http local development on loopback. */
export function cookieSecure(siteUrl: string | undefined): boolean {
  if (!siteUrl) return true;
  try {
    const url = new URL(siteUrl);
    const loopback = url.hostname === '127.0.0.1' || url.hostname === 'localhost' || url.hostname === '[::1]';
    return !(url.protocol === 'http:' && loopback);
  } catch {
    return true;
  }
}
