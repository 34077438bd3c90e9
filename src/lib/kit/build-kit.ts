/**
 * The kit pipeline: a validated request → patterns (model engine) → sheet layout → PDF, SVG per sheet,
 * STL and JSON, with a content hash of the inputs and engine version. Pure; the caller passes the font bytes.
 */
import { modelPatterns, type PatternOptions } from '../geometry/model-patterns';
import type { Model } from '../geometry/model-schema';
import type { Piece, WireBoomThread } from '../geometry/types';
import { BUILDABILITY_MINIMUMS } from '../geometry/buildability';
import type { PartSubstitute } from '../geometry/part-substitutes';
import { printPlateMesh } from '../layout/print-plate';
import { cutListRows } from '../layout/cut-list';
import { sheetPackKit, sheetPieceRoomMm } from '../layout/sheet-packer';
import { sheetSize } from '../layout/sheet-sizes';
import type { KitLayout } from '../layout/types';
import { kitJson } from '../render/kit-json';
import { pdfKit } from '../render/pdf-kit';
import type { PdfFonts } from '../render/pdf-kit';
import { stlBinary } from '../render/stl';
import { svgSheet } from '../render/svg-sheet';
import { contentHash } from './content-hash';
import { ENGINE_VERSION } from './engine-version';
import { kitMaterialLines } from './kit-materials';
import { kitPrintScale, kitPrintView, type KitPrintView } from './kit-print';
import type { KitRequest } from './kit-request';

/** The model engine as the pipeline uses it (src/lib/geometry provides it; tests may pass fixtures). */
export interface KitEngine {
  patterns(
    model: Model,
    options: PatternOptions,
  ): { pieces: Piece[]; threads: WireBoomThread[]; substitutes: PartSubstitute[] };
}

/** The model engine of src/lib/geometry. */
export const GEOMETRY_KIT_ENGINE: KitEngine = { patterns: modelPatterns };

export type KitStage = 'patterns' | 'layout' | 'pdf' | 'svg' | 'stl' | 'json';
export type KitOutput = 'pdf' | 'svg' | 'stl' | 'json';

export interface KitBuildOptions {
  /** The model engine; src/lib/geometry's modelPatterns when left out. */
  engine?: KitEngine;
  /** Which files to make; all four when left out. */
  outputs?: readonly KitOutput[];
  /** Called as each stage ends (fraction 1) and, for the PDF, as it starts (fraction 0). */
  onProgress?: (stage: KitStage, fraction: number) => void;
  /** Cancels between stages: the promise rejects with the signal's reason. */
  signal?: AbortSignal;
}

export interface KitBuild {
  layout: KitLayout;
  /** SHA-256 hex of the request and ENGINE_VERSION. */
  contentHash: string;
  pdf?: Uint8Array;
  svgSheets?: string[];
  /** The print plate of parts on the request's bed (laid flat, gluing order), as the STL holds it. */
  stl?: Uint8Array;
  /** The STL's scale, parts and substitutes in words (with the STL or the JSON). */
  print?: KitPrintView;
  json?: string;
}

/**
 * Builds a kit from a request already parsed by KitRequestSchema; throws InputError (from the engine or the
 * packer) when the request cannot make a kit, e.g. more than MAX_SHEETS sheets.
 */
export async function buildKit(request: KitRequest, fonts: PdfFonts, options: KitBuildOptions = {}): Promise<KitBuild> {
  const engine = options.engine ?? GEOMETRY_KIT_ENGINE;
  const outputs = new Set(options.outputs ?? ['pdf', 'svg', 'stl', 'json']);
  const step = async (stage: KitStage) => {
    options.onProgress?.(stage, 1);
    // A macrotask, not a microtask: streamed progress reaches the socket and a cancel lands between stages.
    await new Promise((resolve) => setTimeout(resolve, 0));
    options.signal?.throwIfAborted();
  };
  options.signal?.throwIfAborted();
  const hash = contentHash(request);
  const size = sheetSize(request.sheetSizeId);
  const patterns = engine.patterns(request.model, {
    scaleDenominator: request.scaleDenominator,
    paperGsm: request.paperGsm,
    gradeBand: request.gradeBand,
    pieceMaxMm: sheetPieceRoomMm(size, request.units),
  });
  const { threads, substitutes } = patterns;
  await step('patterns');
  const { pieces, sheets } = sheetPackKit(patterns.pieces, {
    sheetSize: size,
    units: request.units,
    copies: request.copies,
    substitutes,
    paperGsm: request.paperGsm,
  });
  const layout: KitLayout = {
    title: request.title ?? request.model.name,
    scaleDenominator: request.scaleDenominator,
    sheetSize: size,
    units: request.units,
    pieces,
    sheets,
    threads,
    substitutes,
    gradeBand: request.gradeBand,
    ...kitMaterialLines({ threads, substitutes, gradeBand: request.gradeBand, units: request.units }),
    smallestLabelMm: BUILDABILITY_MINIMUMS[request.gradeBand].labelMm,
    cutList: size.kind === 'stock' ? cutListRows(pieces, sheets) : [],
    qrUrl: request.qrUrl,
    instructionsAt: request.instructionsAt,
    engineVersion: ENGINE_VERSION,
  };
  await step('layout');
  const build: KitBuild = { layout, contentHash: await hash };
  if (outputs.has('pdf')) {
    options.onProgress?.('pdf', 0);
    build.pdf = pdfKit(layout, fonts);
    await step('pdf');
  }
  if (outputs.has('svg')) {
    build.svgSheets = sheets.map((sheet) => svgSheet(layout, sheet));
    await step('svg');
  }
  if (outputs.has('stl')) {
    const print = kitPrintScale(request);
    build.print = kitPrintView(request, print);
    build.stl = stlBinary(printPlateMesh(print.plate));
    await step('stl');
  }
  if (outputs.has('json')) {
    build.print ??= kitPrintView(request, kitPrintScale(request));
    build.json = kitJson(layout, build.contentHash, build.print);
    await step('json');
  }
  return build;
}
