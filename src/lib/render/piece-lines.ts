/**
 * A placed piece as the lines a renderer draws, in sheet mm (y down): the cut outline, the mountain and
 * valley folds and the glue-tab tints, clipped to the tile window when the piece is tiled (the cut outline
 * then closes along the window edge, so every tile is a piece a cutting machine frees). The renderer
 * supplies the point transform (the SVG renderer's goes through svg-path-commander, the PDF's through
 * placementApply), so both draw the same lines.
 */
import type { Piece, Vec2Mm } from '../geometry/types';
import type { Placement, SheetVec2Mm } from '../layout/types';
import { segmentClipOutline, segmentClipPolyline } from './segment-clip';

/** Maps flat points (mm, y up) of one piece to sheet points (mm, y down), order kept. */
export type PiecePointTransform = (polylines: readonly (readonly Vec2Mm[])[]) => SheetVec2Mm[][];

export interface PieceLines {
  /** Closed outlines, each repeating its first point: the piece's, or each part of it inside its tile. */
  cut: SheetVec2Mm[][];
  mountain: SheetVec2Mm[][];
  valley: SheetVec2Mm[][];
  /** Closed polygons to tint (tabs); unclipped, the renderer clips fills to the window. */
  tabs: SheetVec2Mm[][];
}

/** The lines of one placed piece; a piece without folds or tabs gives empty lists for those. */
export function pieceLines(piece: Piece, placement: Placement, transform: PiecePointTransform): PieceLines {
  const folds = piece.folds;
  const input: Vec2Mm[][] = [
    piece.outlineMm,
    ...folds.map((f) => [f.fromMm, f.toMm]),
    ...piece.tabs.map((t) => t.polygonMm),
  ];
  const placed = transform(input);
  const window = placement.tile?.windowMm;
  const lines: PieceLines = {
    cut: segmentClipOutline(placed[0] ?? [], window),
    mountain: [],
    valley: [],
    tabs: [],
  };
  folds.forEach((fold, i) => {
    const target = fold.kind === 'mountain' ? lines.mountain : lines.valley;
    target.push(...segmentClipPolyline(placed[i + 1] ?? [], false, window));
  });
  lines.tabs = placed.slice(1 + folds.length);
  return lines;
}
