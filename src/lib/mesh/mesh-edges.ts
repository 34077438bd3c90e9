/**
 * The edges of an indexed triangle mesh. Half-edge h = 3t + k runs from corner k of triangle t to corner
 * k + 1. An edge used by two triangles is manifold (its half-edges are partners), by one an open boundary, by
 * more than two non-manifold.
 */
export interface MeshEdges {
  /** Partner half-edge of each half-edge across a manifold edge, or -1. */
  partner: Int32Array;
  /** Manifold edges as their two half-edges. */
  pairs: [number, number][];
  boundaryCount: number;
  /** Non-manifold edges: their two vertices and how many triangles share them. */
  nonManifold: [number, number, number][];
}

export function meshEdges(triangles: Uint32Array, vertexCount: number): MeshEdges {
  const byEdge = new Map<number, number[]>();
  for (let h = 0; h < triangles.length; h++) {
    const a = triangles[h]!,
      b = triangles[h - (h % 3) + ((h + 1) % 3)]!;
    const key = Math.min(a, b) * vertexCount + Math.max(a, b);
    const list = byEdge.get(key);
    if (list) list.push(h);
    else byEdge.set(key, [h]);
  }
  const partner = new Int32Array(triangles.length).fill(-1);
  const pairs: [number, number][] = [];
  const nonManifold: [number, number, number][] = [];
  let boundaryCount = 0;
  for (const list of byEdge.values()) {
    if (list.length === 1) boundaryCount++;
    else if (list.length === 2) {
      partner[list[0]!] = list[1]!;
      partner[list[1]!] = list[0]!;
      pairs.push([list[0]!, list[1]!]);
    } else {
      const h = list[0]!;
      nonManifold.push([triangles[h]!, triangles[h - (h % 3) + ((h + 1) % 3)]!, list.length]);
    }
  }
  return { partner, pairs, boundaryCount, nonManifold };
}

/** The vertex a half-edge ends at. */
export const halfEdgeEnd = (triangles: Uint32Array, h: number): number => triangles[h - (h % 3) + ((h + 1) % 3)]!;
