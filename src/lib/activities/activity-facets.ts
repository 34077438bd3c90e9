/**
 * The facets the library filters on: grade bands, test kinds (each with the data tool it feeds) and time
 * bands. One list per facet, used by the schema, the filter, the filter form and the PDFs.
 */

/** US grade bands, as NGSS groups them (K-2, 3-5, middle school 6-8, high school 9-12). */
export const GRADE_BANDS = ['K-2', '3-5', '6-8', '9-12'] as const;
export type GradeBand = (typeof GRADE_BANDS)[number];

/** Kinds of test an activity runs; each has a data tool of the same name. */
export const TEST_KINDS = [
  'vibration',
  'thermal',
  'cleanroom',
  'magnetic',
  'scale',
  'deployment',
  'interference',
  'four-point',
  'launch-stack',
] as const;
export type TestKind = (typeof TEST_KINDS)[number];

/** Data tools a data-sheet column can feed (one per test kind). */
export const DATA_TOOLS = TEST_KINDS;
export type DataTool = TestKind;

export const TEST_KIND_LABELS: Record<TestKind, string> = {
  vibration: 'Shaking (vibration)',
  thermal: 'Hot and cold (thermal)',
  cleanroom: 'Clean room (particles)',
  magnetic: 'Magnetic fields',
  scale: 'Scale and size',
  deployment: 'Deployment (booms and panels)',
  interference: 'Interference (noisy devices)',
  'four-point': 'Four-point measurement (gradients)',
  'launch-stack': 'Launch stack (fit and balance)',
};

export const GRADE_BAND_LABELS: Record<GradeBand, string> = {
  'K-2': 'Grades K–2',
  '3-5': 'Grades 3–5',
  '6-8': 'Grades 6–8',
  '9-12': 'Grades 9–12',
};

/**
 * Time bands for the filter, by the longest activity each admits, minutes. A US class period is commonly
 * 45–55 minutes (common practice, no source), so "one period" stops at 55 and "two periods" at 110.
 */
export const TIME_BANDS = [
  { id: 'one-period', label: 'One class period (up to 55 min)', maxMinutes: 55 },
  { id: 'two-periods', label: 'Up to two periods (110 min)', maxMinutes: 110 },
  { id: 'any', label: 'Any length', maxMinutes: Number.POSITIVE_INFINITY },
] as const;
export type TimeBandId = (typeof TIME_BANDS)[number]['id'];

/** Minutes as a reader says them: "40 min", "1 h", "1 h 30 min"; non-positive or non-finite gives "—". */
export function minutesLabel(minutes: number): string {
  if (!Number.isFinite(minutes) || minutes <= 0) return '—';
  const m = Math.round(minutes);
  const h = Math.floor(m / 60);
  const rest = m % 60;
  if (h === 0) return `${rest} min`;
  return rest === 0 ? `${h} h` : `${h} h ${rest} min`;
}

/** Grade bands as one readable range ("Grades 3–8" for 3-5 and 6-8); gaps are listed ("Grades K–2, 6–8"). */
export function gradeBandsLabel(bands: readonly GradeBand[]): string {
  const sorted = GRADE_BANDS.filter((b) => bands.includes(b));
  if (sorted.length === 0) return '—';
  const runs: GradeBand[][] = [];
  for (const band of sorted) {
    const last = runs.at(-1);
    if (last && GRADE_BANDS.indexOf(last.at(-1)!) === GRADE_BANDS.indexOf(band) - 1) last.push(band);
    else runs.push([band]);
  }
  const range = (run: GradeBand[]) => `${run[0]!.split('-')[0]}–${run.at(-1)!.split('-')[1]}`;
  return `Grades ${runs.map(range).join(', ')}`;
}
