/**
 * The model as parts for a 3D printer: each part a closed solid laid flat in its own frame (mm at kit scale,
 * standing on z = 0, its footprint from the origin), no wall thinner than the nozzle allows, and the parts a
 * printer cannot make as a stated substitute — wire booms are thread, as on paper. Parts keep the model's order
 * (body first, then appendages as listed), which is the order they are glued together.
 */
import type { Appendage, Model } from './model-schema';
import type { ModelMesh, Vec3Mm } from './types';
import { bodyFaces } from './body-shape';
import { meshLoft, meshRingSegments } from './model-mesh';
import { wireBoomThread } from './wire-boom';

/** Extrusion lines in the thinnest wall a part may have (common practice, no source: two perimeters). */
export const PRINT_WALL_LINES = 2;
/** Thickness of a printed flat panel when the nozzle allows less, mm (common practice, no source). */
export const PRINT_PANEL_THICKNESS_MM = 1;

/** What the printer is asked to make: its nozzle sets the thinnest wall. */
export interface PrintNozzle {
  nozzleMm: number;
}

export interface PrintPart {
  partId: string;
  label: string;
  /** 1-based order of gluing. */
  step: number;
  /** Where it goes, in words ("on the body's top face"). */
  attach: string;
  /** Closed, outward-wound triangles in the part's own frame: z ≥ 0, x and y from 0. */
  mesh: ModelMesh;
  sizeMm: Vec3Mm;
  /** How the part was changed so it prints ("thickened to 0.8 mm"), if it was. */
  note?: string;
  /** What to use instead when the part is longer than the bed (a boom: a stick cut to length). */
  insteadWhenLong?: string;
}

/** A part the printer does not make, and what to use instead. */
export interface PrintSubstitute {
  partId: string;
  label: string;
  step: number;
  attach: string;
  instead: string;
}

/** The thinnest wall the nozzle prints, mm. */
export function printWallMm(target: PrintNozzle): number {
  return PRINT_WALL_LINES * target.nozzleMm;
}

/** The printable parts and substitutes of a parsed model at 1:scaleDenominator. */
export function printParts(
  model: Model,
  scaleDenominator: number,
  target: PrintNozzle,
): { parts: PrintPart[]; substitutes: PrintSubstitute[] } {
  const k = 1000 / scaleDenominator;
  const wall = printWallMm(target);
  const faces = bodyFaces(model.body, scaleDenominator);
  const sides = faces.slice(0, -2);
  const parts: PrintPart[] = [];
  const substitutes: PrintSubstitute[] = [];
  parts.push(
    printPartOf({
      partId: 'body',
      label: 'Body',
      step: 1,
      attach: 'printed standing on its bottom face',
      build: (positions, indices) =>
        meshLoft(
          positions,
          indices,
          sides.map((f) => f.polygonMm[0]!),
          sides.map((f) => f.polygonMm[3]!),
        ),
    }),
  );
  model.appendages.forEach((a, i) => {
    const step = i + 2;
    const attach = `glue it to the body's ${printFaceWords(a.face)}`;
    const common = { partId: a.id, label: a.label, step, attach };
    if (a.kind === 'wire-boom') {
      const thread = wireBoomThread(a.id, a.label, a.lengthM, scaleDenominator);
      substitutes.push({
        ...common,
        instead: `thread, ${Math.round(thread.threadLengthMm)} mm (${Math.round(thread.deployedLengthMm)} mm deployed plus the knots)`,
      });
      return;
    }
    const part = printAppendage(a, k, wall);
    parts.push(printPartOf({ ...common, ...part }));
  });
  return { parts, substitutes };
}

function printFaceWords(face: string): string {
  if (face === 'top' || face === 'bottom') return `${face} face`;
  return `side wall ${Number(face.split(':')[1]) + 1}`;
}

type MeshBuild = (positions: number[], indices: number[]) => void;

/** One appendage as a part: how to build its mesh and any note on what was changed to print it. */
function printAppendage(
  a: Exclude<Appendage, { kind: 'wire-boom' }>,
  k: number,
  wall: number,
): { build: MeshBuild; note?: string; insteadWhenLong?: string } {
  if (a.kind === 'rigid-boom') {
    const real = a.diameterM * k;
    const d = Math.max(real, wall);
    const length = a.lengthM * k;
    return {
      build: (p, ix) => printLyingRod(p, ix, d / 2, length),
      note: d > real ? printThickened(real, d) : undefined,
      insteadWhenLong: `a round stick (a bamboo skewer or a drinking straw) about ${real.toFixed(1)} mm across, cut to ${Math.round(length)} mm`,
    };
  }
  if (a.kind === 'nozzle') {
    const [rt, re] = [(a.throatDiameterM * k) / 2, (a.exitDiameterM * k) / 2];
    const [t, e] = [Math.max(rt, wall / 2), Math.max(re, wall / 2)];
    // Solid, standing on its wider end.
    const [r0, r1] = e >= t ? [e, t] : [t, e];
    return {
      build: (p, ix) =>
        printLathe(p, ix, [
          [0, 0],
          [r0, 0],
          [r1, a.lengthM * k],
          [0, a.lengthM * k],
        ]),
      note: t > rt || e > re ? printThickened(2 * Math.min(rt, re), 2 * Math.min(t, e)) : undefined,
    };
  }
  if (a.kind === 'dish') return printDish((a.innerDiameterM ?? 0) * k * 0.5, (a.diameterM * k) / 2, a.depthM * k, wall);
  // Solar and deployable panels: flat slabs.
  const [w, h] = [a.widthM * k, a.heightM * k];
  const t = Math.max(wall, PRINT_PANEL_THICKNESS_MM);
  const rect = (z: number): Vec3Mm[] => [
    [0, 0, z],
    [w, 0, z],
    [w, h, z],
    [0, h, z],
  ];
  return { build: (p, ix) => meshLoft(p, ix, rect(0), rect(t)) };
}

function printThickened(realMm: number, printedMm: number): string {
  return `${realMm.toFixed(1)} mm at this scale, printed ${printedMm.toFixed(1)} mm thick so the nozzle can make it`;
}

/**
 * A dish as a bowl of the given wall standing on its back: the outer cone from the inner radius r0 at z = 0
 * to the rim radius R at the depth, and the inner surface one wall in along the cone's normal. A dish too
 * shallow or small for a bowl of that wall is printed as a flat disc, and says so.
 */
function printDish(r0: number, R: number, depth: number, wall: number): { build: MeshBuild; note?: string } {
  const len = Math.hypot(R - r0, depth);
  // Inner line: the outer line A(r0, 0) → B(R, depth) moved by `wall` along its inward normal (−depth, R − r0)/len.
  const [nr, nz] = [-depth / len, (R - r0) / len];
  const [ur, uz] = [(R - r0) / len, depth / len];
  const at = (z: number): number => {
    const s = (z - wall * nz) / uz;
    return r0 + wall * nr + s * ur;
  };
  const rimInner = at(depth);
  const bottomInner = at(wall);
  const bowl = depth >= 2 * wall && rimInner > wall && bottomInner < rimInner;
  if (!bowl) {
    return {
      build: (p, ix) =>
        printLathe(p, ix, [
          [0, 0],
          [R, 0],
          [R, wall],
          [0, wall],
        ]),
      note: `too shallow for a printed bowl at this scale: a flat disc ${(2 * R).toFixed(1)} mm across`,
    };
  }
  const profile: [number, number][] = [[0, 0]];
  if (r0 > 0) profile.push([r0, 0]);
  profile.push([R, depth], [rimInner, depth]);
  if (bottomInner > 0) profile.push([bottomInner, wall], [0, wall]);
  else profile.push([0, wall + (-bottomInner * uz) / ur]);
  return { build: (p, ix) => printLathe(p, ix, profile) };
}

/**
 * A solid of revolution about the z axis from a closed profile of (r, z) points (r ≥ 0, a simple polygon
 * whose points on the axis are consecutive): each profile edge sweeps a band of quads, or a fan where one
 * end lies on the axis; points on the axis become single vertices, so the surface is closed.
 */
export function printLathe(positions: number[], indices: number[], profile: readonly [number, number][]): void {
  const n = meshRingSegments(Math.max(...profile.map((p) => p[0])));
  const rings = profile.map(([r, z]) => {
    const first = positions.length / 3;
    if (r === 0) {
      positions.push(0, 0, z);
      return { first, single: true };
    }
    for (let i = 0; i < n; i++) {
      const t = (2 * Math.PI * i) / n;
      positions.push(r * Math.cos(t), r * Math.sin(t), z);
    }
    return { first, single: false };
  });
  const v = (ring: { first: number; single: boolean }, i: number) => (ring.single ? ring.first : ring.first + (i % n));
  rings.forEach((a, j) => {
    const b = rings[(j + 1) % rings.length]!;
    if (a.single && b.single) return;
    for (let i = 0; i < n; i++) {
      if (!a.single) indices.push(v(a, i), v(a, i + 1), v(b, i + 1));
      if (!b.single) indices.push(v(a, i), v(b, i + 1), v(b, i));
    }
  });
}

/** A rod of radius r and length L lying along x with one flat facet on the bed (an even-sided prism). */
function printLyingRod(positions: number[], indices: number[], r: number, length: number): void {
  const n = meshRingSegments(r) + (meshRingSegments(r) % 2);
  // Vertices at −90° ± 180°/n: the facet between them is flat on z = 0 after the lift by r·cos(π/n).
  const lift = r * Math.cos(Math.PI / n);
  const ring = (x: number): Vec3Mm[] =>
    Array.from({ length: n }, (_, i) => {
      const t = -Math.PI / 2 + Math.PI / n + (2 * Math.PI * i) / n;
      return [x, r * Math.cos(t), r * Math.sin(t) + lift];
    });
  meshLoft(positions, indices, ring(0), ring(length));
}

/** A part: its mesh built, wound outward (divergence theorem: a closed surface's signed volume is positive when its normals point out), moved to z ≥ 0 and x, y ≥ 0. */
function printPartOf(spec: Omit<PrintPart, 'mesh' | 'sizeMm'> & { build: MeshBuild }): PrintPart {
  const positions: number[] = [];
  const indices: number[] = [];
  spec.build(positions, indices);
  if (meshSignedVolume(positions, indices) < 0)
    for (let i = 0; i < indices.length; i += 3) [indices[i + 1], indices[i + 2]] = [indices[i + 2]!, indices[i + 1]!];
  const min = [Infinity, Infinity, Infinity];
  const max = [-Infinity, -Infinity, -Infinity];
  for (let i = 0; i < positions.length; i++) {
    min[i % 3] = Math.min(min[i % 3]!, positions[i]!);
    max[i % 3] = Math.max(max[i % 3]!, positions[i]!);
  }
  for (let i = 0; i < positions.length; i++) positions[i]! -= min[i % 3]!;
  const { build: _build, note, insteadWhenLong, ...rest } = spec;
  return {
    ...rest,
    ...(note ? { note } : {}),
    ...(insteadWhenLong ? { insteadWhenLong } : {}),
    mesh: { positions: Float32Array.from(positions), indices: Uint32Array.from(indices) },
    sizeMm: [max[0]! - min[0]!, max[1]! - min[1]!, max[2]! - min[2]!],
  };
}

/** Σ a · (b × c) / 6 over the triangles. */
function meshSignedVolume(positions: readonly number[], indices: readonly number[]): number {
  let v = 0;
  const p = (i: number) => [positions[3 * i]!, positions[3 * i + 1]!, positions[3 * i + 2]!] as const;
  for (let t = 0; t < indices.length; t += 3) {
    const [a, b, c] = [p(indices[t]!), p(indices[t + 1]!), p(indices[t + 2]!)];
    v += a[0] * (b[1] * c[2] - b[2] * c[1]) - a[1] * (b[0] * c[2] - b[2] * c[0]) + a[2] * (b[0] * c[1] - b[1] * c[0]);
  }
  return v / 6;
}
