/**
 * The cut list printed for sheet stock: one row per part with its size, how many to cut and on which
 * panels they are laid out.
 */
import type { Piece } from '../geometry/types';
import { placementBounds } from './placement';
import type { CutListRow, LaidOutSheet } from './types';

/**
 * Rows in the order parts first appear on the sheets; size is the placed piece's box (mm), a tiled piece
 * counting once per full set of tiles. No sheets give [].
 */
export function cutListRows(pieces: readonly Piece[], sheets: readonly LaidOutSheet[]): CutListRow[] {
  const byId = new Map(pieces.map((p) => [p.id, p]));
  const rows = new Map<string, CutListRow & { tilesSeen: number }>();
  for (const sheet of sheets) {
    for (const placement of sheet.placements) {
      const piece = byId.get(placement.pieceId);
      if (!piece) continue;
      let row = rows.get(piece.id);
      if (!row) {
        const box = placementBounds({ ...placement, xMm: 0, yMm: 0 }, piece);
        row = {
          part: piece.label,
          widthMm: box.widthMm,
          heightMm: box.heightMm,
          quantity: 0,
          sheets: [],
          tilesSeen: 0,
        };
        rows.set(piece.id, row);
      }
      const tilesPerPiece = placement.tile ? placement.tile.rows * placement.tile.cols : 1;
      row.tilesSeen += 1;
      row.quantity = Math.floor(row.tilesSeen / tilesPerPiece);
      if (!row.sheets.includes(sheet.number)) row.sheets.push(sheet.number);
    }
  }
  return [...rows.values()].map(({ tilesSeen: _tilesSeen, ...row }) => row);
}
