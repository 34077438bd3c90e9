/**
 * The home page's worked example: the demo probe on US Letter card stock at 1:20, told in the scale solver's
 * own words (sheet count, smallest piece, whether a middle-school class can build it), so the page can only
 * say what the engine does. Pure: the page passes the demo model in.
 */
import type { Model } from '../geometry/model-schema';
import { solvePaperScale } from '../layout/scale-solver';
import type { SheetSizeId } from '../layout/sheet-sizes';
import { PAPER_GSM_DEFAULT } from '../geometry/paper';

/** The example's inputs: the demo model, its scale and the builder's default paper. */
export const HOME_EXAMPLE = {
  modelId: 'skein-probe',
  scaleDenominator: 20,
  sheetSizeId: 'letter' as SheetSizeId,
  paperGsm: PAPER_GSM_DEFAULT,
} as const;

const solved = new WeakMap<Model, string>();

/**
 * What the example's kit is, in the solver's words ("1:20 on 3 US Letter sheets: …"); remembered per model
 * object, since the solver takes a fifth of a second and the demo model does not change while the server runs.
 */
export function homeExampleText(model: Model): string {
  const known = solved.get(model);
  if (known !== undefined) return known;
  const { scaleDenominator, sheetSizeId, paperGsm } = HOME_EXAMPLE;
  const text = solvePaperScale(model, { sheetId: sheetSizeId, paperGsm, scaleDenominator }).explanation;
  solved.set(model, text);
  return text;
}
