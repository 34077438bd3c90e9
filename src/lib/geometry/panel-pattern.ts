/**
 * Solar panels: a fixed panel is a flat rectangle glued onto its face; a deployable panel is a rectangle
 * with a hinge strip (a tab) glued onto the face along the hinge edge, the panel standing at its deploy
 * angle. Flat mm (x along the hinge, y away from it); model mm at kit scale.
 */
import type { BodyFace } from './body-shape';
import type { EdgeLabel, Piece, PlaneFrame, Vec2Mm, Vec3Mm } from './types';
import { pieceFromNet } from './piece-builder';
import { frameApply } from './hinge-tree';
import { vec3Combine, vec3Cross } from './vec';

export interface PanelPieceSpec {
  id: string;
  partId: string;
  label: string;
  assemblyStep: number;
  widthMm: number;
  heightMm: number;
  /** Flat (0, 0) ↦ the panel's corner on the hinge (or its lower-left corner on the face). */
  frame: PlaneFrame;
  hingeStrip?: { number: number; depthMm: number; angleRad: number };
}

/** The panel piece: one face, with the hinge strip as a tab below its hinge edge when deployable. */
export function panelPiece(spec: PanelPieceSpec): Piece {
  const [w, h] = [spec.widthMm, spec.heightMm];
  const face: Vec2Mm[] = [
    [0, 0],
    [w, 0],
    [w, h],
    [0, h],
  ];
  const strip = spec.hingeStrip;
  const inset = strip ? Math.min(strip.depthMm * 0.3, w / 4) : 0;
  return pieceFromNet({
    id: spec.id,
    partId: spec.partId,
    partKind: strip ? 'deployable-panel' : 'solar-panel',
    label: spec.label,
    assemblyStep: spec.assemblyStep,
    faces: [{ flatMm: face, modelMm: face.map(([x, y]) => frameApply(spec.frame, [x, y, 0])) }],
    joints: [],
    tabs: strip
      ? [
          {
            number: strip.number,
            polygonMm: [
              [w, 0],
              [0, 0],
              [inset, -strip.depthMm],
              [w - inset, -strip.depthMm],
            ],
            labelAtMm: [w / 2, -strip.depthMm / 2],
            depthMm: strip.depthMm,
            fold: { fromMm: [0, 0], toMm: [w, 0], angleRad: strip.angleRad },
          },
        ]
      : [],
    edgeLabels: [],
    rootFrame: spec.frame,
  });
}

/**
 * The frame of a deployable panel hinged on `edge` of a side face, centred at `alongMm` from the face centre
 * along that edge, turned out by deployRad (0 stowed on the face, π in line with it), and the hinge strip's
 * fold angle (the strip lies on the face, printed side out).
 */
export function deployablePanelFrame(
  face: BodyFace,
  edge: 'top' | 'bottom' | 'left' | 'right',
  alongMm: number,
  widthMm: number,
  faceWidthMm: number,
  faceHeightMm: number,
  deployRad: number,
): { frame: PlaneFrame; stripAngleRad: number; hingeMidMm: Vec3Mm } {
  const { uAxis: u, vAxis: v, normal: n, centreMm: c } = face;
  // Inward direction on the face from the hinge edge, and the hinge point at the edge's middle.
  const spec = {
    top: { inward: vec3Combine([-1, v]), mid: vec3Combine([1, c], [faceHeightMm / 2, v], [alongMm, u]) },
    bottom: { inward: v, mid: vec3Combine([1, c], [-faceHeightMm / 2, v], [alongMm, u]) },
    left: { inward: u, mid: vec3Combine([1, c], [-faceWidthMm / 2, u], [alongMm, v]) },
    right: { inward: vec3Combine([-1, u]), mid: vec3Combine([1, c], [faceWidthMm / 2, u], [alongMm, v]) },
  }[edge];
  const out = vec3Combine([Math.cos(deployRad), spec.inward], [Math.sin(deployRad), n]);
  // Hinge direction chosen so that in line with the face (deploy π) the printed side faces out.
  const hinge = vec3Cross(n, spec.inward);
  const frame: PlaneFrame = { originMm: vec3Combine([1, spec.mid], [-widthMm / 2, hinge]), xAxis: hinge, yAxis: out };
  // The strip (flat y < 0) turns from the panel's plane back onto the face: 0 in line, −π/2 standing out.
  const stripAngleRad = deployRad - Math.PI;
  return { frame, stripAngleRad, hingeMidMm: spec.mid };
}

/** A label on the body face marking where a hinge strip or anchor is glued (printed inside that face). */
export function panelBodyLabel(bodyFrame: PlaneFrame, pointMm: Vec3Mm, number: number): EdgeLabel {
  const d = vec3Combine([1, pointMm], [-1, bodyFrame.originMm]);
  const x = d[0] * bodyFrame.xAxis[0] + d[1] * bodyFrame.xAxis[1] + d[2] * bodyFrame.xAxis[2];
  const y = d[0] * bodyFrame.yAxis[0] + d[1] * bodyFrame.yAxis[1] + d[2] * bodyFrame.yAxis[2];
  return { number, atMm: [x, y], angleRad: 0 };
}
