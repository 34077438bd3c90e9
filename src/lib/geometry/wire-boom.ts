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
/** Side of the square anchor flap, mm on paper (not scaled), shrunk to fit small faces. */
export const WIRE_ANCHOR_SIZE_MM = 10;

/** The thread for a wire boom of lengthM at 1:scaleDenominator. */
export function wireBoomThread(partId: string, label: string, lengthM: number, scaleDenominator: number): WireBoomThread {
  const deployedLengthMm = (lengthM * 1000) / scaleDenominator;
  return { partId, label, deployedLengthMm, threadLengthMm: deployedLengthMm + THREAD_TIE_OFF_ALLOWANCE_MM };
}

/**
 * The anchor: a square flap centred on the foot point, lying on the face, with its glue half as a tab that
 * folds flat under it (π) over the thread; `sideMm` is the flap's side.
 */
export function wireAnchorPiece(spec: { id: string; partId: string; label: string; assemblyStep: number; face: BodyFace; footMm: Vec3Mm; sideMm: number; tabNumber: number }): Piece {
  const s = spec.sideMm;
  const { uAxis: u, vAxis: v } = spec.face;
  const frame: PlaneFrame = { originMm: vec3Combine([1, spec.footMm], [-s / 2, u], [-s / 2, v]), xAxis: u, yAxis: v };
  const face: Vec2Mm[] = [[0, 0], [s, 0], [s, s], [0, s]];
  return pieceFromNet({
    id: spec.id,
    partId: spec.partId,
    partKind: 'wire-boom-anchor',
    label: spec.label,
    assemblyStep: spec.assemblyStep,
    faces: [{ flatMm: face, modelMm: face.map(([x, y]) => frameApply(frame, [x, y, 0])) }],
    joints: [],
    tabs: [{ number: spec.tabNumber, polygonMm: [[s, 0], [0, 0], [0, -s], [s, -s]], labelAtMm: [s / 2, -s / 2], fold: { fromMm: [0, 0], toMm: [s, 0], angleRad: Math.PI } }],
    edgeLabels: [],
    rootFrame: frame,
  });
}
