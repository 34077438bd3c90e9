/**
 * Packing a kit's pieces onto sheets. Each piece is first turned to its smallest bounding box
 * (piece-orientation.ts), then the boxes are packed with quarter turns by the MaxRects best-short-side-fit
 * heuristic (Jylänki, "A Thousand Ways to Pack the Bin", 2010) of maxrects-packer, one sheet after another,
 * around the sheet furniture. Boxes that do not overlap hold pieces that do not overlap. Cut-to-length
 * gauges for rods that replace thin booms (cut-gauge.ts) are packed like pieces too, never turned, so their
 * captions read across the sheet.
 *
 * The packing rule (issue 10):
 * 1. A piece that fits a sheet is placed whole on one sheet, never split across sheets.
 * 2. A piece too large for a sheet is cut at a fold into parts joined by a numbered tab (piece-split.ts,
 *    through sheetPackKit), as many parts as it takes; only a piece no fold can cut (a cap, a rolled tube,
 *    a panel of life-size stock) is tiled with overlaps and lettered alignment marks (tiling.ts).
 * 3. Sheets are filled one after another, each taking every remaining item that still fits, in four orders
 *    (longest side, area, height, width first); the order needing fewest sheets wins, then the one whose
 *    emptiest sheet is fullest.
 * 4. A sheet after the first that is mostly blank (under SHEET_SPARSE_FILL of its printable area under
 *    pieces) is emptied onto the other sheets when every item on it finds room there.
 */
import { MaxRectsBin, Rectangle } from 'maxrects-packer/dist/maxrects-packer.mjs';
import { InputError } from '../errors';
import { pieceSplit } from '../geometry/piece-split';
import type { Piece } from '../geometry/types';
import type { PartSubstitute } from '../geometry/part-substitutes';
import { CUT_GAUGE_HEIGHT_MM, CUT_GAUGE_MIN_WIDTH_MM, cutGaugeParts, type CutGaugePart } from './cut-gauge';
import { freeSpaceRects } from './free-space';
import { pieceOrientationForTilesRad, pieceOrientationRad } from './piece-orientation';
import { placementAtCorner, placementBounds } from './placement';
import { SHEET_MARGIN_MM } from './sheet-sizes';
import { sheetFurnitureLayout, sheetFurniturePrintable } from './sheet-furniture';
import { TILE_CAPTION_MM, TILE_OVERLAP_MM, tilingPiece } from './tiling';
import type { PieceTile } from './tiling';
import type { KitLayout, LaidOutSheet, RectMm, SheetSize } from './types';

/** The most sheets one kit may have; more is refused with advice (issue 4). */
export const MAX_SHEETS = 200;
/** Space kept between neighbouring pieces so each can be cut round, mm (common practice, no source). */
export const PIECE_SPACING_MM = 4;

export interface SheetPackOptions {
  sheetSize: SheetSize;
  units: KitLayout['units'];
  /** Kits per class (one per team): every piece is laid out this many times. */
  copies: number;
  spacingMm?: number;
  marginMm?: number;
  overlapMm?: number;
  /** Parts replaced by something else: each rod gets a cut-to-length gauge printed on a sheet. */
  substitutes?: readonly PartSubstitute[];
}

interface PackItem {
  /** The piece, or null for a gauge. */
  piece: Piece | null;
  rotationRad: number;
  widthMm: number;
  heightMm: number;
  /** A tile of a large piece, laid out with its window's top-left corner at the sheet origin. */
  tile?: PieceTile;
  /** A gauge part instead of a piece. */
  gauge?: CutGaugePart;
}

/**
 * Sheets holding `copies` of every piece, inside the printable margin and clear of the furniture, numbered
 * from 1; no pieces gives one empty sheet (it still carries the legend). Tiles of large pieces are packed
 * like pieces (without quarter turns), so short tiles share sheets. Throws InputError when more than
 * MAX_SHEETS would be needed.
 */
export function sheetPack(pieces: readonly Piece[], options: SheetPackOptions): LaidOutSheet[] {
  const spacing = options.spacingMm ?? PIECE_SPACING_MM;
  const { printable, furniture, freeFirst, freeOther } = sheetPackSpace(pieces.length, options);
  // A tile must fit the largest free area of a sheet without a legend (below its caption), or a full-size
  // tile could never be placed.
  const largestFree = freeOther.reduce((a, r) => (r.widthMm * r.heightMm > a.widthMm * a.heightMm ? r : a));
  const tileWindow: RectMm = {
    xMm: 0,
    yMm: 0,
    widthMm: largestFree.widthMm,
    heightMm: largestFree.heightMm - TILE_CAPTION_MM,
  };
  const overlap = options.overlapMm ?? TILE_OVERLAP_MM;
  const items: PackItem[] = [];
  let letter = 0;
  for (const piece of pieces) {
    const item = sheetPackItem(piece);
    if (freeOther.some((r) => boxFits(item, r))) {
      for (let copy = 0; copy < options.copies; copy++) items.push(item);
      continue;
    }
    const tiledRad = pieceOrientationForTilesRad(piece.outlineMm, tileWindow, overlap);
    for (let copy = 0; copy < options.copies; copy++) {
      for (const tile of tilingPiece(piece, tiledRad, tileWindow, overlap, letter)) {
        letter += tile.alignmentMarks.length / 2;
        const w = tile.placement.tile!.windowMm;
        items.push({ piece, rotationRad: tiledRad, widthMm: w.widthMm, heightMm: w.heightMm + TILE_CAPTION_MM, tile });
      }
    }
  }
  // Gauges: once per kit (one rod each per copy is cut against the same bar), as wide as a free row allows.
  const widest = Math.max(...freeOther.map((r) => r.widthMm));
  for (const gauge of cutGaugeParts(options.substitutes ?? [], widest))
    items.push({
      piece: null,
      rotationRad: 0,
      widthMm: Math.max(gauge.toMm - gauge.fromMm, CUT_GAUGE_MIN_WIDTH_MM),
      heightMm: CUT_GAUGE_HEIGHT_MM,
      gauge,
    });
  const usableArea = freeOther.reduce((a, r) => Math.max(a, r.widthMm * r.heightMm), 0);
  const area = items.reduce((a, i) => a + (i.widthMm + spacing) * (i.heightMm + spacing), 0);
  const lowerBound = Math.ceil(area / usableArea);
  if (lowerBound > MAX_SHEETS) throw sheetPackTooMany(lowerBound, pieces, options);

  const run = { printable, freeFirst, freeOther, spacing, furniture };
  // Several orders, keeping the one that needs fewest sheets and then leaves its emptiest sheet fullest.
  let best: PackEntry[][] | null = null;
  for (const order of PACK_ORDERS) {
    const packed = sheetPackRun([...items].sort(order), run);
    if (!best || sheetPackBetter(packed, best, printable)) best = packed;
  }
  const sheets = sheetPackEmptySparse(best!, run).map((entries, i) => {
    const sheet = emptySheet(i + 1, options.sheetSize, printable);
    for (const { item, x, y, rot } of entries) {
      if (item.gauge) (sheet.gauges ??= []).push({ ...item.gauge, xMm: x, yMm: y });
      else if (item.tile) sheetPackTile(sheet, item.tile, x, y);
      else if (item.piece) {
        const rotationRad = rot ? item.rotationRad + Math.PI / 2 : item.rotationRad;
        sheet.placements.push({ pieceId: item.piece.id, ...placementAtCorner(item.piece, rotationRad, x, y) });
      }
    }
    return sheet;
  });
  if (sheets.length > MAX_SHEETS) throw sheetPackTooMany(sheets.length, pieces, options);
  return sheets;
}

/** An item placed on a sheet: its box's top-left corner and whether it was given a quarter turn. */
interface PackEntry {
  item: PackItem;
  x: number;
  y: number;
  rot: boolean;
}

interface PackRun {
  printable: RectMm;
  freeFirst: RectMm[];
  freeOther: RectMm[];
  spacing: number;
  furniture: { first: RectMm[]; other: RectMm[] };
}

type PackOrder = (a: PackItem, b: PackItem) => number;
const longSide = (i: PackItem) => Math.max(i.widthMm, i.heightMm);
const boxArea = (i: PackItem) => i.widthMm * i.heightMm;
/** Longest side first (ties: larger area), then largest area, then tallest, then widest. */
const PACK_ORDERS: PackOrder[] = [
  (a, b) => longSide(b) - longSide(a) || boxArea(b) - boxArea(a),
  (a, b) => boxArea(b) - boxArea(a) || longSide(b) - longSide(a),
  (a, b) => b.heightMm - a.heightMm || b.widthMm - a.widthMm,
  (a, b) => b.widthMm - a.widthMm || b.heightMm - a.heightMm,
];

/** One pass of sheet after sheet, each taking every remaining item that still fits it, in order. */
function sheetPackRun(items: readonly PackItem[], run: PackRun): PackEntry[][] {
  const sheets: PackEntry[][] = [];
  let remaining = items;
  while (remaining.length > 0 || sheets.length === 0) {
    const entries: PackEntry[] = [];
    const bin = sheetPackBin(run, sheets.length === 0 ? run.freeFirst : run.freeOther);
    const left = remaining.filter((item) => {
      const entry = sheetPackAdd(bin, item);
      if (entry) entries.push(entry);
      return !entry;
    });
    // Every item fits an empty sheet (pieces that do not were tiled above), so every round places something.
    if (left.length === remaining.length && remaining.length > 0)
      throw new Error('sheet-packer: no progress on an empty sheet');
    sheets.push(entries);
    remaining = left;
  }
  return sheets;
}

/**
 * A bin over the whole sheet whose free space is `free`: the free rectangles are in sheet coordinates (they
 * start at the margin), so the bin spans the sheet up to the printable area's far edges and the free
 * rectangles alone keep placements inside the margin.
 */
function sheetPackBin(run: PackRun, free: readonly RectMm[]): MaxRectsBin<Rectangle> {
  const { printable, spacing } = run;
  const bin = new MaxRectsBin<Rectangle>(
    printable.xMm + printable.widthMm,
    printable.yMm + printable.heightMm,
    spacing,
    {
      smart: false,
      pot: false,
      allowRotation: true,
    },
  );
  // A nanometre of slack: tiles cut to exactly a free rectangle's size must not miss it by rounding.
  bin.freeRects = free.map(
    (r) => new Rectangle(r.widthMm + spacing + FIT_SLACK_MM, r.heightMm + spacing + FIT_SLACK_MM, r.xMm, r.yMm),
  );
  return bin;
}

function sheetPackAdd(bin: MaxRectsBin<Rectangle>, item: PackItem): PackEntry | null {
  const rect = bin.add(new Rectangle(item.widthMm, item.heightMm, 0, 0, false, !item.tile && !item.gauge));
  return rect ? { item, x: rect.x, y: rect.y, rot: rect.rot } : null;
}

/** Share of a sheet's printable area under its items' boxes. */
function sheetPackFill(entries: readonly PackEntry[], printable: RectMm): number {
  return entries.reduce((a, e) => a + boxArea(e.item), 0) / (printable.widthMm * printable.heightMm);
}

function sheetPackBetter(a: PackEntry[][], b: PackEntry[][], printable: RectMm): boolean {
  if (a.length !== b.length) return a.length < b.length;
  const emptiest = (sheets: PackEntry[][]) => Math.min(...sheets.map((e) => sheetPackFill(e, printable)));
  return emptiest(a) > emptiest(b) + 1e-9;
}

/**
 * A sheet is mostly blank below this share of its printable area under pieces; such a sheet (never the
 * first, which carries the legend) is emptied onto the others when every one of its items finds room there.
 */
export const SHEET_SPARSE_FILL = 0.5;

/** Empties each mostly blank sheet after the first onto the others, where all of its items fit there. */
function sheetPackEmptySparse(sheets: PackEntry[][], run: PackRun): PackEntry[][] {
  let out = sheets;
  for (let s = out.length - 1; s >= 1; s--) {
    if (sheetPackFill(out[s]!, run.printable) >= SHEET_SPARSE_FILL) continue;
    const trial = out.map((entries) => [...entries]);
    const moved = out[s]!.every((e) => {
      for (let t = 0; t < trial.length; t++) {
        if (t === s) continue;
        const entry = sheetPackAdd(sheetPackBin(run, sheetPackFree(trial[t]!, t === 0, run)), e.item);
        if (entry) return trial[t]!.push(entry) > 0;
      }
      return false;
    });
    if (moved) out = trial.filter((_, i) => i !== s);
  }
  return out;
}

/** The free rectangles of a sheet holding `entries`: furniture and each box with its spacing taken out. */
function sheetPackFree(entries: readonly PackEntry[], first: boolean, run: PackRun): RectMm[] {
  const boxes = entries.map((e) => ({
    xMm: e.x,
    yMm: e.y,
    widthMm: (e.rot ? e.item.heightMm : e.item.widthMm) + run.spacing,
    heightMm: (e.rot ? e.item.widthMm : e.item.heightMm) + run.spacing,
  }));
  return freeSpaceRects(run.printable, [...(first ? run.furniture.first : run.furniture.other), ...boxes]);
}

/**
 * A kit's pieces on sheets: each piece too large for a sheet is first cut at its folds into parts joined by
 * numbered tabs (piece-split.ts), and only a piece no fold can split is tiled. Parts are cut to fit either
 * the free space of a sheet without the legend or that of the first sheet (smaller parts that can share it);
 * the kit keeps whichever needs fewer sheets, then fewer pieces. New tabs are numbered on from the kit's
 * highest number and are as deep as paper of `paperGsm` wants. Throws InputError as sheetPack does.
 */
export function sheetPackKit(
  pieces: readonly Piece[],
  options: SheetPackOptions & { paperGsm: number },
): { pieces: Piece[]; sheets: LaidOutSheet[] } {
  const { freeFirst, freeOther } = sheetPackSpace(pieces.length, options);
  let best: { pieces: Piece[]; sheets: LaidOutSheet[] } | null = null;
  let refused: unknown = null;
  for (const free of [freeOther, freeFirst]) {
    const split = sheetPackSplit(pieces, free, options.paperGsm);
    if (best && split.length === best.pieces.length) continue;
    try {
      const sheets = sheetPack(split, options);
      if (!best || sheets.length < best.sheets.length) best = { pieces: split, sheets };
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      refused ??= error;
    }
  }
  if (!best) throw refused;
  return best;
}

/** Pieces cut at folds until each part fits one of the `free` rectangles (turned to its smallest box). */
function sheetPackSplit(pieces: readonly Piece[], free: readonly RectMm[], paperGsm: number): Piece[] {
  const fits = (piece: Piece) => {
    const item = sheetPackItem(piece);
    return free.some((r) => boxFits(item, r));
  };
  let number = Math.max(0, ...pieces.flatMap((p) => [...p.tabs, ...p.edgeLabels].map((t) => t.number)));
  return pieces.flatMap((piece) => pieceSplit(piece, fits, paperGsm, () => ++number));
}

/** The largest piece a sheet after the first takes whole (its largest free rectangle), mm: what a mesh unfolds to fit. */
export function sheetPieceRoomMm(
  sheetSize: SheetSize,
  units: KitLayout['units'],
): { widthMm: number; heightMm: number } {
  const { freeOther } = sheetPackSpace(0, { sheetSize, units, copies: 1 });
  const best = freeOther.reduce((a, r) => (r.widthMm * r.heightMm > a.widthMm * a.heightMm ? r : a));
  return { widthMm: best.widthMm, heightMm: best.heightMm };
}

/** The printable area and the free rectangles of the first sheet and of every other, around the furniture. */
function sheetPackSpace(pieceCount: number, options: SheetPackOptions) {
  const printable = sheetFurniturePrintable(options.sheetSize, options.marginMm ?? SHEET_MARGIN_MM);
  // Sheet stock prints its cut list on the first panel: one row per part (cut-list.ts).
  const cutListRows = options.sheetSize.kind === 'stock' ? pieceCount : 0;
  const furniture = {
    first: sheetFurnitureLayout(printable, options.units, true, cutListRows).obstacles,
    other: sheetFurnitureLayout(printable, options.units, false).obstacles,
  };
  const freeFirst = freeSpaceRects(printable, furniture.first);
  const freeOther = freeSpaceRects(printable, furniture.other);
  return { printable, furniture, freeFirst, freeOther };
}

/** A piece turned to its smallest box, as the packer places it. */
function sheetPackItem(piece: Piece): PackItem {
  const rotationRad = pieceOrientationRad(piece.outlineMm);
  const box = placementBounds({ xMm: 0, yMm: 0, rotationRad, mirrored: false }, piece);
  return { piece, rotationRad, widthMm: box.widthMm, heightMm: box.heightMm };
}

/** Puts a tile laid out at the origin onto a sheet with its window's corner at (xMm, yMm). */
function sheetPackTile(sheet: LaidOutSheet, tile: PieceTile, xMm: number, yMm: number) {
  const p = tile.placement;
  const t = p.tile!;
  sheet.placements.push({
    ...p,
    xMm: p.xMm + xMm,
    yMm: p.yMm + yMm,
    tile: { ...t, windowMm: { ...t.windowMm, xMm: t.windowMm.xMm + xMm, yMm: t.windowMm.yMm + yMm } },
  });
  for (const m of tile.alignmentMarks)
    sheet.alignmentMarks.push({ atMm: [m.atMm[0] + xMm, m.atMm[1] + yMm], letter: m.letter });
}

const FIT_SLACK_MM = 1e-6;

function boxFits(item: Pick<PackItem, 'widthMm' | 'heightMm'>, r: RectMm): boolean {
  return (
    (item.widthMm <= r.widthMm && item.heightMm <= r.heightMm) ||
    (item.heightMm <= r.widthMm && item.widthMm <= r.heightMm)
  );
}

function emptySheet(number: number, size: SheetSize, printableMm: RectMm): LaidOutSheet {
  return { number, widthMm: size.widthMm, heightMm: size.heightMm, printableMm, placements: [], alignmentMarks: [] };
}

function sheetPackTooMany(sheetCount: number, pieces: readonly Piece[], options: SheetPackOptions): InputError {
  // Copies share sheets a little, so one copy packed alone gives an advice that is sure to work.
  let perCopy = Infinity;
  if (options.copies > 1) {
    try {
      perCopy = sheetPack(pieces, { ...options, copies: 1 }).length;
    } catch {
      perCopy = Infinity;
    }
  }
  const copiesThatFit = Math.floor(MAX_SHEETS / perCopy);
  const advice =
    copiesThatFit >= 1
      ? `at most ${copiesThatFit} ${copiesThatFit === 1 ? 'copy' : 'copies'} at this scale, a larger sheet or a smaller scale`
      : 'a larger sheet or a smaller scale (a larger N in 1:N)';
  return new InputError(
    `This kit needs at least ${sheetCount} sheets of ${options.sheetSize.label} for ${options.copies} ${options.copies === 1 ? 'copy' : 'copies'}; ${MAX_SHEETS} is the most a kit may have. Try ${advice}.`,
    { copies: [`At most ${MAX_SHEETS} sheets per kit.`] },
  );
}
