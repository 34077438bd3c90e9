/**
 * The one check for a `next` page a visitor is sent on to after signing in or joining a class (/sign-in, /join):
 * a path on this site, never anywhere else (OWASP Unvalidated Redirects and Forwards Cheat Sheet: "validate the
 * supplied value … allow-list"; an open redirect is what it prevents).
 *
 * Browsers do not read a URL the way a naive prefix check does (WHATWG URL Standard, "basic URL parser"): they
 * drop ASCII tabs and newlines anywhere (`/\t/evil.example` becomes `//evil.example`), read `\` as `/` in http(s)
 * URLs, and map full-width dots to dots in host names. Servers and proxies may also decode the value once more.
 * So the value is checked as given and after each round of percent-decoding (`/%09/evil.example`,
 * `/%2F%2Fevil.example`, `/%E3%80%82x`), and every form must be plain: printable ASCII without `\` or spaces,
 * one leading `/`, no `//` and no `.`/`..` segment in the path part. Anything else answers null and the caller
 * uses its default page. This is deliberately narrower than "any same-site URL": the site's own paths are ASCII.
 */

/** The longest `next` accepted, in characters (a page path with its query; longer values are refused). */
export const SAFE_NEXT_LENGTH_MAX = 2048;

/** Rounds of percent-decoding tried before a still-changing value is refused as deliberately nested. */
const DECODE_ROUNDS_MAX = 3;

/** Printable ASCII from `!` to `~` except the backslash, after one leading slash. */
const PLAIN_PATH = /^\/[\x21-\x5b\x5d-\x7e]*$/;

const BASE = 'http://next.invalid';

/**
 * The value itself when it is a safe same-site path (with its query and fragment), or null for anything else:
 * null, empty, too long, absolute or protocol-relative URLs, backslashes, control characters, non-ASCII, dot
 * segments and the same tricks hidden behind percent-encoding.
 */
export function safeNextPath(value: string | null | undefined): string | null {
  if (typeof value !== 'string' || value.length === 0 || value.length > SAFE_NEXT_LENGTH_MAX) return null;
  let form = value;
  for (let round = 0; ; round += 1) {
    if (!safeNextFormPlain(form)) return null;
    const decoded = percentDecoded(form);
    if (decoded === null) return null;
    if (decoded === form) break;
    if (round === DECODE_ROUNDS_MAX) return null;
    form = decoded;
  }
  // Belt and braces: the WHATWG parser itself must keep the value on the base origin.
  const resolved = new URL(value, BASE);
  return resolved.origin === BASE ? value : null;
}

function safeNextFormPlain(form: string): boolean {
  if (!PLAIN_PATH.test(form)) return false;
  const path = form.split(/[?#]/, 1)[0] ?? '';
  if (path.includes('//')) return false;
  return path.split('/').every((segment) => segment !== '.' && segment !== '..');
}

function percentDecoded(form: string): string | null {
  try {
    return decodeURIComponent(form);
  } catch {
    return null; // a lone or malformed % escape
  }
}
