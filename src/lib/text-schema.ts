/**
 * Free text a caller sends (kit titles, model names, labels): a string PostgreSQL can store and any page can
 * show. PostgreSQL's text type refuses the NUL character (SQLSTATE 22P05) and invalid UTF-8 (22P02), which is
 * what a lone UTF-16 surrogate ("\ud800" in JSON) becomes, so both are refused here, as a 400 naming the
 * field, before any query runs. Imports zod alone, so islands can use it.
 */
import { z } from 'zod';

/** Any code point except NUL and the surrogate range (with the u flag, a valid pair is one code point above it). */
export const TEXT_STORABLE_PATTERN = /^[^\0\uD800-\uDFFF]*$/u;
export const TEXT_STORABLE_MESSAGE = 'must be plain text, without NUL characters or broken (lone surrogate) characters';

/** A string without NUL or lone surrogates; chain .trim(), .min() and .max() as on z.string(). */
export const TextSchema = z.string().regex(TEXT_STORABLE_PATTERN, TEXT_STORABLE_MESSAGE);
