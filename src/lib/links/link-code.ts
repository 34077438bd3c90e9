/**
 * Live-link codes and targets. A code is 6–8 characters from an alphabet without look-alikes (no 0/O, 1/I/L),
 * so it can be typed from a printed sheet; case does not matter when typed. A target is a path on this site or
 * an https address elsewhere.
 */
import { z } from 'zod';

/** Digits 2–9 and capitals without I, L, O (common practice, no source). */
export const LINK_CODE_ALPHABET = '23456789ABCDEFGHJKMNPQRSTUVWXYZ';
export const LINK_CODE_LENGTH = 6;
export const LINK_CODE_PATTERN = new RegExp(`^[${LINK_CODE_ALPHABET}]{6,8}$`);
/**
 * Error correction for print: level Q restores up to about 25 % of damaged codewords (ISO/IEC 18004, table of
 * error correction levels), enough for a creased or scuffed bookmark, with a smaller symbol than H; the short
 * /go/ address keeps the symbol at version 2–3 either way.
 */
export const LINK_QR_ERROR_CORRECTION = 'Q' as const;
export const LINK_TITLE_MAX = 120;
/**
 * The sheet sizes (ids of the engine's SHEET_SIZES) a link prints on: the office sizes of both paper systems
 * and the next size up of each for a poster on a wall. Each is at least 210 mm wide, so three bookmarks fit.
 */
export const LINK_PRINT_PAPERS = ['letter', 'a4', 'tabloid', 'a3'] as const;
export type LinkPrintPaper = (typeof LINK_PRINT_PAPERS)[number];
export const LINK_TARGET_MAX = 2000;

/** A random code from crypto.getRandomValues (rejection sampling, so every character is equally likely). */
export function linkCodeNew(length = LINK_CODE_LENGTH): string {
  const n = LINK_CODE_ALPHABET.length;
  const limit = 256 - (256 % n);
  let code = '';
  while (code.length < length) {
    for (const byte of crypto.getRandomValues(new Uint8Array(length * 2))) {
      if (byte < limit && code.length < length) code += LINK_CODE_ALPHABET[byte % n];
    }
  }
  return code;
}

/** The printed address of a code, `${siteUrl}/go/CODE`: what its QR code encodes and what people type. */
export function linkAddress(siteUrl: string, code: string): string {
  return new URL(`/go/${code}`, siteUrl).toString();
}

/** A typed or scanned code in its stored form, or null when it cannot be one. */
export function linkCodeNormal(typed: string): string | null {
  const code = typed.trim().toUpperCase();
  return LINK_CODE_PATTERN.test(code) ? code : null;
}

/**
 * The code a request-target asks for when it is a live link's address (`/go/CODE`, any case, one optional
 * trailing slash, any query), in stored form; null for any other target, or a segment whose percent-encoding is
 * malformed or that cannot be a code. The same paths Astro's `/go/[code]` route matches with a valid code.
 */
export function linkCodeFromTarget(target: string): string | null {
  const match = /^\/go\/([^/?#]+)\/?(?:[?#]|$)/.exec(target);
  if (!match) return null;
  try {
    return linkCodeNormal(decodeURIComponent(match[1]!));
  } catch {
    return null;
  }
}

/**
 * A target as the value of a Location header: each character outside printable ASCII (space, controls,
 * non-ASCII) percent-encoded as UTF-8, as the WHATWG URL parser encodes it (a lone surrogate as U+FFFD), and the
 * rest as stored; a header field value cannot carry those characters (RFC 9110, 5.5).
 */
export function linkLocation(target: string): string {
  return target.replace(/[^\x21-\x7e]/gu, (c) => {
    try {
      return encodeURIComponent(c);
    } catch {
      return '%EF%BF%BD';
    }
  });
}

/** True for a path on this site ("/activities/…", not "//host") or an https URL with a host. */
export function linkTargetValid(target: string): boolean {
  if (target.startsWith('/')) return !target.startsWith('//') && !target.includes('\\');
  try {
    const url = new URL(target);
    return url.protocol === 'https:' && url.hostname !== '' && url.username === '' && url.password === '';
  } catch {
    return false;
  }
}

const LinkTargetSchema = z
  .string()
  .trim()
  .max(LINK_TARGET_MAX)
  .refine(linkTargetValid, 'the target must be a path on this site (/activities) or an https:// address');

export const LinkCreateSchema = z
  .object({
    title: z.string().trim().min(1, 'give the link a title').max(LINK_TITLE_MAX),
    target: LinkTargetSchema,
  })
  .strict();

export const LinkPatchSchema = z
  .object({
    title: z.string().trim().min(1).max(LINK_TITLE_MAX).optional(),
    target: LinkTargetSchema.optional(),
    retired: z.boolean().optional(),
  })
  .strict();
