/**
 * What a class journal entry stores when a tool's result is saved: the tool, a short summary of the
 * inputs, the result data and one plot, all bounded in size. The per-tool builders are in
 * saved-result-tools.ts.
 */
import { z } from 'zod';
import { InputError } from '../errors';
import { readingsFinite } from './reading-range';
import { TextSchema } from '../text-schema';

/** Most points a saved plot series may hold; longer series are downsampled. */
export const SAVED_RESULT_MAX_POINTS = 2_000;
export const SAVED_RESULT_MAX_SERIES = 12;
/** Longest label of a saved plot series, characters. */
export const SAVED_SERIES_LABEL_MAX = 60;
/** Largest serialised saved result, bytes (checked by savedResultParse). */
export const SAVED_RESULT_MAX_BYTES = 400_000;
/** Version of the computations in src/lib/analysis; bump when a result would change. */
export const ANALYSIS_TOOL_VERSION = '1.0.0';

export const SAVED_RESULT_TOOLS = [
  'vibration',
  'psd-profile',
  'thermal',
  'cleanroom',
  'magnetic',
  'orbit-eclipse',
  'equilibrium-temperature',
  'deployment',
  'interference',
  'four-point',
  'launch-stack',
] as const;

const text = (max: number) => TextSchema.trim().max(max);
const point = z.tuple([z.number().finite(), z.number().finite()]);

export const SavedPlotSchema = z
  .object({
    kind: z.enum(['line', 'loglog', 'bar']),
    title: text(120),
    xLabel: text(60),
    yLabel: text(60),
    series: z
      .array(
        z.object({ label: text(SAVED_SERIES_LABEL_MAX), points: z.array(point).max(SAVED_RESULT_MAX_POINTS) }).strict(),
      )
      .max(SAVED_RESULT_MAX_SERIES),
  })
  .strict();

export const SavedResultSchema = z
  .object({
    tool: z.enum(SAVED_RESULT_TOOLS),
    toolVersion: text(20),
    /** One line a reader can scan, e.g. "3 axes, 100 Hz, 60 s". */
    inputsSummary: text(300),
    /** The tool's result object, JSON-serialisable. */
    result: z.record(z.unknown()),
    plot: SavedPlotSchema,
  })
  .strict()
  .refine(
    (v) => JSON.stringify(v).length <= SAVED_RESULT_MAX_BYTES,
    `a saved result may be at most ${SAVED_RESULT_MAX_BYTES} bytes`,
  );
export type SavedResult = z.infer<typeof SavedResultSchema>;
export type SavedPlot = z.infer<typeof SavedPlotSchema>;

/**
 * A series label of at most SAVED_SERIES_LABEL_MAX characters: `name` followed by `suffix` (" (fit)",
 * ": 95 % low"), the name shortened with an ellipsis where both would not fit, so a long name the tool accepted
 * still makes a valid saved plot and the suffix that tells two lines apart survives.
 */
export function seriesLabel(name: string, suffix = ''): string {
  if (name.length + suffix.length <= SAVED_SERIES_LABEL_MAX) return name + suffix;
  let kept = '';
  for (const ch of name) {
    if (kept.length + ch.length + 1 + suffix.length > SAVED_SERIES_LABEL_MAX) break;
    kept += ch;
  }
  return `${kept}…${suffix}`;
}

/**
 * Keeps at most `maxPoints` points of a series, as the minimum and maximum of equal-count buckets in
 * their original order, so peaks survive (a PSD's resonance, a temperature extreme); shorter series are
 * returned unchanged.
 */
export function seriesDownsample(points: [number, number][], maxPoints = SAVED_RESULT_MAX_POINTS): [number, number][] {
  if (points.length <= maxPoints) return points;
  const buckets = Math.floor(maxPoints / 2);
  const out: [number, number][] = [];
  for (let b = 0; b < buckets; b++) {
    const start = Math.floor((b * points.length) / buckets);
    const end = Math.floor(((b + 1) * points.length) / buckets);
    let lo = start;
    let hi = start;
    for (let i = start; i < end; i++) {
      if (points[i]![1] < points[lo]![1]) lo = i;
      if (points[i]![1] > points[hi]![1]) hi = i;
    }
    if (lo === hi) out.push(points[lo]!);
    else out.push(points[Math.min(lo, hi)]!, points[Math.max(lo, hi)]!);
  }
  return out;
}

/**
 * Validates and stamps a saved result with the analysis version; throws ZodError if a builder broke a bound. A
 * result holding Infinity or NaN is the inputs' doing (a reading range too wide for some tool), so it is a 400.
 */
export function savedResultBuild(
  tool: SavedResult['tool'],
  inputsSummary: string,
  result: object,
  plot: SavedPlot,
): SavedResult {
  if (!readingsFinite(result) || !readingsFinite(plot))
    throw new InputError(
      `These readings give a ${tool} result too large to compute (it overflows to infinity). ` +
        'Check for a misplaced decimal point or a wrong unit, and send readings an instrument could record.',
    );
  return SavedResultSchema.parse({ tool, toolVersion: ANALYSIS_TOOL_VERSION, inputsSummary, result, plot });
}
