/**
 * Step 1 of the unfold (mesh-unfold.ts): the outline edges of prepared faces that are one edge of the mesh, and
 * the fold forest over them. Edges are slots in typed arrays rather than an object each: a 50,000-triangle mesh
 * has 75,000 of them, and the unfold's memory bounds the models it takes.
 */
import type { Vec3Mm } from '../geometry/types';
import type { MeshFace } from './mesh-faces';

/**
 * Mesh edges between two faces: edge e is outline edge i[e] of face f[e] and outline edge j[e] of face g[e],
 * the second running the other way; f[e] < g[e].
 */
export interface FaceEdges {
  count: number;
  f: Int32Array;
  i: Int32Array;
  g: Int32Array;
  j: Int32Array;
  lengthMm: Float64Array;
  /** The edge's length times (1 + cos θ)/2, θ the turn between the two faces' normals. */
  weight: Float64Array;
}

/** Every pair of face edges that are one edge of the mesh, in the order of the first face's outline. */
export function faceEdges(faces: MeshFace[], vertexCount: number, P: (v: number) => Vec3Mm): FaceEdges {
  const start = new Int32Array(faces.length + 1);
  faces.forEach((face, f) => (start[f + 1] = start[f]! + face.loop.length));
  const halfCount = start[faces.length]!;
  // Outline edge a→b of every face by a × vertexCount + b: its number among all faces' outline edges.
  const byEdge = new Map<number, number>();
  const faceOf = new Int32Array(halfCount);
  faces.forEach((face, f) => {
    const L = face.loop;
    for (let i = 0; i < L.length; i++) {
      byEdge.set(L[i]! * vertexCount + L[(i + 1) % L.length]!, start[f]! + i);
      faceOf[start[f]! + i] = f;
    }
  });
  const capacity = halfCount >> 1;
  const out: FaceEdges = {
    count: 0,
    f: new Int32Array(capacity),
    i: new Int32Array(capacity),
    g: new Int32Array(capacity),
    j: new Int32Array(capacity),
    lengthMm: new Float64Array(capacity),
    weight: new Float64Array(capacity),
  };
  faces.forEach((face, f) => {
    const L = face.loop;
    for (let i = 0; i < L.length; i++) {
      const a = L[i]!,
        b = L[(i + 1) % L.length]!;
      const other = byEdge.get(b * vertexCount + a);
      if (other === undefined || faceOf[other]! <= f) continue;
      const g = faceOf[other]!;
      const pa = P(a),
        pb = P(b);
      const lengthMm = Math.hypot(pb[0] - pa[0], pb[1] - pa[1], pb[2] - pa[2]);
      const nf = face.normal,
        ng = faces[g]!.normal;
      const cos = nf[0] * ng[0] + nf[1] * ng[1] + nf[2] * ng[2];
      const e = out.count++;
      out.f[e] = f;
      out.i[e] = i;
      out.g[e] = g;
      out.j[e] = other - start[g]!;
      out.lengthMm[e] = lengthMm;
      out.weight[e] = (lengthMm * (1 + cos)) / 2;
    }
  });
  return out;
}

/** Fold edges by face, heaviest first: face f's are edge[start[f]] up to edge[start[f + 1] − 1]. */
export interface FoldForest {
  start: Int32Array;
  edge: Int32Array;
}

/**
 * Kruskal's maximum spanning forest over faces of one group, by edge weight (on equal weights the earlier
 * edge first).
 */
export function foldForest(faces: MeshFace[], edges: FaceEdges): FoldForest {
  const F = faces.length;
  const parent = new Int32Array(F);
  for (let i = 0; i < F; i++) parent[i] = i;
  const find = (x: number): number => {
    while (parent[x] !== x) x = parent[x] = parent[parent[x]!]!;
    return x;
  };
  const { f, g, weight } = edges;
  const order = Int32Array.from({ length: edges.count }, (_, e) => e).sort((p, q) => weight[q]! - weight[p]! || p - q);
  const chosen: number[] = [];
  for (const e of order) {
    if (faces[f[e]!]!.group !== faces[g[e]!]!.group) continue;
    const rf = find(f[e]!),
      rg = find(g[e]!);
    if (rf === rg) continue;
    parent[rf] = rg;
    chosen.push(e);
  }
  const start = new Int32Array(F + 1);
  for (const e of chosen) {
    start[f[e]! + 1]!++;
    start[g[e]! + 1]!++;
  }
  for (let x = 0; x < F; x++) start[x + 1]! += start[x]!;
  const next = start.slice(0, F);
  const edge = new Int32Array(2 * chosen.length);
  for (const e of chosen) {
    edge[next[f[e]!]!++] = e;
    edge[next[g[e]!]!++] = e;
  }
  return { start, edge };
}
