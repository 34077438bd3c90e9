/**
 * Server adapter: what the kit page and its handout show for a saved kit, computed from its saved inputs:
 * the summary, the assembly steps, and the pieces and boom scale the 3D preview island folds.
 */
import { activityPaperForSheet } from '../activities/activity-links';
import { modelPatterns } from '../geometry/model-patterns';
import { sheetPackKit, sheetPieceRoomMm } from '../layout/sheet-packer';
import { sheetSize } from '../layout/sheet-sizes';
import { boomScale } from '../preview/boom-scale';
import { assemblyRods, assemblySteps } from '../preview/assembly-steps';
import type { KitRow } from '../db/kits';
import { kitVenue } from './kit-inputs';
import { kitSummary } from './kit-summary';
import { kitMaterials } from './kit-materials';
import { kitRequestForRow, kitView } from './saved-kit.server';

/** The kit page's data for a kit row the actor may see. */
export async function kitPageData(row: KitRow) {
  const view = kitView(row);
  const request = await kitRequestForRow(row);
  const venue = kitVenue(row.inputs.venue);
  const patterns = modelPatterns(request.model, {
    scaleDenominator: request.scaleDenominator,
    paperGsm: request.paperGsm,
    gradeBand: request.gradeBand,
    pieceMaxMm: sheetPieceRoomMm(sheetSize(request.sheetSizeId), request.units),
  });
  const { threads, substitutes } = patterns;
  // The pieces as printed: cut at folds where the sheet is too small, so the steps match the PDF's.
  const { pieces } = sheetPackKit(patterns.pieces, {
    sheetSize: sheetSize(request.sheetSizeId),
    units: request.units,
    copies: 1,
    substitutes,
    paperGsm: request.paperGsm,
  });
  const rods = assemblyRods(substitutes);
  const sheetLabel = sheetSize(request.sheetSizeId).label;
  return {
    view,
    sheetLabel,
    activityPaper: activityPaperForSheet(request.sheetSizeId),
    paperGsm: request.paperGsm,
    summary: kitSummary({
      model: request.model,
      scaleDenominator: request.scaleDenominator,
      sheetLabel,
      venue,
      units: request.units,
    }),
    steps: assemblySteps(pieces, rods),
    threads,
    materials: kitMaterials({ threads, substitutes, gradeBand: request.gradeBand, units: request.units }),
    preview: {
      title: view.title,
      scaleDenominator: request.scaleDenominator,
      pieces,
      rods,
      boomScale: boomScale(request.model, request.scaleDenominator, request.units),
    },
  };
}
