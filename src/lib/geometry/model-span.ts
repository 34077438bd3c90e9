/**
 * The deployed extent of a model at full size, mm: the bounding box of every solid part and every wire
 * boom's tip, with the two largest extents as the floor footprint of a life-size layout.
 */
import type { Model } from './model-schema';
import { bodyFaces } from './body-shape';
import { appendageDirection, appendageFootMm } from './appendage-frame';
import { modelMesh } from './model-mesh';
import { vec3Combine } from './vec';

export interface ModelSpan {
  /** Extents along model x, y, z, mm at full size. */
  extentsMm: [number, number, number];
  /** The footprint on the floor: the two largest extents, longer first, mm at full size. */
  footprintMm: [number, number];
}

/** The span (tip to tip) of a parsed model at full size. */
export function modelSpan(model: Model): ModelSpan {
  const mesh = modelMesh(model, 1);
  const min = [Infinity, Infinity, Infinity];
  const max = [-Infinity, -Infinity, -Infinity];
  const add = (x: number, y: number, z: number) => {
    [x, y, z].forEach((v, i) => {
      min[i] = Math.min(min[i]!, v);
      max[i] = Math.max(max[i]!, v);
    });
  };
  for (let i = 0; i < mesh.positions.length; i += 3)
    add(mesh.positions[i]!, mesh.positions[i + 1]!, mesh.positions[i + 2]!);
  const faces = bodyFaces(model.body, 1);
  for (const a of model.appendages) {
    if (a.kind !== 'wire-boom') continue;
    const face = faces.find((f) => f.ref === a.face)!;
    const tip = vec3Combine(
      [1, appendageFootMm(a, face, 1)],
      [a.lengthM * 1000, appendageDirection(a.orientation, face)],
    );
    add(tip[0], tip[1], tip[2]);
  }
  const extentsMm = [0, 1, 2].map((i) => max[i]! - min[i]!) as [number, number, number];
  const sorted = [...extentsMm].sort((a, b) => b - a);
  return { extentsMm, footprintMm: [sorted[0]!, sorted[1]!] };
}
