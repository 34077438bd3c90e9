/**
 * The API path's cookie jar against Astro's own (AstroCookies, imported from its file: the package does not
 * export it): the same reads and the same Set-Cookie headers for the same operations.
 */
import { describe, expect, it } from 'vitest';
import { AstroCookies } from '../../../node_modules/astro/dist/core/cookies/cookies.js';
import { cookieJarCreate } from '../../../src/lib/http/cookie-jar';

interface AstroJar {
  get(name: string): { value: string } | undefined;
  has(name: string): boolean;
  set(name: string, value: string, options?: object): void;
  delete(name: string, options?: object): void;
  headers(): Iterable<string>;
}

function both(cookieHeader: string | null) {
  const headers = new Headers(cookieHeader === null ? {} : { cookie: cookieHeader });
  const astro = new AstroCookies(new Request('http://localhost/', { headers })) as AstroJar;
  const ours = cookieJarCreate(cookieHeader);
  return { astro, ours };
}

describe('cookieJarCreate', () => {
  it('reads request cookies URI-decoded, and an undecodable one as it is, as Astro does', () => {
    const { astro, ours } = both('kw_session=abc%20def; other=%E0%A4%A; empty=');
    for (const name of ['kw_session', 'other', 'empty', 'missing']) {
      expect(ours.get(name)?.value, name).toBe(astro.get(name)?.value);
      expect(ours.has(name), name).toBe(astro.has(name));
    }
  });

  it('sees its own sets and deletes, and sends the same Set-Cookie headers', () => {
    const { astro, ours } = both('kw_class=t1; kw_session=s1');
    const options = { path: '/', httpOnly: true, sameSite: 'lax' as const, secure: true, maxAge: 3600 };
    for (const jar of [astro, ours]) {
      jar.set('kw_session', 'new value', options);
      jar.delete('kw_class', { path: '/', maxAge: 99 } as object);
      jar.set('kw_session', 's2', options);
    }
    expect(ours.get('kw_session')?.value).toBe(astro.get('kw_session')?.value);
    expect(ours.get('kw_class')).toBe(astro.get('kw_class'));
    expect(ours.has('kw_class')).toBe(astro.has('kw_class'));
    expect(ours.setCookieHeaders()).toEqual([...astro.headers()]);
    expect(ours.setCookieHeaders()[1]).toMatch(/^kw_class=deleted; Path=\/; Expires=Thu, 01 Jan 1970/);
  });

  it('sends nothing when nothing was set', () => {
    expect(cookieJarCreate(null).setCookieHeaders()).toEqual([]);
  });
});
