/**
 * Where a triangle mesh passes through itself: pairs of triangles sharing no vertex where an edge of one
 * crosses the other's interior (the segment–triangle test of Möller & Trumbore, "Fast, minimum storage
 * ray-triangle intersection", J. Graphics Tools 2(1), 1997). Candidates come from a hash grid of cells about
 * one triangle across. Touching (an edge ending on a face) and coplanar overlaps are not counted. Crossings
 * within one shell (a surface through itself) are told apart from crossings between shells (two parts pushed
 * into each other, which paper parts glued side by side can still show). Counting stops at `cap` pairs each.
 */
const SELF_INTERSECTION_CAP = 1000;
/** Crossings nearer than this fraction of an edge to its ends or the triangle's sides count as touching. */
const TOUCH_FRACTION = 1e-7;

export interface SelfIntersection {
  /** Crossing triangle pairs of one shell. */
  count: number;
  /** Crossing triangle pairs of two different shells. */
  betweenShells: number;
  cap: number;
  /** A vertex of the first crossing triangle of one shell found, or null. */
  first: number | null;
}

export function meshSelfIntersection(p: Float64Array, triangles: Uint32Array, shell: Uint32Array): SelfIntersection {
  const n = triangles.length / 3;
  const lo = new Float64Array(n * 3),
    hi = new Float64Array(n * 3);
  let sizeSum = 0;
  for (let t = 0; t < n; t++) {
    for (let d = 0; d < 3; d++) {
      const a = p[triangles[t * 3]! * 3 + d]!,
        b = p[triangles[t * 3 + 1]! * 3 + d]!,
        c = p[triangles[t * 3 + 2]! * 3 + d]!;
      lo[t * 3 + d] = Math.min(a, b, c);
      hi[t * 3 + d] = Math.max(a, b, c);
    }
    sizeSum += Math.max(hi[t * 3]! - lo[t * 3]!, hi[t * 3 + 1]! - lo[t * 3 + 1]!, hi[t * 3 + 2]! - lo[t * 3 + 2]!);
  }
  const cell = sizeSum / n || 1;
  const cellKey = (i: number, j: number, k: number) => ((i * 73856093) ^ (j * 19349663) ^ (k * 83492791)) | 0;
  const grid = new Map<number, number[]>();
  const cellsOf = (t: number, visit: (key: number) => void) => {
    const i0 = Math.floor(lo[t * 3]! / cell),
      i1 = Math.floor(hi[t * 3]! / cell);
    const j0 = Math.floor(lo[t * 3 + 1]! / cell),
      j1 = Math.floor(hi[t * 3 + 1]! / cell);
    const k0 = Math.floor(lo[t * 3 + 2]! / cell),
      k1 = Math.floor(hi[t * 3 + 2]! / cell);
    for (let i = i0; i <= i1; i++)
      for (let j = j0; j <= j1; j++) for (let k = k0; k <= k1; k++) visit(cellKey(i, j, k));
  };
  for (let t = 0; t < n; t++)
    cellsOf(t, (key) => {
      const list = grid.get(key);
      if (list) list.push(t);
      else grid.set(key, [t]);
    });
  const stamp = new Int32Array(n).fill(-1);
  let count = 0;
  let betweenShells = 0;
  let first: number | null = null;
  for (let t = 0; t < n && count < SELF_INTERSECTION_CAP; t++) {
    cellsOf(t, (key) => {
      for (const u of grid.get(key)!) {
        if (u <= t || stamp[u] === t || count >= SELF_INTERSECTION_CAP) continue;
        stamp[u] = t;
        const same = shell[t] === shell[u];
        if (!same && betweenShells >= SELF_INTERSECTION_CAP) continue;
        if (!boxesOverlap(lo, hi, t, u) || shareVertex(triangles, t, u)) continue;
        if (!trianglesCross(p, triangles, t, u)) continue;
        if (same) {
          count++;
          first ??= triangles[t * 3]!;
        } else betweenShells++;
      }
    });
  }
  return { count, betweenShells, cap: SELF_INTERSECTION_CAP, first };
}

function boxesOverlap(lo: Float64Array, hi: Float64Array, t: number, u: number): boolean {
  for (let d = 0; d < 3; d++) if (lo[t * 3 + d]! > hi[u * 3 + d]! || lo[u * 3 + d]! > hi[t * 3 + d]!) return false;
  return true;
}

function shareVertex(tr: Uint32Array, t: number, u: number): boolean {
  for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) if (tr[t * 3 + i] === tr[u * 3 + j]) return true;
  return false;
}

function trianglesCross(p: Float64Array, tr: Uint32Array, t: number, u: number): boolean {
  for (const [x, y] of [
    [t, u],
    [u, t],
  ] as const) {
    for (let k = 0; k < 3; k++) {
      if (segmentCrossesTriangle(p, tr[x * 3 + k]!, tr[x * 3 + ((k + 1) % 3)]!, tr, y)) return true;
    }
  }
  return false;
}

/** Möller–Trumbore: segment s0→s1 meets triangle t strictly inside both. */
function segmentCrossesTriangle(p: Float64Array, s0: number, s1: number, tr: Uint32Array, t: number): boolean {
  const a = tr[t * 3]! * 3,
    b = tr[t * 3 + 1]! * 3,
    c = tr[t * 3 + 2]! * 3;
  const ox = p[s0 * 3]!,
    oy = p[s0 * 3 + 1]!,
    oz = p[s0 * 3 + 2]!;
  const dx = p[s1 * 3]! - ox,
    dy = p[s1 * 3 + 1]! - oy,
    dz = p[s1 * 3 + 2]! - oz;
  const e1x = p[b]! - p[a]!,
    e1y = p[b + 1]! - p[a + 1]!,
    e1z = p[b + 2]! - p[a + 2]!;
  const e2x = p[c]! - p[a]!,
    e2y = p[c + 1]! - p[a + 1]!,
    e2z = p[c + 2]! - p[a + 2]!;
  const hx = dy * e2z - dz * e2y,
    hy = dz * e2x - dx * e2z,
    hz = dx * e2y - dy * e2x;
  const det = e1x * hx + e1y * hy + e1z * hz;
  const scale = Math.hypot(dx, dy, dz) * Math.hypot(e1x, e1y, e1z) * Math.hypot(e2x, e2y, e2z);
  if (Math.abs(det) <= 1e-12 * scale) return false;
  const inv = 1 / det;
  const sx = ox - p[a]!,
    sy = oy - p[a + 1]!,
    sz = oz - p[a + 2]!;
  const uu = (sx * hx + sy * hy + sz * hz) * inv;
  if (uu <= TOUCH_FRACTION || uu >= 1 - TOUCH_FRACTION) return false;
  const qx = sy * e1z - sz * e1y,
    qy = sz * e1x - sx * e1z,
    qz = sx * e1y - sy * e1x;
  const vv = (dx * qx + dy * qy + dz * qz) * inv;
  if (vv <= TOUCH_FRACTION || uu + vv >= 1 - TOUCH_FRACTION) return false;
  const s = (e2x * qx + e2y * qy + e2z * qz) * inv;
  return s > TOUCH_FRACTION && s < 1 - TOUCH_FRACTION;
}
