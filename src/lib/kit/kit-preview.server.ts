/**
 * Server adapter behind the builder's calls: sheet previews of unsaved kits, the scale solver with its
 * explanations, and flat patterns, each from a demo model id or a model sent in the request.
 */
import { modelPatterns } from '../geometry/model-patterns';
import { sheetSize } from '../layout/sheet-sizes';
import { sheetPieceRoomMm } from '../layout/sheet-packer';
import { solveKitScale, solvePaperScale, type KitScale, type PaperScale } from '../layout/scale-solver';
import type { z } from 'zod';
import { contentHash } from './content-hash';
import { demoModelResolve } from './demo-models.server';
import {
  kitRequestOf,
  kitVenue,
  type KitInputs,
  type PatternsRequestSchema,
  type ScaleSolveRequestSchema,
} from './kit-inputs';
import { kitOutputBuild, type KitOutputBuildOptions, type KitTimingsMs } from './kit-build.server';
import { kitScaleGuard } from './kit-scale-guard';
import { KitCache } from './kit-cache.server';
import { workRun } from '../work/work-pool.server';
import { kitSummary, type KitSummary } from './kit-summary';
import type { KitOutput } from './build-kit';
import { kitPrintScale, kitPrintView, type KitPrintView } from './kit-print';
import type { KitRequest } from './kit-request';
import { AppError } from '../errors';
import { kitSheetNotes, type KitSheetNotes } from './sheet-notes';

export interface KitPreview {
  contentHash: string;
  title: string;
  scaleDenominator: number;
  sheetSizeLabel: string;
  sheetCount: number;
  /** Kits (one per team) the sheets are for. */
  copies: number;
  /** One SVG document per sheet, in order. */
  sheets: string[];
  /** Buildability and substitute notes on the pieces of each sheet, with where each piece sits. */
  notes: KitSheetNotes;
  summary: KitSummary;
  /** The STL's print plate on the chosen bed, or why none fits. */
  print: KitPrintView | { error: string };
  timingsMs: KitTimingsMs;
}

/** Sheets and summary of an unsaved kit; it has no page yet, so its sheets print a note where the QR code goes. */
export async function kitPreview(inputs: KitInputs, options: KitOutputBuildOptions = {}): Promise<KitPreview> {
  const resolved = demoModelResolve(inputs);
  const { model } = resolved;
  const request = kitRequestOf(inputs, resolved, null);
  const venue = kitVenue(inputs.venue);
  const { build, timingsMs } = await kitOutputBuild(request, 'svg', options);
  const size = sheetSize(request.sheetSizeId);
  return {
    contentHash: build.contentHash,
    title: build.layout.title,
    scaleDenominator: request.scaleDenominator,
    sheetSizeLabel: size.label,
    sheetCount: build.layout.sheets.length,
    copies: request.copies,
    sheets: build.svgSheets ?? [],
    notes: kitSheetNotes(build.layout),
    summary: kitSummary({
      model,
      scaleDenominator: request.scaleDenominator,
      sheetLabel: size.label,
      venue,
      units: request.units,
    }),
    print: kitPreviewPrint(request),
    timingsMs,
  };
}

function kitPreviewPrint(request: KitRequest): KitPrintView | { error: string } {
  try {
    return kitPrintView(request, kitPrintScale(request));
  } catch (err) {
    if (err instanceof AppError) return { error: err.message };
    throw err;
  }
}

/**
 * One file of an unsaved kit (the builder's downloads before saving), with no QR code: the kit has no page yet.
 * Returns the request it was built from too, which names the file.
 */
export async function kitPreviewFile(inputs: KitInputs, output: KitOutput, options: KitOutputBuildOptions = {}) {
  const request = kitRequestOf(inputs, demoModelResolve(inputs), null);
  return { request, build: (await kitOutputBuild(request, output, options)).build };
}

/** Flat pieces and wire boom threads at a scale; 400 when a piece or tab would be too small to cut. */
export type KitPatternsInput = z.infer<typeof PatternsRequestSchema>;
export type KitScaleSolveInput = z.infer<typeof ScaleSolveRequestSchema>;

/** Flat pieces of a model at a scale, checked against the scale guard (CPU work: the pool runs it). */
export function kitPatterns(input: KitPatternsInput) {
  const resolved = demoModelResolve(input);
  const result = modelPatterns(resolved.model, {
    scaleDenominator: input.scaleDenominator,
    paperGsm: input.paperGsm,
    gradeBand: input.gradeBand,
    pieceMaxMm: sheetPieceRoomMm(sheetSize(input.sheetSizeId), 'metric'),
  });
  kitScaleGuard(kitRequestOf({ ...input, copies: 1, units: 'metric' }, resolved, null), result.pieces);
  return result;
}

export interface ScaleSolution {
  /** The scale the builder suggests: one for paper and venue, else the paper model's scale. */
  suggestedScaleDenominator: number;
  kit: KitScale;
  /** The teacher's own scale checked against the sheet, when one was sent. */
  checked: PaperScale | null;
  summary: KitSummary;
}

const solveCache = new KitCache<ScaleSolution>(() => 20_000);

/** The solver's answer with explanations; 400 when a requested scale makes parts too small. */
export async function kitScaleSolve(input: KitScaleSolveInput): Promise<ScaleSolution> {
  const { model } = demoModelResolve(input);
  const key = await contentHash({ ...input, model, solver: 2 });
  return solveCache.get(key, async () => (await workRun({ kind: 'kit-scale-solve', input })) as ScaleSolution);
}

/** The scale search itself (CPU work: the pool runs it; kitScaleSolve caches its answers). */
export function kitScaleSolveCompute(input: KitScaleSolveInput): ScaleSolution {
  const { model } = demoModelResolve(input);
  const venue = kitVenue(input.venue);
  const req = {
    sheetId: input.sheetSizeId,
    paperGsm: input.paperGsm,
    ratios: input.ratios,
    gradeBand: input.gradeBand,
    units: input.units,
  };
  const kit = solveKitScale(model, req, venue, input.units);
  const checked =
    input.scaleDenominator === undefined
      ? null
      : solvePaperScale(model, { ...req, scaleDenominator: input.scaleDenominator });
  const suggested = kit.scaleDenominator ?? kit.paper.scaleDenominator;
  const summary = kitSummary({
    model,
    scaleDenominator: input.scaleDenominator ?? suggested,
    sheetLabel: sheetSize(input.sheetSizeId).label,
    venue,
    units: input.units,
  });
  return { suggestedScaleDenominator: suggested, kit, checked, summary };
}
