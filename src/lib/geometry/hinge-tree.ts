/**
 * Folding a hinge tree: each face's polygon in model space (mm at kit scale) at a fold fraction from 0 (flat,
 * laid in the root face's plane) to 1 (assembled). Pure and allocation-light, for the 3D preview's frames.
 */
import type { CurvedDevelopment, HingeTree, PlaneFrame, Vec2Mm, Vec3Mm } from './types';
import { vec3Cross } from './vec';

/** A folded face: the face id and its vertices in model space, mm. */
export interface FoldedFace {
  id: number;
  polygonMm: Vec3Mm[];
}

/** A rigid motion of the flat piece's local 3D space (flat plane z = 0, printed side +z): x ↦ R·x + t. */
type Rigid = { r: number[]; t: [number, number, number] };
const IDENTITY: Rigid = { r: [1, 0, 0, 0, 1, 0, 0, 0, 1], t: [0, 0, 0] };

/**
 * Every face folded by `fraction` (clamped to 0…1) of its joint angle, placed by rootFrame; curved pieces
 * roll by the same fraction. Faces unreachable from the root are left out.
 */
export function hingeTreeFold(tree: HingeTree, fraction: number): FoldedFace[] {
  const f = Math.min(1, Math.max(0, Number.isFinite(fraction) ? fraction : 0));
  const frame = tree.rootFrame;
  if (tree.curved) {
    return tree.faces.map((face) => ({
      id: face.id,
      polygonMm: face.polygonMm.map((p) => frameApply(frame, curvedDevelopmentPoint(tree.curved!, p, f))),
    }));
  }
  const motions = new Map<number, Rigid>([[tree.root, IDENTITY]]);
  const children = new Map<number, typeof tree.joints>();
  for (const j of tree.joints) {
    const list = children.get(j.parent);
    if (list) list.push(j);
    else children.set(j.parent, [j]);
  }
  const queue = [tree.root];
  for (let q = 0; q < queue.length; q++) {
    const parent = queue[q]!;
    for (const j of children.get(parent) ?? []) {
      const [a, b] = j.axisMm;
      const local = rotationAbout(a, b, j.angleRad * f);
      motions.set(j.child, compose(motions.get(parent)!, local));
      queue.push(j.child);
    }
  }
  const folded: FoldedFace[] = [];
  for (const face of tree.faces) {
    const m = motions.get(face.id);
    if (!m) continue;
    folded.push({
      id: face.id,
      polygonMm: face.polygonMm.map(([x, y]) => frameApply(frame, rigidApply(m, [x, y, 0]))),
    });
  }
  return folded;
}

/**
 * Where flat point p of a curved piece goes when rolled by `fraction`, in the piece's local space (flat plane
 * z = 0, the surface's axis along +z for cones, along +y for tubes). At 0 it is p itself; at 1 it lies on the
 * cone, frustum or tube. Cones keep the printed side inside (the dish face); tubes keep it outside.
 */
export function curvedDevelopmentPoint(
  curved: CurvedDevelopment,
  p: Vec2Mm,
  fraction: number,
): [number, number, number] {
  if (curved.kind === 'tube') {
    const k = fraction / curved.radiusMm;
    if (k === 0) return [p[0], p[1], 0];
    return [Math.sin(k * p[0]) / k, p[1], -(1 - Math.cos(k * p[0])) / k];
  }
  // A sector of slant radius ρ rolls onto cones of the same slant whose sine of half-angle falls from 1
  // (flat) to r/L (the final cone), so every intermediate shape is itself developable.
  const sinFinal =
    (curved.baseRadiusMm - curved.topRadiusMm) / Math.hypot(curved.baseRadiusMm - curved.topRadiusMm, curved.heightMm);
  const sinHalf = 1 - fraction * (1 - sinFinal);
  const cosHalf = Math.sqrt(Math.max(0, 1 - sinHalf * sinHalf));
  const rho = Math.hypot(p[0], p[1]);
  const phi = Math.atan2(p[1], p[0]);
  const psi = phi / sinHalf;
  return [rho * sinHalf * Math.cos(psi), rho * sinHalf * Math.sin(psi), rho * cosHalf];
}

/** Local piece space to model space: origin + x·xAxis + y·yAxis + z·(xAxis × yAxis). */
export function frameApply(frame: PlaneFrame, [x, y, z]: readonly [number, number, number]): Vec3Mm {
  const n = vec3Cross(frame.xAxis, frame.yAxis);
  const o = frame.originMm;
  return [
    o[0] + x * frame.xAxis[0] + y * frame.yAxis[0] + z * n[0],
    o[1] + x * frame.xAxis[1] + y * frame.yAxis[1] + z * n[1],
    o[2] + x * frame.xAxis[2] + y * frame.yAxis[2] + z * n[2],
  ];
}

/** Rotation by angle about the flat line a→b (right-hand rule), as a rigid motion of local space. */
function rotationAbout(a: Vec2Mm, b: Vec2Mm, angleRad: number): Rigid {
  const len = Math.hypot(b[0] - a[0], b[1] - a[1]) || 1;
  const ux = (b[0] - a[0]) / len,
    uy = (b[1] - a[1]) / len;
  const c = Math.cos(angleRad),
    s = Math.sin(angleRad),
    k = 1 - c;
  // Rodrigues' rotation formula with axis (ux, uy, 0).
  const r = [c + ux * ux * k, ux * uy * k, uy * s, ux * uy * k, c + uy * uy * k, -ux * s, -uy * s, ux * s, c];
  const pa: [number, number, number] = [a[0], a[1], 0];
  const ra = rigidApply({ r, t: [0, 0, 0] }, pa);
  return { r, t: [pa[0] - ra[0], pa[1] - ra[1], pa[2] - ra[2]] };
}

function rigidApply(m: Rigid, [x, y, z]: readonly [number, number, number]): [number, number, number] {
  const r = m.r;
  return [
    r[0]! * x + r[1]! * y + r[2]! * z + m.t[0],
    r[3]! * x + r[4]! * y + r[5]! * z + m.t[1],
    r[6]! * x + r[7]! * y + r[8]! * z + m.t[2],
  ];
}

/** outer ∘ inner: apply inner first. */
function compose(outer: Rigid, inner: Rigid): Rigid {
  const a = outer.r,
    b = inner.r;
  const r: number[] = [];
  for (let i = 0; i < 3; i++)
    for (let j = 0; j < 3; j++) r.push(a[i * 3]! * b[j]! + a[i * 3 + 1]! * b[3 + j]! + a[i * 3 + 2]! * b[6 + j]!);
  return { r, t: rigidApply(outer, inner.t) };
}
