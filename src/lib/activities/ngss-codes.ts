/**
 * NGSS performance expectation codes, checked by pattern: a grade (K–5), a band (K-2, 3-5 for engineering)
 * or a level (MS, HS), a discipline and its core idea, and the expectation's number. The ranges are the
 * published ones for the engineering design expectations (NGSS Lead States 2013, "Engineering Design":
 * K-2-ETS1-1…3, 3-5-ETS1-1…3, MS-ETS1-1…4, HS-ETS1-1…4); other numbers are only checked for shape.
 */

const NGSS_CODE_PATTERNS: readonly RegExp[] = [
  /^(K-2|3-5)-ETS1-[1-3]$/,
  /^(MS|HS)-ETS1-[1-4]$/,
  /^(K|[1-5])-(PS[1-4]|LS[1-4]|ESS[1-3])-[1-9]$/,
  /^(MS|HS)-(PS[1-4]|LS[1-4]|ESS[1-3])-[1-9]$/,
];

/** Examples quoted by the schema's error message. */
export const NGSS_CODE_EXAMPLES = ['MS-ETS1-2', '3-PS2-3', 'HS-PS2-5', '3-5-ETS1-1'] as const;

/** True when `code` has the shape of an NGSS performance expectation code (case and spacing must match). */
export function ngssCodeValid(code: string): boolean {
  return NGSS_CODE_PATTERNS.some((p) => p.test(code));
}

/** The grade level a code belongs to: 'K-2', '3-5', 'MS', 'HS', or the single grade ('K', '3' …); null if invalid. */
export function ngssCodeLevel(code: string): string | null {
  if (!ngssCodeValid(code)) return null;
  return code.startsWith('K-2-') ? 'K-2' : code.startsWith('3-5-') ? '3-5' : code.split('-')[0]!;
}
