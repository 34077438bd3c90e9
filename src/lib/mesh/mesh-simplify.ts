/**
 * Reducing a repaired mesh to a target triangle count, so a finely modelled part can become a kit with fewer,
 * larger faces. The work is meshoptimizer's simplifier (npm `meshoptimizer`: edge collapses ranked by a
 * quadric error, run as WebAssembly embedded in its JavaScript, hence async). It only picks among the
 * existing vertices, so the output keeps the input's own float64 coordinates; float32 copies guide it.
 *
 * Part names: each group is simplified on its own, with its border locked (meshoptimizer's `LockBorder`).
 * The edges between two parts and any open boundary keep every vertex, so each output triangle keeps the
 * part it came from, neighbouring parts still meet edge to edge, and a closed mesh stays closed. The price is
 * that those borders stay as fine as they were: a target below what the parts reach with their borders held
 * is refused, naming the smallest count that works.
 */
import { MeshoptSimplifier } from 'meshoptimizer/simplifier';
import { InputError } from '../errors';
import type { ParsedMesh } from './mesh-types';

/** The fewest triangles one may ask for: a tetrahedron's four, the fewest of any closed solid. */
export const MESH_SIMPLIFY_MIN_TRIANGLES = 4;

export interface MeshSimplified {
  /** Compact: only the vertices the kept triangles use, renumbered in order of first use; groups as given. */
  mesh: ParsedMesh;
  trianglesBefore: number;
  trianglesAfter: number;
  /**
   * The largest distance the simplifier estimates the surface moved (meshoptimizer's returned error),
   * as a fraction of the mesh's size (its largest bounding-box side, meshoptimizer's `getScale`).
   */
  relativeError: number;
}

/** Simplifier flags: borders held still; index lists are a part of the vertex buffer; errors in file units. */
const FLAGS: ('LockBorder' | 'Sparse' | 'ErrorAbsolute')[] = ['LockBorder', 'Sparse', 'ErrorAbsolute'];

interface PartResult {
  indices: Uint32Array;
  /** Absolute error, in the file's unit. */
  error: number;
}

export async function meshSimplify(mesh: ParsedMesh, targetTriangles: number): Promise<MeshSimplified> {
  const before = mesh.triangles.length / 3;
  checkTarget(targetTriangles, before);
  await MeshoptSimplifier.ready;
  const positions = centredFloat32(mesh.positions);
  const parts = partIndices(mesh);
  // No error limit: the caller asks for a count, and the error that count costs is reported.
  const run = (indices: Uint32Array, triangles: number): PartResult => {
    const [out, error] = MeshoptSimplifier.simplify(indices, positions, 3, triangles * 3, Infinity, FLAGS);
    return { indices: out, error };
  };
  // First the fewest triangles each part reaches with its border held, then the target shared out above that.
  const fewest = parts.map((p) => run(p.indices, 0));
  const least = fewest.reduce((s, r) => s + r.indices.length / 3, 0);
  if (least > targetTriangles)
    throw new InputError(
      `With the edges between its parts and its open edges kept, this mesh reduces to no fewer than ${least} triangles; ask for between ${least} and ${before}.`,
    );
  const shares = shareOut(
    targetTriangles,
    parts.map((p) => p.indices.length / 3),
    fewest.map((r) => r.indices.length / 3),
  );
  const results = parts.map((p, i) => {
    const share = shares[i]!;
    if (share * 3 >= p.indices.length) return { indices: p.indices, error: 0 };
    const r = run(p.indices, share);
    // The simplifier may stop short of a target; the fewest run is within this share by construction.
    return r.indices.length <= share * 3 ? r : fewest[i]!;
  });
  const simplified = compact(
    mesh,
    results.map((r) => r.indices),
    parts.map((p) => p.group),
  );
  const scale = MeshoptSimplifier.getScale(positions, 3);
  const error = results.reduce((m, r) => Math.max(m, r.error), 0);
  return {
    mesh: simplified,
    trianglesBefore: before,
    trianglesAfter: simplified.triangles.length / 3,
    relativeError: scale > 0 ? error / scale : 0,
  };
}

function checkTarget(target: number, before: number): void {
  const min = MESH_SIMPLIFY_MIN_TRIANGLES;
  if (before < min)
    throw new InputError(`This mesh has ${before} triangles; only a mesh of at least ${min} can be reduced.`);
  if (!Number.isInteger(target) || target < min || target > before)
    throw new InputError(
      `The target triangle count must be a whole number from ${min} to ${before} (this mesh's count); received ${target}.`,
    );
}

/** Positions centred on their bounding box before rounding to float32, so a part far from the origin keeps its detail. */
function centredFloat32(p: Float64Array): Float32Array {
  const out = new Float32Array(p.length);
  for (let k = 0; k < 3; k++) {
    let lo = Infinity,
      hi = -Infinity;
    for (let i = k; i < p.length; i += 3) {
      lo = Math.min(lo, p[i]!);
      hi = Math.max(hi, p[i]!);
    }
    const mid = (lo + hi) / 2;
    for (let i = k; i < p.length; i += 3) out[i] = p[i]! - mid;
  }
  return out;
}

/** Each group that has triangles, with its triangles' vertex indices (into the whole vertex buffer). */
function partIndices(mesh: ParsedMesh): { group: number; indices: Uint32Array }[] {
  const lists = new Map<number, number[]>();
  for (let t = 0; t < mesh.triangleGroup.length; t++) {
    const g = mesh.triangleGroup[t]!;
    let list = lists.get(g);
    if (!list) lists.set(g, (list = []));
    list.push(mesh.triangles[t * 3]!, mesh.triangles[t * 3 + 1]!, mesh.triangles[t * 3 + 2]!);
  }
  return [...lists.entries()]
    .sort((a, b) => a[0] - b[0])
    .map(([group, list]) => ({ group, indices: Uint32Array.from(list) }));
}

/**
 * Shares of `target` between parts: each part its fewest, then what is left in proportion to how far each can
 * still go down (largest remainders take the odd triangles). Needs sum(fewest) ≤ target ≤ sum(sizes).
 */
function shareOut(target: number, sizes: number[], fewest: number[]): number[] {
  const room = sizes.map((n, i) => n - fewest[i]!);
  const roomTotal = room.reduce((s, r) => s + r, 0);
  const spare = target - fewest.reduce((s, m) => s + m, 0);
  const exact = room.map((r) => (roomTotal > 0 ? (spare * r) / roomTotal : 0));
  const shares = exact.map((x, i) => fewest[i]! + Math.floor(x));
  let left = target - shares.reduce((s, x) => s + x, 0);
  const order = exact.map((x, i) => ({ i, rest: x - Math.floor(x) })).sort((a, b) => b.rest - a.rest || a.i - b.i);
  for (const { i } of order) {
    if (left <= 0) break;
    if (shares[i]! < sizes[i]!) {
      shares[i]!++;
      left--;
    }
  }
  return shares;
}

/** One mesh from the parts' index lists: vertices renumbered in order of first use, float64 positions copied. */
function compact(mesh: ParsedMesh, lists: Uint32Array[], groups: number[]): ParsedMesh {
  const count = lists.reduce((s, l) => s + l.length, 0);
  const triangles = new Uint32Array(count);
  const triangleGroup = new Uint16Array(count / 3);
  const remap = new Int32Array(mesh.positions.length / 3).fill(-1);
  const kept: number[] = [];
  let at = 0;
  lists.forEach((list, part) => {
    triangleGroup.fill(groups[part]!, at / 3, (at + list.length) / 3);
    for (const v of list) {
      if (remap[v] === -1) {
        remap[v] = kept.length;
        kept.push(v);
      }
      triangles[at++] = remap[v]!;
    }
  });
  const positions = new Float64Array(kept.length * 3);
  kept.forEach((v, i) => positions.set(mesh.positions.subarray(v * 3, v * 3 + 3), i * 3));
  return { positions, triangles, triangleGroup, groups: mesh.groups };
}
