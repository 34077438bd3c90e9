/**
 * The engine's refusal of a scale at which a piece falls below the buildability floor (what nobody can cut),
 * in plain words with the solver's answer of what would work. Pure, so the label sweeps test the very refusal
 * the kit build and the builder's preview give.
 */
import { BUILD_GRADE_BAND_FLOOR, buildabilityShortfalls, buildabilityShortfallWords } from '../geometry/buildability';
import { InputError } from '../errors';
import { solvePaperScale } from '../layout/scale-solver';
import type { Piece } from '../geometry/types';
import type { KitRequest } from './kit-request';

/** Throws the solver's InputError when a piece falls below the buildability floor (what nobody can cut). */
export function kitScaleGuard(
  request: Pick<KitRequest, 'model' | 'sheetSizeId' | 'paperGsm' | 'scaleDenominator' | 'gradeBand'>,
  pieces: readonly Piece[],
): void {
  const worst = buildabilityShortfalls(pieces, BUILD_GRADE_BAND_FLOOR)[0];
  if (!worst) return;
  // The slow path (the solver searches for the smallest workable scale) runs only for a refused request.
  solvePaperScale(request.model, {
    sheetId: request.sheetSizeId,
    paperGsm: request.paperGsm,
    scaleDenominator: request.scaleDenominator,
    gradeBand: request.gradeBand,
  });
  throw new InputError(
    `At 1:${request.scaleDenominator} ${buildabilityShortfallWords(worst, BUILD_GRADE_BAND_FLOOR)}; choose a larger scale (a smaller N).`,
    { scaleDenominator: ['too small to cut and glue'] },
  );
}
