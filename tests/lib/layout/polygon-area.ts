/** Area helpers over polygon-clipping's MultiPolygon, for the overlap and coverage checks of the layout tests. */
import type { MultiPolygon, Ring } from 'polygon-clipping';

/** Shoelace area of a ring (absolute value). */
export function ringArea(ring: Ring): number {
  let a = 0;
  for (let i = 0; i < ring.length; i++) {
    const [x1, y1] = ring[i]!;
    const [x2, y2] = ring[(i + 1) % ring.length]!;
    a += x1 * y2 - x2 * y1;
  }
  return Math.abs(a) / 2;
}

/** Area of a multipolygon: outer rings minus holes. */
export function multiPolygonArea(mp: MultiPolygon): number {
  return mp.reduce(
    (sum, poly) => sum + poly.reduce((s, ring, i) => s + (i === 0 ? ringArea(ring) : -ringArea(ring)), 0),
    0,
  );
}
