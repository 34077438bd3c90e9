/**
 * Splitting a piece larger than a sheet into tiles: a grid of windows, each printed on its own sheet, that
 * overlap their neighbours by a strip so the tiles can be glued edge over edge. Every overlap strip carries
 * alignment marks: the same letter at the same point of the piece on both tiles.
 */
import type { Piece } from '../geometry/types';
import { placementAtCorner, placementBounds } from './placement';
import type { AlignmentMark, Placement, RectMm } from './types';

/** Width of the strip two neighbouring tiles share, mm (common practice, no source). */
export const TILE_OVERLAP_MM = 12;

/** Band kept below each tile's window for its caption (which row and column it is), mm. */
export const TILE_CAPTION_MM = 4;

/** One tile of a piece: its placement (with `tile` set) and the marks printed on its sheet. */
export interface PieceTile {
  placement: Placement;
  alignmentMarks: AlignmentMark[];
}

/**
 * Tiles of a piece turned by rotationRad, each showing at most `window` (sheet mm) of it, with neighbours
 * overlapping by overlapMm; marks are lettered from `firstLetter` (0 = "A"). A window no larger than the
 * overlap cannot tile and gives [].
 */
export function tilingPiece(
  piece: Pick<Piece, 'id' | 'outlineMm'>,
  rotationRad: number,
  window: RectMm,
  overlapMm: number = TILE_OVERLAP_MM,
  firstLetter = 0,
): PieceTile[] {
  const stepX = window.widthMm - overlapMm;
  const stepY = window.heightMm - overlapMm;
  if (stepX <= 0 || stepY <= 0) return [];
  const box = placementBounds({ xMm: 0, yMm: 0, rotationRad, mirrored: false }, piece);
  const { cols, rows } = tilingGrid(box, window, overlapMm)!;
  // Marks in the frame of the piece's box (origin at its top-left corner), shared by the two tiles they join.
  const marks: { xMm: number; yMm: number; letter: string }[] = [];
  let letter = firstLetter;
  const tileSpan = (index: number, step: number, size: number, total: number) => ({
    from: index * step,
    to: Math.min(index * step + size, total),
  });
  for (let r = 0; r < rows; r++) {
    for (let c = 0; c < cols; c++) {
      const xs = tileSpan(c, stepX, window.widthMm, box.widthMm);
      const ys = tileSpan(r, stepY, window.heightMm, box.heightMm);
      if (c + 1 < cols) {
        const x = (c + 1) * stepX + overlapMm / 2;
        for (const y of tilingMarkStops(ys, r, rows, overlapMm))
          marks.push({ xMm: x, yMm: y, letter: tilingLetter(letter++) });
      }
      if (r + 1 < rows) {
        const y = (r + 1) * stepY + overlapMm / 2;
        for (const x of tilingMarkStops(xs, c, cols, overlapMm))
          marks.push({ xMm: x, yMm: y, letter: tilingLetter(letter++) });
      }
    }
  }
  const tiles: PieceTile[] = [];
  for (let r = 0; r < rows; r++) {
    for (let c = 0; c < cols; c++) {
      const xs = tileSpan(c, stepX, window.widthMm, box.widthMm);
      const ys = tileSpan(r, stepY, window.heightMm, box.heightMm);
      const pose = placementAtCorner(piece, rotationRad, window.xMm - xs.from, window.yMm - ys.from);
      const windowMm = { xMm: window.xMm, yMm: window.yMm, widthMm: xs.to - xs.from, heightMm: ys.to - ys.from };
      const alignmentMarks = marks
        .filter((m) => m.xMm >= xs.from && m.xMm <= xs.to && m.yMm >= ys.from && m.yMm <= ys.to)
        .map((m) => ({
          atMm: [window.xMm + m.xMm - xs.from, window.yMm + m.yMm - ys.from] as const,
          letter: m.letter,
        }));
      tiles.push({
        placement: { pieceId: piece.id, ...pose, tile: { row: r, col: c, rows, cols, windowMm, overlapMm } },
        alignmentMarks,
      });
    }
  }
  return tiles;
}

/**
 * Shortest stretch of strip that carries two registration marks rather than one, mm: two crosses 6 mm across
 * with their letters and clear paper between (common practice, no source).
 */
export const TILING_TWO_MARKS_MM = 24;

/**
 * Where the marks of the strip joining a tile to its next neighbour go along the tile's span (index of n along
 * that axis): within the stretch no third tile shares, so each cross joins exactly two tiles and never lands in
 * a corner where the strips of four tiles cross; at its quarter points, or at its middle when the stretch is
 * short (a last row or column barely wider than the overlap).
 */
function tilingMarkStops(span: { from: number; to: number }, index: number, n: number, overlapMm: number): number[] {
  const from = span.from + (index > 0 ? overlapMm : 0);
  const to = span.to - (index + 1 < n ? overlapMm : 0);
  const length = to - from;
  // A window under twice the overlap leaves no stretch of its own: the mark goes to the span's middle.
  if (length <= 0) return [(span.from + span.to) / 2];
  return length >= TILING_TWO_MARKS_MM ? [from + 0.25 * length, from + 0.75 * length] : [from + 0.5 * length];
}

/**
 * Columns and rows of tiles for a placed box (mm) shown through `window` with neighbours overlapping by
 * overlapMm; null when the window is no larger than the overlap.
 */
export function tilingGrid(
  box: Pick<RectMm, 'widthMm' | 'heightMm'>,
  window: Pick<RectMm, 'widthMm' | 'heightMm'>,
  overlapMm: number,
): { cols: number; rows: number } | null {
  const stepX = window.widthMm - overlapMm;
  const stepY = window.heightMm - overlapMm;
  if (stepX <= 0 || stepY <= 0) return null;
  return {
    cols: Math.max(1, Math.ceil((box.widthMm - overlapMm) / stepX)),
    rows: Math.max(1, Math.ceil((box.heightMm - overlapMm) / stepY)),
  };
}

/** Spreadsheet-style letters: 0 → "A", 25 → "Z", 26 → "AA". */
export function tilingLetter(index: number): string {
  let n = index;
  let out = '';
  do {
    out = String.fromCharCode(65 + (n % 26)) + out;
    n = Math.floor(n / 26) - 1;
  } while (n >= 0);
  return out;
}
