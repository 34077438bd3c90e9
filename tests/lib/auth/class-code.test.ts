import { describe, expect, it } from 'vitest';
import {
  CLASS_CODE_ALPHABET,
  CLASS_CODE_LENGTH,
  classCodeFormat,
  classCodeNew,
  classJoinAddress,
  classJoinUrl,
  classCodeNormalize,
} from '../../../src/lib/auth/class-code';
import { ClassCodeSchema } from '../../../src/lib/auth/class-schemas';

describe('CLASS_CODE_ALPHABET', () => {
  it('holds 31 distinct characters without 0, O, 1, I or L', () => {
    expect(new Set(CLASS_CODE_ALPHABET).size).toBe(31);
    expect(CLASS_CODE_ALPHABET).not.toMatch(/[0O1IL]/);
    expect(CLASS_CODE_ALPHABET).toMatch(/^[2-9A-Z]+$/);
  });
});

describe('classCodeNew', () => {
  it('draws 8 characters from the alphabet', () => {
    for (let i = 0; i < 200; i += 1) {
      expect(classCodeNew()).toMatch(new RegExp(`^[${CLASS_CODE_ALPHABET}]{${CLASS_CODE_LENGTH}}$`));
    }
  });

  it('throws away bytes of 248 and above so no character is favoured (no modulo bias)', () => {
    // 248 = 8 × 31 is the largest multiple of 31 below 256: 248..255 would favour the first 8 characters.
    let call = 0;
    const code = classCodeNew((bytes) => {
      call += 1;
      bytes.fill(call === 1 ? 255 : 0);
      if (call === 1) bytes[15] = 248;
    });
    expect(call).toBe(2);
    expect(code).toBe(CLASS_CODE_ALPHABET[0]!.repeat(8));
    const mapped = classCodeNew((bytes) => bytes.fill(247));
    expect(mapped).toBe(CLASS_CODE_ALPHABET[247 % 31]!.repeat(8));
  });

  it('uses every character about equally often (chi-square test)', () => {
    const counts = new Map<string, number>();
    const codes = 4000;
    for (let i = 0; i < codes; i += 1) for (const c of classCodeNew()) counts.set(c, (counts.get(c) ?? 0) + 1);
    const expected = (codes * CLASS_CODE_LENGTH) / CLASS_CODE_ALPHABET.length;
    let chi2 = 0;
    for (const c of CLASS_CODE_ALPHABET) chi2 += ((counts.get(c) ?? 0) - expected) ** 2 / expected;
    // NIST/SEMATECH e-Handbook of Statistical Methods, §1.3.6.7.4 (upper critical values of the chi-square
    // distribution): 30 degrees of freedom at α = 0.001 → 59.703. A fair source fails this 1 time in 1000.
    expect(chi2).toBeLessThan(59.703);
  });
});

describe('classCodeNormalize', () => {
  it('upper-cases and drops spaces and hyphens', () => {
    expect(classCodeNormalize(' jfms-3k7q ')).toBe('JFMS3K7Q');
    expect(classCodeNormalize('ab cd\tef-gh')).toBe('ABCDEFGH');
  });
});

describe('classCodeFormat', () => {
  it('splits an 8-character code in two groups of four', () => {
    expect(classCodeFormat('JFMS3K7Q')).toBe('JFMS-3K7Q');
    expect(classCodeFormat('SHORT')).toBe('SHORT');
  });
});

describe('classJoinUrl', () => {
  // Read back with the WHATWG URL parser, as a phone does after scanning the poster's QR code.
  it('points at /join on the site with the code as a query the join page accepts', () => {
    const url = new URL(classJoinUrl('https://kits.example.org/', 'JFMS3K7Q'));
    expect(url.origin + url.pathname).toBe('https://kits.example.org/join');
    expect(ClassCodeSchema.parse(url.searchParams.get('code'))).toBe('JFMS3K7Q');
  });

  it('keeps a port and drops a base path, since /join is at the root', () => {
    expect(classJoinUrl('http://127.0.0.1:4321/app', 'ABCD2345')).toBe('http://127.0.0.1:4321/join?code=ABCD2345');
  });
});

describe('classJoinAddress', () => {
  it('spells the join page as host and path, with a port when there is one', () => {
    expect(classJoinAddress('https://kits.example.org')).toBe('kits.example.org/join');
    expect(classJoinAddress('http://127.0.0.1:4321/')).toBe('127.0.0.1:4321/join');
  });
});
