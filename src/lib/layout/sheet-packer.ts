/**
 * Packing a kit's pieces onto sheets. Each piece is first turned to its smallest bounding box
 * (piece-orientation.ts), then the boxes are packed with quarter turns by the MaxRects best-short-side-fit
 * heuristic (Jylänki, "A Thousand Ways to Pack the Bin", 2010) of maxrects-packer, one sheet after another,
 * around the sheet furniture. Boxes that do not overlap hold pieces that do not overlap. Pieces too large for
 * a sheet are tiled (tiling.ts), one tile per sheet, after the packed sheets.
 */
import { MaxRectsBin, Rectangle } from 'maxrects-packer/dist/maxrects-packer.mjs';
import { InputError } from '../errors';
import type { Piece } from '../geometry/types';
import { freeSpaceRects } from './free-space';
import { pieceOrientationRad } from './piece-orientation';
import { placementAtCorner, placementBounds } from './placement';
import { SHEET_MARGIN_MM } from './sheet-sizes';
import {
  SHEET_FURNITURE_GAP_MM,
  sheetFurnitureCheckSquareMm,
  sheetFurnitureLayout,
  sheetFurniturePrintable,
} from './sheet-furniture';
import { TILE_OVERLAP_MM, tilingPiece } from './tiling';
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
}

interface PackItem {
  piece: Piece;
  rotationRad: number;
  widthMm: number;
  heightMm: number;
}

/**
 * Sheets holding `copies` of every piece, inside the printable margin and clear of the furniture, numbered
 * from 1; no pieces gives one empty sheet (it still carries the legend). Throws InputError when more than
 * MAX_SHEETS would be needed.
 */
export function sheetPack(pieces: readonly Piece[], options: SheetPackOptions): LaidOutSheet[] {
  const spacing = options.spacingMm ?? PIECE_SPACING_MM;
  const printable = sheetFurniturePrintable(options.sheetSize, options.marginMm ?? SHEET_MARGIN_MM);
  const freeFirst = freeSpaceRects(printable, sheetFurnitureLayout(printable, options.units, true).obstacles);
  const freeOther = freeSpaceRects(printable, sheetFurnitureLayout(printable, options.units, false).obstacles);
  const tileWindow: RectMm = {
    ...printable,
    heightMm: printable.heightMm - sheetFurnitureCheckSquareMm(options.units) - SHEET_FURNITURE_GAP_MM,
  };
  const packed: PackItem[] = [];
  const tiled: PackItem[] = [];
  for (const piece of pieces) {
    const rotationRad = pieceOrientationRad(piece.outlineMm);
    const box = placementBounds({ xMm: 0, yMm: 0, rotationRad, mirrored: false }, piece);
    const item = { piece, rotationRad, widthMm: box.widthMm, heightMm: box.heightMm };
    (freeOther.some((r) => boxFits(item, r)) ? packed : tiled).push(item);
  }
  const tilesPerCopy = tiled.reduce(
    (n, item) => n + tilingPiece(item.piece, item.rotationRad, tileWindow, options.overlapMm).length,
    0,
  );
  const usableArea = freeOther.reduce((a, r) => Math.max(a, r.widthMm * r.heightMm), 0);
  const packedArea = packed.reduce((a, i) => a + (i.widthMm + spacing) * (i.heightMm + spacing), 0);
  const lowerBound = Math.ceil((options.copies * packedArea) / usableArea) + options.copies * tilesPerCopy;
  if (lowerBound > MAX_SHEETS) throw sheetPackTooMany(lowerBound, options);

  const items: PackItem[] = [];
  for (let copy = 0; copy < options.copies; copy++) items.push(...packed);
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
    const bin = new MaxRectsBin<Rectangle>(printable.widthMm, printable.heightMm, spacing, {
      smart: false,
      pot: false,
      allowRotation: true,
    });
    bin.freeRects = free.map((r) => new Rectangle(r.widthMm + spacing, r.heightMm + spacing, r.xMm, r.yMm));
    const left: PackItem[] = [];
    for (const item of remaining) {
      const rect = bin.add(item.widthMm, item.heightMm, null);
      if (!rect) {
        left.push(item);
        continue;
      }
      const rotationRad = rect.rot ? item.rotationRad + Math.PI / 2 : item.rotationRad;
      sheet.placements.push({ pieceId: item.piece.id, ...placementAtCorner(item.piece, rotationRad, rect.x, rect.y) });
    }
    // A piece that fits no empty sheet was sent to tiling above, so every round places something.
    if (left.length === remaining.length && remaining.length > 0)
      throw new Error('sheet-packer: no progress on an empty sheet');
    sheets.push(sheet);
    remaining = left;
  }
  let letter = 0;
  for (let copy = 0; copy < options.copies; copy++) {
    for (const item of tiled) {
      for (const tile of tilingPiece(
        item.piece,
        item.rotationRad,
        tileWindow,
        options.overlapMm ?? TILE_OVERLAP_MM,
        letter,
      )) {
        const sheet = emptySheet(sheets.length + 1, options.sheetSize, printable);
        sheet.placements.push(tile.placement);
        sheet.alignmentMarks.push(...tile.alignmentMarks);
        letter += tile.alignmentMarks.length;
        sheets.push(sheet);
      }
    }
  }
  if (sheets.length > MAX_SHEETS) throw sheetPackTooMany(sheets.length, options);
  return sheets;
}

function boxFits(item: Pick<PackItem, 'widthMm' | 'heightMm'>, r: RectMm): boolean {
  return (
    (item.widthMm <= r.widthMm && item.heightMm <= r.heightMm) ||
    (item.heightMm <= r.widthMm && item.widthMm <= r.heightMm)
  );
}

function emptySheet(number: number, size: SheetSize, printableMm: RectMm): LaidOutSheet {
  return { number, widthMm: size.widthMm, heightMm: size.heightMm, printableMm, placements: [], alignmentMarks: [] };
}

function sheetPackTooMany(sheetCount: number, options: SheetPackOptions): InputError {
  const perCopy = sheetCount / options.copies;
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
