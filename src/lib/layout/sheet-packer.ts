/**
 * Packing a kit's pieces onto sheets. Each piece is first turned to its smallest bounding box
 * (piece-orientation.ts), then the boxes are packed with quarter turns by the MaxRects best-short-side-fit
 * heuristic (Jylänki, "A Thousand Ways to Pack the Bin", 2010) of maxrects-packer, one sheet after another,
 * around the sheet furniture. Boxes that do not overlap hold pieces that do not overlap. Pieces too large for
 * a sheet are turned to need the fewest tiles (axis-aligned on a tie) and tiled (tiling.ts); tiles are
 * packed like pieces. Cut-to-length gauges for rods that replace thin booms (cut-gauge.ts) are packed like
 * pieces too, never turned, so their captions read across the sheet.
 */
import { MaxRectsBin, Rectangle } from 'maxrects-packer/dist/maxrects-packer.mjs';
import { InputError } from '../errors';
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
  const printable = sheetFurniturePrintable(options.sheetSize, options.marginMm ?? SHEET_MARGIN_MM);
  // Sheet stock prints its cut list on the first panel: one row per part (cut-list.ts).
  const cutListRows = options.sheetSize.kind === 'stock' ? pieces.length : 0;
  const freeFirst = freeSpaceRects(
    printable,
    sheetFurnitureLayout(printable, options.units, true, cutListRows).obstacles,
  );
  const freeOther = freeSpaceRects(printable, sheetFurnitureLayout(printable, options.units, false).obstacles);
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
    const rotationRad = pieceOrientationRad(piece.outlineMm);
    const box = placementBounds({ xMm: 0, yMm: 0, rotationRad, mirrored: false }, piece);
    const item = { piece, rotationRad, widthMm: box.widthMm, heightMm: box.heightMm };
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

  items.sort(
    (a, b) =>
      Math.max(b.widthMm, b.heightMm) - Math.max(a.widthMm, a.heightMm) ||
      b.widthMm * b.heightMm - a.widthMm * a.heightMm,
  );
  const sheets: LaidOutSheet[] = [];
  let remaining = items;
  while (remaining.length > 0 || sheets.length === 0) {
    const free = sheets.length === 0 ? freeFirst : freeOther;
    const sheet = emptySheet(sheets.length + 1, options.sheetSize, printable);
    // The free rectangles are in sheet coordinates (they start at the margin), so the bin spans the sheet up
    // to the printable area's far edges; the free rectangles alone keep placements inside the margin.
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
    const left: PackItem[] = [];
    for (const item of remaining) {
      const rect = bin.add(new Rectangle(item.widthMm, item.heightMm, 0, 0, false, !item.tile && !item.gauge));
      if (!rect) {
        left.push(item);
        continue;
      }
      if (item.gauge) (sheet.gauges ??= []).push({ ...item.gauge, xMm: rect.x, yMm: rect.y });
      else if (item.tile) sheetPackTile(sheet, item.tile, rect.x, rect.y);
      else if (item.piece) {
        const rotationRad = rect.rot ? item.rotationRad + Math.PI / 2 : item.rotationRad;
        sheet.placements.push({
          pieceId: item.piece.id,
          ...placementAtCorner(item.piece, rotationRad, rect.x, rect.y),
        });
      }
    }
    // Every item fits an empty sheet (pieces that do not were tiled above), so every round places something.
    if (left.length === remaining.length && remaining.length > 0)
      throw new Error('sheet-packer: no progress on an empty sheet');
    sheets.push(sheet);
    remaining = left;
  }
  if (sheets.length > MAX_SHEETS) throw sheetPackTooMany(sheets.length, pieces, options);
  return sheets;
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
