/**
 * A small line drawing of one assembly step, rendered from the pieces' hinge trees folded shut (the
 * assembled model): an isometric projection (x and y axes at 30° below the horizontal, z up; any technical
 * drawing text, e.g. Giesecke et al., Technical Drawing, ch. on axonometric projection) of the parts built so
 * far in grey, the piece being added in white with a heavy outline, and the tabs glued in this step in the
 * glue colour. Faces are drawn far to near by their depth along the view direction (painter's algorithm).
 * Output in drawing mm, y down, fitted to a box.
 */
import { hingeTreeFold } from '../geometry/hinge-tree';
import type { Piece, Vec3Mm } from '../geometry/types';
import { assemblyStepPieceState, type AssemblyStep } from '../preview/assembly-steps';
import { pieceTabsFold } from '../preview/tab-fold';
import type { RectMm, SheetVec2Mm } from '../layout/types';

/** One filled and outlined polygon of a drawing, or an open polyline when fill is null. */
export interface StepDrawingShape {
  points: SheetVec2Mm[];
  closed: boolean;
  fill: string | null;
  stroke: string;
  widthMm: number;
}

export interface StepDrawing {
  /** The pieces drawn: every piece built before the step and the one it adds, in build order. */
  pieceIds: string[];
  shapes: StepDrawingShape[];
}

const COS30 = Math.sqrt(3) / 2;
/** Isometric projection to drawing mm (y down) and the depth toward the viewer at (+x, +y, +z). */
const project = ([x, y, z]: Vec3Mm): SheetVec2Mm => [(x - y) * COS30, (x + y) / 2 - z];
const depth = ([x, y, z]: Vec3Mm): number => x + y + z;

export const STEP_DRAWING_COLOURS = {
  built: '#d9d9d9',
  current: '#ffffff',
  tab: '#f2a33a',
  line: '#1b1b1b',
} as const;

interface Folded {
  piece: Piece;
  faces: Vec3Mm[][];
  curved: boolean;
}

const foldedCache = new WeakMap<readonly Piece[], Folded[]>();

/** Every piece folded shut, once per kit. */
function stepDrawingFolded(pieces: readonly Piece[]): Folded[] {
  let folded = foldedCache.get(pieces);
  if (!folded) {
    folded = pieces.map((piece) => ({
      piece,
      faces: hingeTreeFold(piece.hinge, 1).map((f) => f.polygonMm),
      curved: Boolean(piece.hinge.curved),
    }));
    foldedCache.set(pieces, folded);
  }
  return folded;
}

/**
 * The drawing of `step` fitted into `box` (drawing mm), scaled so the parts built so far and the piece being
 * added fill it; no pieces gives no shapes.
 */
export function stepDrawing(pieces: readonly Piece[], step: AssemblyStep, box: RectMm): StepDrawing {
  const all = stepDrawingFolded(pieces);
  const shown = all.filter((f) => assemblyStepPieceState(step, f.piece.id) !== 'later');
  const everything = shown.flatMap((f) => f.faces.flat().map(project));
  if (everything.length === 0) return { pieceIds: [], shapes: [] };
  const xs = everything.map((p) => p[0]);
  const ys = everything.map((p) => p[1]);
  const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const k = Math.min(box.widthMm / (x1 - x0 || 1), box.heightMm / (y1 - y0 || 1));
  const [ox, oy] = [box.xMm + (box.widthMm - (x1 - x0) * k) / 2, box.yMm + (box.heightMm - (y1 - y0) * k) / 2];
  const place = (p: Vec3Mm): SheetVec2Mm => {
    const [u, v] = project(p);
    return [ox + (u - x0) * k, oy + (v - y0) * k];
  };
  const polys: { d: number; shape: StepDrawingShape }[] = [];
  const lines: StepDrawingShape[] = [];
  const tabs: { d: number; shape: StepDrawingShape }[] = [];
  for (const f of shown) {
    const current = assemblyStepPieceState(step, f.piece.id) === 'current';
    const style = {
      fill: current ? STEP_DRAWING_COLOURS.current : STEP_DRAWING_COLOURS.built,
      stroke: STEP_DRAWING_COLOURS.line,
      widthMm: current ? 0.35 : 0.15,
    };
    if (f.curved) {
      // A rolled part is one face bent round: its outline drawn as a line shows the tube or cone.
      for (const face of f.faces) lines.push({ points: face.map(place), closed: true, ...style, fill: null });
      continue;
    }
    for (const face of f.faces) {
      const d = face.reduce((s, p) => s + depth(p), 0) / face.length;
      polys.push({ d, shape: { points: face.map(place), closed: true, ...style } });
    }
  }
  const wanted = new Set(step.tabNumbers);
  for (const f of shown)
    for (const t of pieceTabsFold(f.piece, 1))
      if (wanted.has(t.number)) {
        const d = t.polygonMm.reduce((s, p) => s + depth(p), 0) / t.polygonMm.length;
        tabs.push({
          d,
          shape: {
            points: t.polygonMm.map(place),
            closed: true,
            fill: STEP_DRAWING_COLOURS.tab,
            stroke: STEP_DRAWING_COLOURS.line,
            widthMm: 0.2,
          },
        });
      }
  polys.sort((a, b) => a.d - b.d);
  tabs.sort((a, b) => a.d - b.d);
  // Glued tabs are drawn over the faces they lie on, so they show where the glue goes.
  return {
    pieceIds: shown.map((f) => f.piece.id),
    shapes: [...polys.map((p) => p.shape), ...lines, ...tabs.map((t) => t.shape)],
  };
}
