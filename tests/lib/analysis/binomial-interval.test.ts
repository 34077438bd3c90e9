import betaQuantile from '@stdlib/stats-base-dists-beta-quantile';
import binomialTest from '@stdlib/stats-binomial-test';
import { describe, expect, it } from 'vitest';
import { betaRegularized, betaRegularizedInverse } from '../../../src/lib/analysis/beta-function';
import {
  binomialClopperPearsonInterval,
  binomialTrialsForHalfWidth,
  binomialWilsonInterval,
  proportionDifferenceNewcombe,
  Z_95,
} from '../../../src/lib/analysis/binomial-interval';
import { seededRandom } from './seeded-random';

/*
 * Newcombe RG, "Two-sided confidence intervals for the single proportion: comparison of seven methods",
 * Statistics in Medicine 17 (1998) 857–872, Table II, method 3 (Wilson score, no continuity correction)
 * and method 5 (Clopper–Pearson exact), printed to 4 decimals. From memory: the four worked examples
 * 81/263, 15/148, 0/20 and 1/29; each value is also checked against @stdlib's exact binomial test below,
 * and the Wilson column agrees with independent reproductions of the table.
 */
const NEWCOMBE_1998A: [x: number, n: number, wilson: [number, number], exact: [number, number]][] = [
  [81, 263, [0.2553, 0.3662], [0.2527, 0.3676]],
  [15, 148, [0.0624, 0.1605], [0.0578, 0.1617]],
  [0, 20, [0, 0.1611], [0, 0.1684]],
  [1, 29, [0.0061, 0.1718], [0.0009, 0.1776]],
];

/** Rounding to the 4 decimals the paper prints: any value within half a unit of the 4th decimal. */
const HALF_4DP = 0.5e-4 + 1e-12;

describe('binomialWilsonInterval', () => {
  it.each(NEWCOMBE_1998A)('matches Newcombe 1998a Table II for %i of %i', (x, n, wilson) => {
    const w = binomialWilsonInterval(x, n);
    expect(Math.abs(w.lower - wilson[0])).toBeLessThanOrEqual(HALF_4DP);
    expect(Math.abs(w.upper - wilson[1])).toBeLessThanOrEqual(HALF_4DP);
  });

  it('gives exactly 0 for 0 of n and exactly 1 for n of n, with the closed form z²/(n + z²) beside it', () => {
    // Wilson 1927: at x = 0 the upper bound is z²/(n + z²); at x = n the lower bound is n/(n + z²).
    for (const n of [1, 2, 5, 20, 1000]) {
      const none = binomialWilsonInterval(0, n);
      const all = binomialWilsonInterval(n, n);
      expect(none.lower).toBe(0);
      expect(none.upper).toBeCloseTo((Z_95 * Z_95) / (n + Z_95 * Z_95), 14);
      expect(all.upper).toBe(1);
      expect(all.lower).toBeCloseTo(n / (n + Z_95 * Z_95), 14);
    }
  });

  it('reproduces the class example: 17 of 20 is likely between 64 % and 95 %', () => {
    const w = binomialWilsonInterval(17, 20);
    expect(Math.round(w.lower * 100)).toBe(64);
    expect(Math.round(w.upper * 100)).toBe(95);
  });

  it('refuses more successes than trials, negative and fractional counts', () => {
    expect(() => binomialWilsonInterval(21, 20)).toThrow(RangeError);
    expect(() => binomialWilsonInterval(-1, 20)).toThrow(RangeError);
    expect(() => binomialWilsonInterval(1.5, 20)).toThrow(RangeError);
    expect(() => binomialWilsonInterval(0, 0)).toThrow(RangeError);
  });
});

describe('binomialClopperPearsonInterval', () => {
  it.each(NEWCOMBE_1998A)('matches Newcombe 1998a Table II (exact method) for %i of %i', (x, n, _w, exact) => {
    const cp = binomialClopperPearsonInterval(x, n);
    expect(Math.abs(cp.lower - exact[0])).toBeLessThanOrEqual(HALF_4DP);
    expect(Math.abs(cp.upper - exact[1])).toBeLessThanOrEqual(HALF_4DP);
  });

  it('agrees with @stdlib/stats-binomial-test (exact test, Clopper–Pearson interval) to 1e-9, 0 of n and n of n included', () => {
    const rnd = seededRandom(1998);
    const cases: [number, number][] = [
      [0, 1],
      [1, 1],
      [0, 2],
      [2, 2],
      [0, 20],
      [20, 20],
      [0, 1000],
      [1000, 1000],
      [17, 20],
      [500, 1000],
    ];
    for (let i = 0; i < 60; i++) {
      const n = 2 + Math.floor(rnd.uniform() * 999);
      cases.push([Math.floor(rnd.uniform() * (n + 1)), n]);
    }
    for (const [x, n] of cases) {
      const ours = binomialClopperPearsonInterval(x, n);
      const ref = binomialTest(x, n).ci as [number, number];
      expect(Math.abs(ours.lower - ref[0]), `${x}/${n} lower`).toBeLessThan(1e-9);
      expect(Math.abs(ours.upper - ref[1]), `${x}/${n} upper`).toBeLessThan(1e-9);
    }
  });

  it('is at least as wide as the Wilson interval on both sides for the worked examples', () => {
    // Newcombe 1998a, Table II: the exact interval contains the score interval in every example.
    for (const [x, n] of NEWCOMBE_1998A) {
      const cp = binomialClopperPearsonInterval(x, n);
      const w = binomialWilsonInterval(x, n);
      expect(cp.lower).toBeLessThanOrEqual(w.lower);
      expect(cp.upper).toBeGreaterThanOrEqual(w.upper);
    }
  });

  it('gives the closed forms at 0 of n and n of n: 1 − (α/2)^(1/n) and (α/2)^(1/n)', () => {
    // Clopper & Pearson 1934: with x = 0 the upper bound solves (1 − p)ⁿ = α/2.
    for (const n of [1, 5, 20, 300]) {
      expect(binomialClopperPearsonInterval(0, n).upper).toBeCloseTo(1 - 0.025 ** (1 / n), 12);
      expect(binomialClopperPearsonInterval(n, n).lower).toBeCloseTo(0.025 ** (1 / n), 12);
    }
  });
});

describe('betaRegularized and its inverse', () => {
  it('agree with @stdlib/stats-base-dists-beta-quantile at random whole parameters', () => {
    const rnd = seededRandom(42);
    for (let i = 0; i < 200; i++) {
      const a = 1 + Math.floor(rnd.uniform() * 800);
      const b = 1 + Math.floor(rnd.uniform() * 800);
      const q = 0.001 + 0.998 * rnd.uniform();
      const x = betaRegularizedInverse(q, a, b);
      expect(Math.abs(x - betaQuantile(q, a, b)), `q=${q} a=${a} b=${b}`).toBeLessThan(1e-9);
      expect(Math.abs(betaRegularized(x, a, b) - q)).toBeLessThan(1e-9);
    }
  });

  it('gives I_x(1, 1) = x and I_x(a, 1) = xᵃ (closed forms of the beta CDF)', () => {
    for (const x of [0, 0.1, 0.5, 0.93, 1]) {
      expect(betaRegularized(x, 1, 1)).toBeCloseTo(x, 14);
      expect(betaRegularized(x, 4, 1)).toBeCloseTo(x ** 4, 14);
    }
  });
});

/*
 * Newcombe RG, "Interval estimation for the difference between independent proportions: comparison of
 * eleven methods", Statistics in Medicine 17 (1998) 873–890, Table II, method 10 (score interval without
 * continuity correction, the "hybrid score"), to 4 decimals. From memory: examples (a), (b), (d), (e) and
 * (g); (c), (f) and (h) as given by independent reproductions of the table. Each row: x₁/n₁ − x₂/n₂.
 */
const NEWCOMBE_1998B: [number, number, number, number, number, number][] = [
  [56, 70, 48, 80, 0.0524, 0.3339], // (a)
  [9, 10, 3, 10, 0.1705, 0.809], // (b)
  [6, 7, 2, 7, 0.0582, 0.8062], // (c)
  [5, 56, 0, 29, -0.0381, 0.1926], // (d)
  [0, 10, 0, 20, -0.1611, 0.2775], // (e)
  [0, 10, 0, 10, -0.2775, 0.2775], // (f)
  [10, 10, 0, 20, 0.6791, 1], // (g)
  [10, 10, 0, 10, 0.6075, 1], // (h)
];

describe('proportionDifferenceNewcombe', () => {
  it.each(NEWCOMBE_1998B)('matches Newcombe 1998b Table II for %i/%i − %i/%i', (x1, n1, x2, n2, lo, hi) => {
    const d = proportionDifferenceNewcombe(x1, n1, x2, n2);
    expect(d.difference).toBeCloseTo(x1 / n1 - x2 / n2, 14);
    expect(Math.abs(d.lower - lo)).toBeLessThanOrEqual(HALF_4DP);
    expect(Math.abs(d.upper - hi)).toBeLessThanOrEqual(HALF_4DP);
  });

  it('is antisymmetric: swapping the groups mirrors the interval', () => {
    // Newcombe 1998b, method 10 is symmetric in the two groups by construction.
    for (const [x1, n1, x2, n2] of NEWCOMBE_1998B) {
      const ab = proportionDifferenceNewcombe(x1, n1, x2, n2);
      const ba = proportionDifferenceNewcombe(x2, n2, x1, n1);
      expect(ba.lower).toBeCloseTo(-ab.upper, 14);
      expect(ba.upper).toBeCloseTo(-ab.lower, 14);
    }
  });
});

describe('binomialTrialsForHalfWidth', () => {
  it('gives the textbook n = z²·p(1 − p)/E², rounded up', () => {
    // Worst case p = 0.5, E = 0.1: 1.96²·0.25/0.01 = 96.04 → 97 (the usual textbook answer; 100 with z ≈ 2).
    expect(binomialTrialsForHalfWidth(0.5, 0.1)).toBe(97);
    // p = 0.85: 3.8415·0.1275/0.01 = 48.98 → 49.
    expect(binomialTrialsForHalfWidth(0.85, 0.1)).toBe(49);
    // E = 0.03 at p = 0.5: 1067.1 → 1068 (the "±3 points" poll size).
    expect(binomialTrialsForHalfWidth(0.5, 0.03)).toBe(1068);
  });

  it('gives a Wald half-width of at most E at the answer and more than E one trial before', () => {
    // The formula inverts the Wald half-width z·√(p(1 − p)/n); checked against that definition directly.
    for (const p of [0.1, 0.3, 0.5, 0.77, 0.95]) {
      for (const e of [0.05, 0.1, 0.2]) {
        const n = binomialTrialsForHalfWidth(p, e);
        expect(Z_95 * Math.sqrt((p * (1 - p)) / n)).toBeLessThanOrEqual(e + 1e-12);
        if (n > 1) expect(Z_95 * Math.sqrt((p * (1 - p)) / (n - 1))).toBeGreaterThan(e);
      }
    }
  });

  it('refuses rates outside 0…1 and half-widths outside 0…1', () => {
    expect(() => binomialTrialsForHalfWidth(1.2, 0.1)).toThrow(RangeError);
    expect(() => binomialTrialsForHalfWidth(0.5, 0)).toThrow(RangeError);
    expect(() => binomialTrialsForHalfWidth(Number.NaN, 0.1)).toThrow(RangeError);
  });
});
