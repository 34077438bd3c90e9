/**
 * The cookie jar of the production server's API path, with the semantics of Astro's own (AstroCookies in
 * node_modules/astro/dist/core/cookies/cookies.js): values read URI-decoded, a cookie set or deleted during the
 * request is what later reads see, and each name yields one Set-Cookie header. Parsing and serializing are the
 * `cookie` package's, as in Astro.
 */
import { parse, serialize } from 'cookie';
import type { CookieJar } from './request-context';

/** A deleted cookie goes out with this value and an expiry at the epoch, as Astro sends it. */
const DELETED_VALUE = 'deleted';

export interface CookieJarWithOutgoing extends CookieJar {
  /** One Set-Cookie header value per cookie set or deleted, in the order first touched. */
  setCookieHeaders(): string[];
}

export function cookieJarCreate(cookieHeader: string | null): CookieJarWithOutgoing {
  let incoming: Record<string, string | undefined> | null = null;
  const read = () => (incoming ??= cookieHeader ? parse(cookieHeader, { decode: (v) => v }) : {});
  /** Per name: the value a later read sees (undefined once deleted) and its Set-Cookie header. */
  const outgoing = new Map<string, { value: string | undefined; header: string }>();
  return {
    get(name) {
      const out = outgoing.get(name);
      if (out) return out.value === undefined ? undefined : { value: out.value };
      const raw = read()[name];
      if (!raw) return undefined;
      try {
        return { value: decodeURIComponent(raw) };
      } catch {
        return { value: raw };
      }
    },
    has(name) {
      const out = outgoing.get(name);
      return out ? out.value !== undefined : read()[name] !== undefined;
    },
    set(name, value, options) {
      outgoing.set(name, { value, header: serialize(name, value, options) });
    },
    delete(name, options) {
      // A Max-Age given anyway would outlive the epoch expiry; Astro drops it too.
      const { maxAge: _maxAge, ...rest } = (options ?? {}) as typeof options & { maxAge?: number };
      outgoing.set(name, {
        value: undefined,
        header: serialize(name, DELETED_VALUE, { ...rest, expires: new Date(0) }),
      });
    },
    setCookieHeaders: () => [...outgoing.values()].map((c) => c.header),
  };
}
