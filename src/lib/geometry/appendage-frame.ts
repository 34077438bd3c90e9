/**
 * Where an appendage meets the body: its foot point on the face and its direction away from it, in model
 * space (mm at kit scale), plus a frame around that direction for rolled parts.
 */
import type { Appendage } from './model-schema';
import type { BodyFace } from './body-shape';
import type { PlaneFrame, Vec3Mm } from './types';
import { vec3Combine, vec3Cross, vec3Unit } from './vec';

/** Foot point on the face (its centre plus the position offset) at 1:scaleDenominator, mm. */
export function appendageFootMm(a: Appendage, face: BodyFace, scaleDenominator: number): Vec3Mm {
  const k = 1000 / scaleDenominator;
  return vec3Combine([1, face.centreMm], [a.position.uM * k, face.uAxis], [a.position.vM * k, face.vAxis]);
}

/** Unit direction away from the face: the outward normal tilted by tiltDeg toward azimuthDeg (from u). */
export function appendageDirection(orientation: { tiltDeg: number; azimuthDeg: number }, face: BodyFace): Vec3Mm {
  const t = (orientation.tiltDeg * Math.PI) / 180;
  const az = (orientation.azimuthDeg * Math.PI) / 180;
  return vec3Unit(
    vec3Combine(
      [Math.cos(t), face.normal],
      [Math.sin(t) * Math.cos(az), face.uAxis],
      [Math.sin(t) * Math.sin(az), face.vAxis],
    ),
  );
}

/**
 * A frame whose normal (xAxis × yAxis) is `axis`, origin at `originMm`; xAxis is the face's u axis made
 * perpendicular to `axis` (or v when u is parallel), so rolled parts line up with their face.
 */
export function frameAroundAxis(originMm: Vec3Mm, axis: Vec3Mm, face: BodyFace): PlaneFrame {
  let x = vec3Cross(vec3Cross(axis, face.uAxis), axis);
  if (Math.hypot(...x) < 1e-9) x = vec3Cross(vec3Cross(axis, face.vAxis), axis);
  const xAxis = vec3Unit(x);
  return { originMm, xAxis, yAxis: vec3Cross(axis, xAxis) };
}

/** A frame whose yAxis is `axis` (a tube's length), normal chosen from the face so the tube starts on it. */
export function frameAlongAxis(originMm: Vec3Mm, axis: Vec3Mm, face: BodyFace): PlaneFrame {
  const around = frameAroundAxis(originMm, axis, face);
  // around.xAxis ⊥ axis; take it as the tube frame's normal, so xAxis = axis × normal.
  const normal = around.xAxis;
  return { originMm, xAxis: vec3Cross(axis, normal), yAxis: axis };
}
