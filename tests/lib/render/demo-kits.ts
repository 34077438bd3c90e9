/** Every demo model laid out at the scales and paper sizes the label tests sweep (test-only helper). */
import { modelPatterns } from '../../../src/lib/geometry/model-patterns';
import { sheetPackKit } from '../../../src/lib/layout/sheet-packer';
import { SHEET_SIZES } from '../../../src/lib/layout/sheet-sizes';
import type { KitLayout } from '../../../src/lib/layout/types';
import { InputError } from '../../../src/lib/errors';
import { BUILD_GRADE_BAND_FLOOR, BUILDABILITY_MINIMUMS } from '../../../src/lib/geometry/buildability';
import { kitScaleGuard } from '../../../src/lib/kit/kit-scale-guard';
import { DEMO_IDS, demoModel } from '../geometry/fixtures';

/** The scales issue 10 names for the label sweep. */
export const SWEEP_SCALES = [10, 20, 25, 50] as const;
export const SWEEP_PAPER_IDS = Object.values(SHEET_SIZES)
  .filter((s) => s.kind === 'paper')
  .map((s) => s.id);

/**
 * One demo kit as the renderers get it; null when the packer refuses it (more than MAX_SHEETS sheets). Throws
 * the engine's InputError, as the kit build does, when a piece falls below the buildability floor.
 */
export function demoKit(id: string, scaleDenominator: number, sheetSizeId: string): KitLayout | null {
  const model = demoModel(id);
  const patterns = modelPatterns(model, { scaleDenominator, paperGsm: 160 });
  const { threads, substitutes } = patterns;
  const sheetSize = SHEET_SIZES[sheetSizeId as keyof typeof SHEET_SIZES];
  kitScaleGuard(
    { model, sheetSizeId: sheetSize.id, paperGsm: 160, scaleDenominator, gradeBand: '6-8' },
    patterns.pieces,
  );
  const units = sheetSize.id === 'letter' || sheetSize.id === 'legal' || sheetSize.id === 'tabloid' ? 'us' : 'metric';
  try {
    const { pieces, sheets } = sheetPackKit(patterns.pieces, {
      sheetSize,
      units,
      copies: 1,
      substitutes,
      paperGsm: 160,
    });
    return {
      title: id,
      scaleDenominator,
      sheetSize,
      units,
      pieces,
      sheets,
      threads,
      substitutes,
      gradeBand: '6-8',
      cutList: [],
      qrUrl: 'https://kitwright.example/k/demo',
      engineVersion: 'test',
    };
  } catch (error) {
    if (error instanceof InputError) return null;
    throw error;
  }
}

/**
 * The sweep's cases the engine refuses, each with the part it names and how many mm across that part would
 * be, worked out from the model file (the part's real size in mm over N) rather than taken from the engine.
 */
export const SWEEP_REFUSED = [
  // The puck's wall is as tall as the puck, 0.15 m (content/models/thermal-puck.json): 150 mm / 50.
  { id: 'thermal-puck', n: 50, part: 'Body wall', acrossMm: 150 / 50 },
  // Each solar panel is 0.1 m wide (content/models/wren-3u.json): 100 mm / 25 and 100 mm / 50.
  { id: 'wren-3u', n: 25, part: 'Solar panel +X', acrossMm: 100 / 25 },
  { id: 'wren-3u', n: 50, part: 'Solar panel +X', acrossMm: 100 / 50 },
] as const;

const refused = (id: string, n: number) => SWEEP_REFUSED.some((r) => r.id === id && r.n === n);

/** Every (model, scale, paper) case of the sweep as [name, id, scale, paper]. */
const SWEEP_ALL: [string, string, number, string][] = DEMO_IDS.flatMap((id) =>
  SWEEP_SCALES.flatMap((n) =>
    SWEEP_PAPER_IDS.map((p) => [`${id} 1:${n} ${p}`, id, n, p] as [string, string, number, string]),
  ),
);

/** The cases the engine builds, whose sheets the sweeps check. */
export const SWEEP_CASES = SWEEP_ALL.filter(([, id, n]) => !refused(id, n));

/** The cases below the buildability floor, which the sweeps check are refused in plain words. */
export const SWEEP_REFUSED_CASES = SWEEP_ALL.filter(([, id, n]) => refused(id, n));

/**
 * What is wrong with the engine's refusal of a case below the floor ([] when right): it must refuse in plain
 * words naming the part and its size against the adults' minimum, and the ratio it offers instead must build.
 */
export function sweepRefusalProblems(id: string, n: number, sheetSizeId: string): string[] {
  const { part, acrossMm } = SWEEP_REFUSED.find((r) => r.id === id && r.n === n)!;
  let message: string;
  try {
    demoKit(id, n, sheetSizeId);
    return [`1:${n} was built`];
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    message = error.message;
  }
  const floor = BUILDABILITY_MINIMUMS[BUILD_GRADE_BAND_FLOOR].pieceMm.toFixed(1);
  const words = `At 1:${n} the ${part} would be ${acrossMm.toFixed(1)} mm across (adults need ${floor} mm); 1:`;
  const offered = /^(\d+) is the smallest ratio at which every piece can be cut and glued\.$/.exec(
    message.slice(words.length),
  );
  if (!message.startsWith(words) || !offered) return [`refused in other words: "${message}"`];
  try {
    demoKit(id, Number(offered[1]), sheetSizeId);
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    return [`the offered 1:${offered[1]} is refused too: "${error.message}"`];
  }
  return [];
}
