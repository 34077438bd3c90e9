/**
 * Confidence intervals for a proportion of successes in n trials and for the difference of two such
 * proportions, and the textbook sample size for a wanted half-width. Sources:
 * - Wilson score interval: Wilson, J. Am. Stat. Assoc. 22 (1927) 209–212; Newcombe, Statistics in
 *   Medicine 17 (1998) 857–872, method 3.
 * - Clopper–Pearson "exact" interval: Clopper & Pearson, Biometrika 26 (1934) 404–413; Newcombe 1998,
 *   method 5. Its bounds are beta quantiles, B⁻¹(α/2; x, n − x + 1) and B⁻¹(1 − α/2; x + 1, n − x).
 * - Difference of two independent proportions: Newcombe, Statistics in Medicine 17 (1998) 873–890,
 *   method 10 (hybrid score: each Wilson interval's distance from its estimate, added in quadrature).
 * - Sample size: n = z²·p(1 − p)/E² for a half-width E (any introductory statistics text, e.g. Moore,
 *   McCabe & Craig, Introduction to the Practice of Statistics, "choosing the sample size").
 * Proportions are fractions 0…1; counts are whole numbers with 0 ≤ x ≤ n and n ≥ 1.
 */
import { betaRegularizedInverse } from './beta-function';

/** The standard normal quantile for a two-sided 95 % interval, z₀.₉₇₅ (Abramowitz & Stegun, Table 26.5: 1.959964). */
export const Z_95 = 1.959963984540054;
/** Confidence level of every interval the tools report. */
export const CONFIDENCE_LEVEL = 0.95;

export interface ProportionInterval {
  lower: number;
  upper: number;
}

function countsCheck(x: number, n: number): void {
  if (!Number.isInteger(x) || !Number.isInteger(n) || n < 1 || x < 0 || x > n) {
    throw new RangeError(`binomial interval: needs whole counts with 0 ≤ x ≤ n and n ≥ 1; got x = ${x}, n = ${n}`);
  }
}

/**
 * Wilson score interval of x successes in n trials (fractions); 0 of n gives a lower bound of exactly 0
 * and n of n an upper bound of exactly 1. Throws RangeError for counts that are not 0 ≤ x ≤ n, n ≥ 1.
 */
export function binomialWilsonInterval(x: number, n: number, z = Z_95): ProportionInterval {
  countsCheck(x, n);
  const z2 = z * z;
  const centre = (x + z2 / 2) / (n + z2);
  const half = (z * Math.sqrt((x * (n - x)) / n + z2 / 4)) / (n + z2);
  return { lower: x === 0 ? 0 : centre - half, upper: x === n ? 1 : centre + half };
}

/**
 * Clopper–Pearson (exact) interval of x successes in n trials at `confidence` (fractions), from the
 * beta quantiles. Throws RangeError for counts that are not 0 ≤ x ≤ n, n ≥ 1.
 */
export function binomialClopperPearsonInterval(
  x: number,
  n: number,
  confidence = CONFIDENCE_LEVEL,
): ProportionInterval {
  countsCheck(x, n);
  const alpha = 1 - confidence;
  return {
    lower: x === 0 ? 0 : betaRegularizedInverse(alpha / 2, x, n - x + 1),
    upper: x === n ? 1 : betaRegularizedInverse(1 - alpha / 2, x + 1, n - x),
  };
}

export interface ProportionDifference extends ProportionInterval {
  /** p₁ − p₂ as a fraction (−1…1). */
  difference: number;
}

/**
 * Newcombe's hybrid score interval (method 10) for p₁ − p₂ of two independent groups, x₁ of n₁ and
 * x₂ of n₂, built from the two Wilson intervals; bounds stay within −1…1.
 */
export function proportionDifferenceNewcombe(
  x1: number,
  n1: number,
  x2: number,
  n2: number,
  z = Z_95,
): ProportionDifference {
  const p1 = x1 / n1;
  const p2 = x2 / n2;
  const w1 = binomialWilsonInterval(x1, n1, z);
  const w2 = binomialWilsonInterval(x2, n2, z);
  const difference = p1 - p2;
  return {
    difference,
    lower: Math.max(-1, difference - Math.hypot(p1 - w1.lower, w2.upper - p2)),
    upper: Math.min(1, difference + Math.hypot(w1.upper - p1, p2 - w2.lower)),
  };
}

/**
 * Trials needed for a 95 % interval of half-width `halfWidth` (a fraction, 0.1 = ±10 points) around a
 * proportion near `planningRate`: ⌈z²·p(1 − p)/E²⌉, at least 1. A planning rate of 0.5 gives the largest
 * number (the usual worst case).
 */
export function binomialTrialsForHalfWidth(planningRate: number, halfWidth: number, z = Z_95): number {
  if (!(planningRate >= 0 && planningRate <= 1) || !(halfWidth > 0 && halfWidth < 1)) {
    throw new RangeError(`sample size: needs 0 ≤ rate ≤ 1 and 0 < half-width < 1; got ${planningRate}, ${halfWidth}`);
  }
  // The tiny slack keeps an exact integer (e.g. 96.04 → 97, but 1.96²·0.25/0.098² = 100 exactly) from
  // being pushed up by rounding error.
  return Math.max(1, Math.ceil((z * z * planningRate * (1 - planningRate)) / (halfWidth * halfWidth) - 1e-9));
}
