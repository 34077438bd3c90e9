/**
 * Splitting a simple polygon (3D, roughly planar) into triangles by ear clipping: projected onto the
 * coordinate plane its Newell normal faces most, a corner whose triangle is convex and holds no other corner
 * is cut off, until three remain (the two-ears theorem: every simple polygon with more than three corners
 * has two such ears; Meisters, "Polygons have ears", Amer. Math. Monthly 82, 1975). O(n²) per polygon, for
 * file faces of a few corners. A polygon with no ear left (self-crossing) is finished as a fan.
 */
type Point3 = readonly [number, number, number];

/** Triangles as corner indices into `points`, three per triangle, each wound like the polygon. */
export function polygonTriangulate(points: readonly Point3[]): number[] {
  const n = points.length;
  if (n < 3) return [];
  const normal = [0, 0, 0];
  for (let i = 0; i < n; i++) {
    const a = points[i]!,
      b = points[(i + 1) % n]!;
    normal[0]! += (a[1] - b[1]) * (a[2] + b[2]);
    normal[1]! += (a[2] - b[2]) * (a[0] + b[0]);
    normal[2]! += (a[0] - b[0]) * (a[1] + b[1]);
  }
  const ax = normal.map(Math.abs);
  const drop = ax[0]! >= ax[1]! && ax[0]! >= ax[2]! ? 0 : ax[1]! >= ax[2]! ? 1 : 2;
  const [u, v] = drop === 0 ? [1, 2] : drop === 1 ? [2, 0] : [0, 1];
  const sign = normal[drop]! >= 0 ? 1 : -1;
  const flat = points.map((p) => [p[u]!, p[v]! * sign] as const);
  const cross = (o: number, a: number, b: number) => {
    const [ox, oy] = flat[o]!,
      [axx, ay] = flat[a]!,
      [bx, by] = flat[b]!;
    return (axx - ox) * (by - oy) - (ay - oy) * (bx - ox);
  };
  const inside = (p: number, a: number, b: number, c: number) =>
    cross(a, b, p) >= 0 && cross(b, c, p) >= 0 && cross(c, a, p) >= 0;
  const ring = Array.from({ length: n }, (_, i) => i);
  const out: number[] = [];
  while (ring.length > 3) {
    let cut = -1;
    for (let k = 0; k < ring.length && cut < 0; k++) {
      const a = ring[(k + ring.length - 1) % ring.length]!,
        b = ring[k]!,
        c = ring[(k + 1) % ring.length]!;
      if (cross(a, b, c) <= 0) continue;
      if (ring.some((p) => p !== a && p !== b && p !== c && inside(p, a, b, c))) continue;
      cut = k;
    }
    if (cut < 0) break;
    const len = ring.length;
    out.push(ring[(cut + len - 1) % len]!, ring[cut]!, ring[(cut + 1) % len]!);
    ring.splice(cut, 1);
  }
  for (let k = 1; k + 1 < ring.length; k++) out.push(ring[0]!, ring[k]!, ring[k + 1]!);
  return out;
}
