/**
 * A rigid boom as a rolled tube: a rectangle one circumference (π·d) wide and one boom long, with an
 * overlap strip that rolls under the starting edge. Flat mm (x round the tube, y along it); model mm.
 */
import type { Piece, PlaneFrame, Vec2Mm } from './types';
import { pieceFromNet } from './piece-builder';
import { CHORD_TOLERANCE_MM } from './paper';
import { curvedDevelopmentPoint, frameApply } from './hinge-tree';
import { EDGE_LABEL_INSET_MM } from './net-glue';
import { vec3Combine, vec3Cross } from './vec';

export interface TubePieceSpec {
  id: string;
  partId: string;
  label: string;
  assemblyStep: number;
  diameterMm: number;
  lengthMm: number;
  /** yAxis along the boom from its foot; origin at the foot (the tube's axis starts there). */
  frame: PlaneFrame;
  tabNumber: number;
  overlapMm: number;
}

/** The tube piece; its rolled surface is the cylinder of diameterMm about the frame's yAxis through its origin. */
export function tubePiece(spec: TubePieceSpec): Piece {
  const r = spec.diameterMm / 2;
  const c = Math.PI * spec.diameterMm;
  const L = spec.lengthMm;
  // Put the flat plane one radius out along its normal so the rolled axis runs through the foot point.
  const n = vec3Cross(spec.frame.xAxis, spec.frame.yAxis);
  const frame: PlaneFrame = { ...spec.frame, originMm: vec3Combine([1, spec.frame.originMm], [r, n]) };
  const steps = Math.max(3, Math.ceil((2 * Math.PI) / (2 * Math.acos(Math.max(-1, 1 - CHORD_TOLERANCE_MM / r)))));
  const bottom: Vec2Mm[] = Array.from({ length: steps + 1 }, (_, i) => [(c * i) / steps, 0]);
  const face: Vec2Mm[] = [...bottom, ...bottom.map(([x]) => [x, L] as Vec2Mm).reverse()];
  const curved = { kind: 'tube' as const, radiusMm: r, lengthMm: L };
  const w = spec.overlapMm;
  return pieceFromNet({
    id: spec.id,
    partId: spec.partId,
    partKind: 'rigid-boom',
    label: spec.label,
    assemblyStep: spec.assemblyStep,
    faces: [{ flatMm: face, modelMm: face.map((p) => frameApply(frame, curvedDevelopmentPoint(curved, p, 1))) }],
    joints: [],
    tabs: [
      {
        number: spec.tabNumber,
        polygonMm: [
          [c, L],
          [c, 0],
          [c + w, 0],
          [c + w, L],
        ],
        labelAtMm: [c + w / 2, L / 2],
        depthMm: w,
      },
    ],
    edgeLabels: [
      { number: spec.tabNumber, atMm: [Math.min(EDGE_LABEL_INSET_MM, c / 4), L / 2], angleRad: Math.PI / 2 },
    ],
    curved,
    rootFrame: frame,
  });
}
