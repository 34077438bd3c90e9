/**
 * Request ids (src/lib/http/request-id.ts): 12 lowercase hex digits, 48 random bits. Ten thousand ids repeat one
 * with probability about n²/2m = 10⁸ / (2 · 2⁴⁸) ≈ 2·10⁻⁷ (the birthday bound, e.g. Knuth TAOCP vol. 3 §6.4).
 */
import { describe, expect, it } from 'vitest';
import { requestIdNew } from '../../../src/lib/http/request-id';

describe('request id', () => {
  it('is 12 hex digits, and 10 000 of them are all different', () => {
    const ids = Array.from({ length: 10_000 }, requestIdNew);
    for (const id of ids.slice(0, 100)) expect(id).toMatch(/^[0-9a-f]{12}$/);
    expect(new Set(ids).size).toBe(ids.length);
  });

  it('uses every hex digit in every position (no fixed version or variant digit)', () => {
    const seen = Array.from({ length: 12 }, () => new Set<string>());
    for (let i = 0; i < 2_000; i += 1) [...requestIdNew()].forEach((c, p) => seen[p]!.add(c));
    // Each of 16 digits missing from a position in 2 000 draws: 16 · (15/16)²⁰⁰⁰ ≈ 10⁻⁵⁵.
    expect(seen.map((s) => s.size)).toEqual(Array(12).fill(16));
  });
});
