/**
 * The assembled model as closed triangle meshes for STL and the preview: body, rigid booms (closed
 * cylinders), dishes and nozzles (solid cones and frusta), panels (thin slabs). Model space, mm at kit
 * scale; triangles counter-clockwise seen from outside. Wire booms are threads and are left out.
 */
import type { Model } from './model-schema';
import type { ModelMesh, Vec3Mm } from './types';
import { bodyFaces } from './body-shape';
import { appendageDirection, appendageFootMm, frameAroundAxis } from './appendage-frame';
import { deployablePanelFrame } from './panel-pattern';
import { CHORD_TOLERANCE_MM } from './paper';
import { vec3Combine, vec3Cross, vec3Sub, vec3Length } from './vec';
import { launchStackLoftRings } from './launch-stack';
import { meshShapeSolid } from '../mesh/mesh-model';

/** Slab thickness of panels in the mesh, mm at kit scale (a printable plate; common practice, no source). */
export const PANEL_MESH_THICKNESS_MM = 1;
const RING_SEGMENTS_MIN = 8;
const RING_SEGMENTS_MAX = 128;

/** The closed meshes of every solid part of a parsed model at 1:scaleDenominator. */
export function modelMesh(model: Model, scaleDenominator: number): ModelMesh {
  if (model.mesh) return meshShapeSolid(model.mesh, scaleDenominator);
  const k = 1000 / scaleDenominator;
  const positions: number[] = [];
  const indices: number[] = [];
  const loft = (bottom: Vec3Mm[], top: Vec3Mm[]) => meshLoft(positions, indices, bottom, top);
  if (model.stack) {
    for (const part of launchStackLoftRings(model, scaleDenominator)) loft(part.bottom, part.top);
    return { positions: Float32Array.from(positions), indices: Uint32Array.from(indices) };
  }
  const faces = bodyFaces(model.body, scaleDenominator);
  const sides = faces.slice(0, -2);
  loft(
    sides.map((f) => f.polygonMm[0]!),
    sides.map((f) => f.polygonMm[3]!),
  );
  for (const a of model.appendages) {
    const face = faces.find((f) => f.ref === a.face)!;
    const foot = appendageFootMm(a, face, scaleDenominator);
    if (a.kind === 'rigid-boom' || a.kind === 'dish' || a.kind === 'nozzle') {
      const axis = appendageDirection(a.orientation, face);
      const frame = frameAroundAxis(foot, axis, face);
      const [r0, r1, len] =
        a.kind === 'rigid-boom'
          ? [a.diameterM / 2, a.diameterM / 2, a.lengthM]
          : a.kind === 'dish'
            ? [(a.innerDiameterM ?? 0) / 2, a.diameterM / 2, a.depthM]
            : [a.throatDiameterM / 2, a.exitDiameterM / 2, a.lengthM];
      // Both rings share the segment count of the wider one so the loft's walls pair up.
      const n = meshRingSegments(Math.max(r0, r1) * k);
      const ring = (rMm: number, along: number): Vec3Mm[] => {
        if (rMm === 0) return [vec3Combine([1, foot], [along, axis])];
        return Array.from({ length: n }, (_, i) => {
          const t = (2 * Math.PI * i) / n;
          return vec3Combine(
            [1, foot],
            [along, axis],
            [rMm * Math.cos(t), frame.xAxis],
            [rMm * Math.sin(t), frame.yAxis],
          );
        });
      };
      loft(ring(r0 * k, 0), ring(r1 * k, len * k));
    } else if (a.kind === 'solar-panel' || a.kind === 'deployable-panel') {
      const [w, h] = [a.widthM * k, a.heightM * k];
      let frame = {
        originMm: vec3Combine([1, foot], [-w / 2, face.uAxis], [-h / 2, face.vAxis]),
        xAxis: face.uAxis,
        yAxis: face.vAxis,
      };
      if (a.kind === 'deployable-panel') {
        const along = a.hingeEdge === 'top' || a.hingeEdge === 'bottom' ? a.position.uM * k : a.position.vM * k;
        const faceW = vec3Length(vec3Sub(face.polygonMm[1]!, face.polygonMm[0]!));
        frame = deployablePanelFrame(
          face,
          a.hingeEdge,
          along,
          w,
          faceW,
          face.polygonMm[2]![2],
          (a.deployAngleDeg * Math.PI) / 180,
        ).frame;
      }
      const n = vec3Cross(frame.xAxis, frame.yAxis);
      const rect = [
        [0, 0],
        [w, 0],
        [w, h],
        [0, h],
      ].map(([x, y]) => vec3Combine([1, frame.originMm], [x!, frame.xAxis], [y!, frame.yAxis]));
      // A fixed panel sits on its face; a deployable one keeps its printed face and grows toward its back.
      loft(
        rect.map((p) => vec3Combine([1, p], [-PANEL_MESH_THICKNESS_MM, n])),
        rect,
      );
    }
  }
  return { positions: Float32Array.from(positions), indices: Uint32Array.from(indices) };
}

/** Segments for a ring of radius rMm within CHORD_TOLERANCE_MM, between the ring limits. */
export function meshRingSegments(rMm: number): number {
  const step = 2 * Math.acos(Math.max(-1, 1 - CHORD_TOLERANCE_MM / rMm));
  return Math.min(RING_SEGMENTS_MAX, Math.max(RING_SEGMENTS_MIN, Math.ceil((2 * Math.PI) / step)));
}

/**
 * A closed solid between two rings (counter-clockwise seen along bottom→top), either of which may be a
 * single point (a cone's apex); both rings of the same length otherwise. Caps are fans.
 */
export function meshLoft(positions: number[], indices: number[], bottom: Vec3Mm[], top: Vec3Mm[]): void {
  const base = positions.length / 3;
  for (const p of [...bottom, ...top]) positions.push(p[0], p[1], p[2]);
  const b = (i: number) => base + (bottom.length === 1 ? 0 : i % bottom.length);
  const t = (i: number) => base + bottom.length + (top.length === 1 ? 0 : i % top.length);
  const n = Math.max(bottom.length, top.length);
  for (let i = 0; i < n; i++) {
    if (bottom.length > 1) indices.push(b(i), b(i + 1), t(i + 1));
    if (top.length > 1) indices.push(b(i), t(i + 1), t(i));
  }
  for (let i = 1; i + 1 < bottom.length; i++) indices.push(b(0), b(i + 1), b(i));
  for (let i = 1; i + 1 < top.length; i++) indices.push(t(0), t(i), t(i + 1));
}
