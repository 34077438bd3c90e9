/**
 * Where a piece's glue tabs are while it folds: each tab turns about its own fold line (by the same fraction
 * as the hinge tree) and rides on the face it hangs from; tabs of rolled pieces roll with the surface.
 * Flat input in mm; output in model space, mm at kit scale.
 */
import { curvedDevelopmentPoint, frameApply, hingeTreeFold } from '../geometry/hinge-tree';
import type { FoldLine, HingeFace, Piece, Vec2Mm, Vec3Mm } from '../geometry/types';
import { vec3Combine, vec3Cross, vec3Sub } from '../geometry/vec';

/** A folded tab: its number, its polygon and its number's print point in model space, mm. */
export interface FoldedTab {
  number: number;
  polygonMm: Vec3Mm[];
  labelAtMm: Vec3Mm;
}

const NEAR_MM = 1e-6;
const near = (p: Vec2Mm, q: Vec2Mm) => Math.abs(p[0] - q[0]) < NEAR_MM && Math.abs(p[1] - q[1]) < NEAR_MM;

/**
 * Every tab of the piece folded by fraction (clamped to 0…1); a tab of a flat piece whose fold line lies on
 * no face edge is left out rather than drawn loose.
 */
export function pieceTabsFold(piece: Piece, fraction: number): FoldedTab[] {
  const f = Math.min(1, Math.max(0, Number.isFinite(fraction) ? fraction : 0));
  const { hinge } = piece;
  if (hinge.curved) {
    const roll = (p: Vec2Mm) => frameApply(hinge.rootFrame, curvedDevelopmentPoint(hinge.curved!, p, f));
    return piece.tabs.map((t) => ({
      number: t.number,
      polygonMm: t.polygonMm.map(roll),
      labelAtMm: roll(t.labelAtMm),
    }));
  }
  const folded = new Map(hingeTreeFold(hinge, f).map((face) => [face.id, face.polygonMm]));
  const tabs: FoldedTab[] = [];
  for (const t of piece.tabs) {
    const fold = piece.folds.find((l) => l.tabNumber === t.number);
    const face =
      fold &&
      hinge.faces.find(
        (h) => h.polygonMm.some((p) => near(p, fold.fromMm)) && h.polygonMm.some((p) => near(p, fold.toMm)),
      );
    const face3 = face && folded.get(face.id);
    if (!fold || !face || !face3) continue;
    const place = faceAffine(face, face3);
    const turn = (p: Vec2Mm) => place(tabPointTurn(fold, p, fold.angleRad * f));
    tabs.push({ number: t.number, polygonMm: t.polygonMm.map(turn), labelAtMm: turn(t.labelAtMm) });
  }
  return tabs;
}

/**
 * Point p of the flat plane turned by angleRad about the fold line from → to (right-hand rule, as hinge
 * joints turn), in the piece's local space: v = v∥ + v⊥ ↦ v∥ + cos θ·v⊥ + sin θ·(u × v⊥).
 */
function tabPointTurn(fold: FoldLine, p: Vec2Mm, angleRad: number): [number, number, number] {
  const [ax, ay] = fold.fromMm;
  const len = Math.hypot(fold.toMm[0] - ax, fold.toMm[1] - ay) || 1;
  const ux = (fold.toMm[0] - ax) / len,
    uy = (fold.toMm[1] - ay) / len;
  const vx = p[0] - ax,
    vy = p[1] - ay;
  const along = vx * ux + vy * uy;
  const px = vx - along * ux,
    py = vy - along * uy;
  const c = Math.cos(angleRad),
    s = Math.sin(angleRad);
  return [ax + along * ux + c * px, ay + along * uy + c * py, s * (ux * py - uy * px)];
}

/** The rigid map of a face's flat plane (z = 0, printed side +z) onto its folded polygon. */
function faceAffine(face: HingeFace, face3: Vec3Mm[]): (local: [number, number, number]) => Vec3Mm {
  const a = face.polygonMm[0]!,
    b = face.polygonMm[1]!;
  // The third corner farthest from line ab keeps the 2 × 2 solve well conditioned.
  let k = 2,
    best = 0;
  face.polygonMm.forEach((c, i) => {
    const area = Math.abs((b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]));
    if (area > best) [best, k] = [area, i];
  });
  const c = face.polygonMm[k]!;
  const [e1x, e1y, e2x, e2y] = [b[0] - a[0], b[1] - a[1], c[0] - a[0], c[1] - a[1]];
  const det = e1x * e2y - e1y * e2x;
  const A = face3[0]!,
    dB = vec3Sub(face3[1]!, A),
    dC = vec3Sub(face3[k]!, A);
  const X = vec3Combine([e2y / det, dB], [-e1y / det, dC]);
  const Y = vec3Combine([-e2x / det, dB], [e1x / det, dC]);
  const N = vec3Cross(X, Y);
  return ([x, y, z]) => vec3Combine([1, A], [x - a[0], X], [y - a[1], Y], [z, N]);
}
