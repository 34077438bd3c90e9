/**
 * Wire booms at kit scale: a length of thread (deployed length plus a tie-off allowance) and a small anchor
 * piece glued onto the body at the boom's foot, folded over the thread. Flat mm; model mm at kit scale.
 */
import type { BodyFace } from './body-shape';
import type { Piece, PlaneFrame, Vec2Mm, Vec3Mm, WireBoomThread } from './types';
import { pieceFromNet } from './piece-builder';
import { frameApply } from './hinge-tree';
import { vec3Combine } from './vec';

/** Thread added to each wire boom for the two knots, mm (common practice, no source). */
export const THREAD_TIE_OFF_ALLOWANCE_MM = 100;
/** Smallest side of the square anchor flap, mm on paper (not scaled); larger for younger classes, shrunk to fit small faces. */
export const WIRE_ANCHOR_SIZE_MM = 10;

/** The thread for a wire boom of lengthM at 1:scaleDenominator. */
export function wireBoomThread(
  partId: string,
  label: string,
  lengthM: number,
  scaleDenominator: number,
): WireBoomThread {
  const deployedLengthMm = (lengthM * 1000) / scaleDenominator;
  return { partId, label, deployedLengthMm, threadLengthMm: deployedLengthMm + THREAD_TIE_OFF_ALLOWANCE_MM };
}

/**
 * The anchor: a square flap centred on the foot point, lying on the face, with its glue half as a tab that
 * folds flat under it (π) over the thread; `sideMm` is the flap's side.
 */
export function wireAnchorPiece(spec: {
  id: string;
  partId: string;
  label: string;
  assemblyStep: number;
  face: BodyFace;
  footMm: Vec3Mm;
  sideMm: number;
  tabNumber: number;
}): Piece {
  const s = spec.sideMm;
  const { uAxis: u, vAxis: v } = spec.face;
  const frame: PlaneFrame = { originMm: vec3Combine([1, spec.footMm], [-s / 2, u], [-s / 2, v]), xAxis: u, yAxis: v };
  const face: Vec2Mm[] = [
    [0, 0],
    [s, 0],
    [s, s],
    [0, s],
  ];
  return pieceFromNet({
    id: spec.id,
    partId: spec.partId,
    partKind: 'wire-boom-anchor',
    label: spec.label,
    assemblyStep: spec.assemblyStep,
    faces: [{ flatMm: face, modelMm: face.map(([x, y]) => frameApply(frame, [x, y, 0])) }],
    joints: [],
    tabs: [
      {
        number: spec.tabNumber,
        polygonMm: [
          [s, 0],
          [0, 0],
          [0, -s],
          [s, -s],
        ],
        labelAtMm: [s / 2, -s / 2],
        depthMm: s,
        fold: { fromMm: [0, 0], toMm: [s, 0], angleRad: Math.PI },
      },
    ],
    edgeLabels: [],
    rootFrame: frame,
  });
}

/**
 * The anchor's centre and side on its face: the foot point and sideMm (the band's smallest piece, at least
 * WIRE_ANCHOR_SIZE_MM) when the square fits
 * inside the face, else moved toward the face centre (and, on a very small face, shrunk) until it does.
 */
export function wireAnchorPlacement(
  face: BodyFace,
  footMm: Vec3Mm,
  sideMm: number = WIRE_ANCHOR_SIZE_MM,
): { centreMm: Vec3Mm; sideMm: number } {
  const uv = face.polygonMm.map((p) => {
    const d = vec3Combine([1, p], [-1, face.centreMm]);
    return [
      d[0] * face.uAxis[0] + d[1] * face.uAxis[1] + d[2] * face.uAxis[2],
      d[0] * face.vAxis[0] + d[1] * face.vAxis[1] + d[2] * face.vAxis[2],
    ] as const;
  });
  const f = vec3Combine([1, footMm], [-1, face.centreMm]);
  const foot = [
    f[0] * face.uAxis[0] + f[1] * face.uAxis[1] + f[2] * face.uAxis[2],
    f[0] * face.vAxis[0] + f[1] * face.vAxis[1] + f[2] * face.vAxis[2],
  ] as const;
  const inside = (x: number, y: number) =>
    uv.every((a, i) => {
      const b = uv[(i + 1) % uv.length]!;
      return (b[0] - a[0]) * (y - a[1]) - (b[1] - a[1]) * (x - a[0]) >= 0;
    });
  for (let side = sideMm; side > 1e-6; side *= 0.8) {
    for (let t = 1; t >= 0; t -= 0.05) {
      const [x, y] = [foot[0] * t, foot[1] * t];
      const h = side / 2;
      if (inside(x - h, y - h) && inside(x + h, y - h) && inside(x + h, y + h) && inside(x - h, y + h)) {
        return { centreMm: vec3Combine([1, face.centreMm], [x, face.uAxis], [y, face.vAxis]), sideMm: side };
      }
    }
  }
  return { centreMm: face.centreMm, sideMm: 0 };
}
