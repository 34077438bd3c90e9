import { describe, expect, test } from 'vitest';
import { TEXT_STORABLE_MESSAGE, TextSchema } from '../../src/lib/text-schema';

// What PostgreSQL refuses in text: the NUL character (SQLSTATE 22P05, "unsupported Unicode escape sequence" /
// "invalid byte sequence 0x00") and byte sequences that are not UTF-8 (22P02); a lone UTF-16 surrogate has
// no UTF-8 form (The Unicode Standard, §3.9 D92: surrogate code points are not encodable in UTF-8).
describe('TextSchema', () => {
  test.each([
    ['NUL alone', '\u0000'],
    ['NUL inside a title', 'Launch\u0000day'],
    ['a lone high surrogate', 'orbit \uD800'],
    ['a lone low surrogate', '\uDC00 orbit'],
    ['a reversed pair', '\uDE00\uD83D'],
  ])('refuses %s', (_what, value) => {
    const r = TextSchema.safeParse(value);
    expect(r.success ? [] : r.error.issues.map((i) => i.message)).toEqual([TEXT_STORABLE_MESSAGE]);
  });

  test.each([
    ['plain text', 'Skein probe, team 4'],
    ['accents and other scripts', 'Sonde Écharpe — 探査機'],
    ['an astral character written as a valid surrogate pair', 'rocket \uD83D\uDE80'],
    ['tabs and new lines', 'a\tb\nc'],
    ['the empty string', ''],
  ])('accepts %s', (_what, value) => {
    expect(TextSchema.safeParse(value)).toEqual({ success: true, data: value });
  });

  test('the valid pair is what JSON.parse gives for an escaped emoji, the lone one what it gives for half', () => {
    expect(TextSchema.safeParse(JSON.parse('"\\ud83d\\ude80"')).success).toBe(true);
    expect(TextSchema.safeParse(JSON.parse('"\\ud83d"')).success).toBe(false);
  });
});
