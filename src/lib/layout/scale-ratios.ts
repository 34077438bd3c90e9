/** The usual scale ratios offered to teachers, as denominators of 1:N, largest scale first. */
export const USUAL_SCALE_DENOMINATORS = [1, 2, 5, 10, 20, 25, 50, 100, 200, 500] as const;

/** The largest usual scale at or below 1:minDenominator (smallest usual N ≥ minDenominator), or null past 1:500. */
export function scaleUsualAtLeast(minDenominator: number): number | null {
  return USUAL_SCALE_DENOMINATORS.find((n) => n >= minDenominator) ?? null;
}
