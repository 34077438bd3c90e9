/**
 * Preparing a repaired triangle mesh for paper: neighbouring triangles of one part whose normals lie within
 * `MESH_COPLANAR_ANGLE_DEG` of the first triangle of their face merge into one polygon face (a cube's twelve
 * triangles become six squares). A merged face whose outline is not one simple loop (a ring round a hole, two
 * parts touching at a corner) is left as its triangles. Vertices in the middle of a straight edge between two
 * faces, or of a straight free edge, are dropped from both faces' outlines, so each fold is one line.
 * Each face gets flat coordinates in its own plane (outline counter-clockwise seen from outside).
 */
import type { ParsedMesh } from './mesh-types';
import { meshEdges } from './mesh-edges';
import { triangleCross } from './mesh-triangle';

/**
 * Triangles within this angle of their face's first triangle join that face. Only triangles meant to be
 * coplanar should: a merged face is laid flat by projection, and its bend turns every face folded from it,
 * so the error grows with the distance along the piece (half a degree left a 50,000-triangle sphere 4.5 mm
 * off when folded back, and a torus bent 0.45° per quad 1 mm off). Binary STL stores float32 (IEEE 754
 * binary32, a 24-bit significand, so about 6e-8 of the part's size; from memory): a 1 mm triangle in a
 * 100 mm part has its normal turned by rounding alone by about 1e-5 rad (0.0007°). 0.01° merges such
 * triangles with a margin of ten and no more.
 */
export const MESH_COPLANAR_ANGLE_DEG = 0.01;
/** Three points are one straight line when the middle one is off the line by this fraction of its length. */
const COLLINEAR_RELATIVE = 1e-9;

/** One polygon face of the prepared mesh; indices are vertex ids of the mesh. */
export interface MeshFace {
  /** The outline, counter-clockwise seen from outside. */
  loop: number[];
  /** The face's triangles (vertex ids, three each), covering the outline; a face that is one triangle shares `loop`. */
  triangles: number[];
  group: number;
  /** Unit normal (area-weighted) and a unit x axis in the face's plane; flat y = normal × x. */
  normal: [number, number, number];
  xAxis: [number, number, number];
}

export function meshFaces(mesh: ParsedMesh, angleDeg = MESH_COPLANAR_ANGLE_DEG): MeshFace[] {
  const { positions: p, triangles: tr } = mesh;
  const n = tr.length / 3;
  const edges = meshEdges(tr, p.length / 3);
  const normals = new Float64Array(n * 3);
  for (let t = 0; t < n; t++) {
    const nn = triangleNormal(p, tr, t);
    normals.set(nn, t * 3);
  }
  const cosTol = Math.cos((angleDeg * Math.PI) / 180);
  const region = new Int32Array(n).fill(-1);
  const regions: number[][] = [];
  for (let seed = 0; seed < n; seed++) {
    if (region[seed] !== -1) continue;
    const id = regions.length;
    const members = [seed];
    region[seed] = id;
    for (let q = 0; q < members.length; q++) {
      const t = members[q]!;
      for (let k = 0; k < 3; k++) {
        const o = edges.partner[t * 3 + k]!;
        if (o < 0) continue;
        const u = Math.floor(o / 3);
        if (region[u] !== -1 || mesh.triangleGroup[u] !== mesh.triangleGroup[seed]) continue;
        const dot =
          normals[u * 3]! * normals[seed * 3]! +
          normals[u * 3 + 1]! * normals[seed * 3 + 1]! +
          normals[u * 3 + 2]! * normals[seed * 3 + 2]!;
        if (dot < cosTol) continue;
        region[u] = id;
        members.push(u);
      }
    }
    regions.push(members);
  }
  // Outline loops of each region; a region without exactly one simple loop goes back to its triangles.
  const loops: number[][] = [];
  const finalRegions: number[][] = [];
  for (const members of regions) {
    const loop = members.length === 1 ? null : regionLoop(members, tr, edges.partner, region);
    if (loop || members.length === 1) {
      const id = finalRegions.length;
      finalRegions.push(members);
      loops.push(loop ?? [tr[members[0]! * 3]!, tr[members[0]! * 3 + 1]!, tr[members[0]! * 3 + 2]!]);
      for (const t of members) region[t] = id;
    } else {
      for (const t of members) {
        region[t] = finalRegions.length;
        finalRegions.push([t]);
        loops.push([tr[t * 3]!, tr[t * 3 + 1]!, tr[t * 3 + 2]!]);
      }
    }
  }
  const dissolve = dissolvableVertices(tr, edges.partner, region, p);
  return finalRegions.map((members, id) => {
    const outline = loops[id]!;
    const loop = outline.some((v) => dissolve[v]) ? outline.filter((v) => !dissolve[v]) : outline;
    const normal = regionNormal(normals, p, tr, members);
    return {
      loop,
      triangles: loop === outline && members.length === 1 ? loop : regionTriangles(tr, members),
      group: mesh.triangleGroup[members[0]!]!,
      normal,
      xAxis: planeAxis(p, loop, normal),
    };
  });
}

/** The region's triangles' vertex ids, three each. */
function regionTriangles(tr: Uint32Array, members: number[]): number[] {
  const out: number[] = [];
  for (const t of members) out.push(tr[t * 3]!, tr[t * 3 + 1]!, tr[t * 3 + 2]!);
  return out;
}

/** The region's boundary half-edges chained into one loop, or null if they form several loops or pinch. */
function regionLoop(members: number[], tr: Uint32Array, partner: Int32Array, region: Int32Array): number[] | null {
  const id = region[members[0]!]!;
  const next = new Map<number, number>();
  for (const t of members) {
    for (let k = 0; k < 3; k++) {
      const o = partner[t * 3 + k]!;
      if (o >= 0 && region[Math.floor(o / 3)] === id) continue;
      const a = tr[t * 3 + k]!,
        b = tr[t * 3 + ((k + 1) % 3)]!;
      if (next.has(a)) return null;
      next.set(a, b);
    }
  }
  const start = next.keys().next().value as number;
  const loop = [start];
  for (let v = next.get(start)!; v !== start; v = next.get(v)!) {
    if (loop.length > next.size) return null;
    loop.push(v);
  }
  return loop.length === next.size ? loop : null;
}

/** Vertices with exactly two face-boundary edges, in a straight line: the middle of a fold or a free edge. */
function dissolvableVertices(tr: Uint32Array, partner: Int32Array, region: Int32Array, p: Float64Array): Uint8Array {
  const vertexCount = p.length / 3;
  // Per vertex: how many face-boundary edges meet there, and the far ends of the first two.
  const degree = new Int32Array(vertexCount);
  const ends = new Int32Array(vertexCount * 2);
  const link = (v: number, w: number) => {
    if (degree[v]! < 2) ends[v * 2 + degree[v]!] = w;
    degree[v]!++;
  };
  for (let h = 0; h < tr.length; h++) {
    const o = partner[h]!;
    const t = Math.floor(h / 3);
    if (o >= 0 && (region[Math.floor(o / 3)] === region[t] || o < h)) continue;
    const a = tr[h]!,
      b = tr[t * 3 + ((h + 1) % 3)]!;
    link(a, b);
    link(b, a);
  }
  const out = new Uint8Array(vertexCount);
  for (let v = 0; v < vertexCount; v++) {
    if (degree[v] !== 2) continue;
    const a = ends[v * 2]!,
      b = ends[v * 2 + 1]!;
    const ux = p[v * 3]! - p[a * 3]!,
      uy = p[v * 3 + 1]! - p[a * 3 + 1]!,
      uz = p[v * 3 + 2]! - p[a * 3 + 2]!;
    const wx = p[b * 3]! - p[a * 3]!,
      wy = p[b * 3 + 1]! - p[a * 3 + 1]!,
      wz = p[b * 3 + 2]! - p[a * 3 + 2]!;
    const len = Math.hypot(wx, wy, wz);
    const off = Math.hypot(uy * wz - uz * wy, uz * wx - ux * wz, ux * wy - uy * wx) / len;
    const along = (ux * wx + uy * wy + uz * wz) / len;
    if (off <= COLLINEAR_RELATIVE * len && along > 0 && along < len) out[v] = 1;
  }
  return out;
}

function triangleNormal(p: Float64Array, tr: Uint32Array, t: number): [number, number, number] {
  const [x, y, z] = triangleCross(p, tr[t * 3]!, tr[t * 3 + 1]!, tr[t * 3 + 2]!);
  const len = Math.hypot(x, y, z) || 1;
  return [x / len, y / len, z / len];
}

function regionNormal(
  normals: Float64Array,
  p: Float64Array,
  tr: Uint32Array,
  members: number[],
): [number, number, number] {
  if (members.length === 1) {
    const t = members[0]!;
    return [normals[t * 3]!, normals[t * 3 + 1]!, normals[t * 3 + 2]!];
  }
  const s = [0, 0, 0];
  for (const t of members) {
    const c = triangleCross(p, tr[t * 3]!, tr[t * 3 + 1]!, tr[t * 3 + 2]!);
    s[0]! += c[0];
    s[1]! += c[1];
    s[2]! += c[2];
  }
  const len = Math.hypot(s[0]!, s[1]!, s[2]!) || 1;
  return [s[0]! / len, s[1]! / len, s[2]! / len];
}

/** The first outline edge's direction, made perpendicular to the normal. */
function planeAxis(p: Float64Array, loop: number[], n: [number, number, number]): [number, number, number] {
  const a = loop[0]! * 3,
    b = loop[1]! * 3;
  const d = [p[b]! - p[a]!, p[b + 1]! - p[a + 1]!, p[b + 2]! - p[a + 2]!];
  const k = d[0]! * n[0] + d[1]! * n[1] + d[2]! * n[2];
  const x = [d[0]! - k * n[0], d[1]! - k * n[1], d[2]! - k * n[2]];
  const len = Math.hypot(x[0]!, x[1]!, x[2]!) || 1;
  return [x[0]! / len, x[1]! / len, x[2]! / len];
}
