/**
 * Class codes: 8 characters from a 31-character alphabet without look-alikes — the digits 2–9 and the
 * letters A–Z without I, L and O (so no 0/O, 1/I/L confusion when a teacher writes the code on the board).
 * Framework-free; uses the Web Crypto random source, so it runs in Node and the browser alike.
 */
export const CLASS_CODE_ALPHABET = '23456789ABCDEFGHJKMNPQRSTUVWXYZ';
export const CLASS_CODE_LENGTH = 8;

/** The largest multiple of the alphabet size that fits in a byte: bytes at or above it are rejected. */
const ACCEPT_BELOW = 256 - (256 % CLASS_CODE_ALPHABET.length);

/** Fills a byte array with random bytes (injectable for tests). */
export type RandomBytesFill = (bytes: Uint8Array) => void;

const webCryptoFill: RandomBytesFill = (bytes) => {
  crypto.getRandomValues(bytes);
};

/**
 * A new class code drawn uniformly from the alphabet: bytes ≥ 248 are thrown away (rejection sampling), so
 * `byte % 31` carries no modulo bias.
 */
export function classCodeNew(fill: RandomBytesFill = webCryptoFill): string {
  let code = '';
  const buffer = new Uint8Array(16);
  while (code.length < CLASS_CODE_LENGTH) {
    fill(buffer);
    for (const byte of buffer) {
      if (byte >= ACCEPT_BELOW) continue;
      code += CLASS_CODE_ALPHABET[byte % CLASS_CODE_ALPHABET.length];
      if (code.length === CLASS_CODE_LENGTH) break;
    }
  }
  return code;
}

/**
 * A typed class code as stored: upper-cased, with spaces and hyphens removed ("jfms-3k7q" → "JFMS3K7Q").
 * Returns the input unchanged apart from that; the schema decides whether it is well formed.
 */
export function classCodeNormalize(input: string): string {
  return input.toUpperCase().replace(/[\s-]+/g, '');
}

/** "JFMS3K7Q" → "JFMS-3K7Q", easier to read aloud and copy from a board. */
export function classCodeFormat(code: string): string {
  return code.length === CLASS_CODE_LENGTH ? `${code.slice(0, 4)}-${code.slice(4)}` : code;
}

/** The join page with a class code filled in (a class poster's QR code): `${siteUrl}/join?code=JFMS3K7Q`. */
export function classJoinUrl(siteUrl: string, code: string): string {
  const url = new URL('/join', siteUrl);
  url.searchParams.set('code', code);
  return url.href;
}

/** The join page's address as a person types it: host and path, no scheme ("kits.example.org/join"). */
export function classJoinAddress(siteUrl: string): string {
  return `${new URL(siteUrl).host}/join`;
}
