/**
 * ISO 14644-1:2015 (Cleanrooms — Classification of air cleanliness by particle concentration): the class
 * limits of Table 1 and the minimum number of sampling locations of Annex A, Table A.1.
 */

/** The particle sizes (µm) Table 1 lists. */
export const ISO_14644_SIZES_UM = [0.1, 0.2, 0.3, 0.5, 1, 5] as const;
export type Iso14644SizeUm = (typeof ISO_14644_SIZES_UM)[number];
/** The integer ISO classes Table 1 lists. */
export const ISO_14644_CLASSES = [1, 2, 3, 4, 5, 6, 7, 8, 9] as const;

// Table 1 (2015) leaves a cell blank where classification is inappropriate (low counts, sampling losses
// above 1 µm, or concentrations too high to count): the class is not defined at that size. This lists the
// filled cells; e.g. the 1999 edition's Class 5 at 5 µm (29) is blank in 2015.
// from memory: filled cells of ISO 14644-1:2015 Table 1 — check against the standard.
const DEFINED: Record<number, readonly Iso14644SizeUm[]> = {
  1: [0.1],
  2: [0.1, 0.2, 0.3],
  3: [0.1, 0.2, 0.3, 0.5],
  4: [0.1, 0.2, 0.3, 0.5, 1],
  5: [0.1, 0.2, 0.3, 0.5, 1],
  6: [0.1, 0.2, 0.3, 0.5, 1, 5],
  7: [0.5, 1, 5],
  8: [0.5, 1, 5],
  9: [0.5, 1, 5],
};

/** True when Table 1 fills the cell of ISO class `classN` (1 … 9) at `sizeUm`. */
export function iso14644Defined(classN: number, sizeUm: number): boolean {
  return (DEFINED[classN] ?? []).includes(sizeUm as Iso14644SizeUm);
}

/** Unrounded class limit Cn = 10^N × (0.1/D)^2.08, particles/m³ of size ≥ D µm (ISO 14644-1:2015, eq. 1). */
export function iso14644LimitExact(classN: number, sizeUm: number): number {
  return 10 ** classN * (0.1 / sizeUm) ** 2.08;
}

/**
 * Class limit as Table 1 prints it, particles/m³: Cn rounded to no more than three significant figures
 * and to a whole number (from memory: the rounding rule stated with the formula in the 1999 edition,
 * §3.2; it reproduces 24 for Class 2 at 0.2 µm and 83 for Class 4 at 1 µm). Null where the cell is blank.
 */
export function iso14644Limit(classN: number, sizeUm: number): number | null {
  if (!iso14644Defined(classN, sizeUm)) return null;
  return Math.round(Number(iso14644LimitExact(classN, sizeUm).toPrecision(3)));
}

// Annex A, Table A.1: [largest area in m², minimum number of sampling locations].
// from memory: ISO 14644-1:2015 Table A.1 rows — check against the standard.
// prettier-ignore
const TABLE_A1: readonly (readonly [number, number])[] = [
  [2, 1], [4, 2], [6, 3], [8, 4], [10, 5], [24, 6], [28, 7], [32, 8], [36, 9], [52, 10],
  [56, 11], [64, 12], [68, 13], [72, 14], [76, 15], [104, 16], [108, 17], [116, 18], [148, 19],
  [156, 20], [192, 21], [232, 22], [276, 23], [352, 24], [436, 25], [636, 26], [1000, 27],
];

/**
 * Minimum number of sampling locations for a floor area in m² (ISO 14644-1:2015, Annex A, Table A.1:
 * the first row whose area is at least the room's); above 1000 m², NL = 27 × A/1000 rounded up (the
 * formula the annex gives there, eq. A.1). Areas ≤ 0 give 1.
 */
export function iso14644SamplingLocations(areaM2: number): number {
  for (const [maxArea, locations] of TABLE_A1) if (areaM2 <= maxArea) return locations;
  return Math.ceil((27 * areaM2) / 1000);
}

/**
 * Smallest single-sample volume in litres so that 20 particles would be counted at the class limit of the
 * largest size considered: Vs = 20/Cn,m × 1000, at least 2 L (from memory: ISO 14644-1:2015, A.4.4, which
 * also asks for at least 1 min of sampling). Null where the class is not defined at that size.
 */
export function iso14644MinSampleVolumeL(classN: number, largestSizeUm: number): number | null {
  const limit = iso14644Limit(classN, largestSizeUm);
  return limit === null ? null : Math.max(2, (20 / limit) * 1000);
}
