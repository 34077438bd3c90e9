/**
 * The turn that gives a piece its smallest bounding box, so long thin or slanted pieces (cone sectors,
 * diagonal strips) pack tightly. The minimum-area enclosing rectangle of a polygon has one side collinear
 * with an edge of its convex hull (Freeman & Shapira, "Determining the minimum-area encasing rectangle for
 * an arbitrary closed curve", CACM 18(7), 1975), so trying every hull edge finds it.
 */
import type { Vec2Mm } from '../geometry/types';

/** Convex hull, counter-clockwise, by Andrew's monotone chain (Andrew 1979); fewer than 3 points are returned as is. */
export function pieceOrientationHull(points: readonly Vec2Mm[]): Vec2Mm[] {
  const sorted = [...points].sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  if (sorted.length < 3) return sorted;
  const cross = (o: Vec2Mm, a: Vec2Mm, b: Vec2Mm) => (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);
  const lower: Vec2Mm[] = [];
  for (const p of sorted) {
    while (lower.length >= 2 && cross(lower[lower.length - 2]!, lower[lower.length - 1]!, p) <= 0) lower.pop();
    lower.push(p);
  }
  const upper: Vec2Mm[] = [];
  for (let i = sorted.length - 1; i >= 0; i--) {
    const p = sorted[i]!;
    while (upper.length >= 2 && cross(upper[upper.length - 2]!, upper[upper.length - 1]!, p) <= 0) upper.pop();
    upper.push(p);
  }
  return lower.slice(0, -1).concat(upper.slice(0, -1));
}

/**
 * The sheet rotation (radians, clockwise on the sheet) that makes the placed piece's box smallest, with the
 * long side horizontal; a degenerate outline (under 3 hull points) gives 0.
 */
export function pieceOrientationRad(outlineMm: readonly Vec2Mm[]): number {
  const hull = pieceOrientationHull(outlineMm);
  if (hull.length < 3) return 0;
  let best = { area: Infinity, angle: 0 };
  for (let i = 0; i < hull.length; i++) {
    const a = hull[i]!;
    const b = hull[(i + 1) % hull.length]!;
    const edge = Math.atan2(b[1] - a[1], b[0] - a[0]);
    const c = Math.cos(-edge);
    const s = Math.sin(-edge);
    let minX = Infinity,
      maxX = -Infinity,
      minY = Infinity,
      maxY = -Infinity;
    for (const [x, y] of hull) {
      const rx = c * x - s * y;
      const ry = s * x + c * y;
      minX = Math.min(minX, rx);
      maxX = Math.max(maxX, rx);
      minY = Math.min(minY, ry);
      maxY = Math.max(maxY, ry);
    }
    const area = (maxX - minX) * (maxY - minY);
    // Prefer the axis-aligned pose when it is as good, so rectangles are not turned by a rounding error.
    if (area < best.area * (1 - 1e-9)) {
      const angle = maxX - minX >= maxY - minY ? edge : edge - Math.PI / 2;
      best = { area, angle };
    }
  }
  // Flat coordinates are y up and the sheet is y down: turning the flat edge onto +x is a sheet angle of +edge.
  const turned = normaliseAngle(best.angle);
  return Math.abs(turned) < 1e-9 ? 0 : turned;
}

function normaliseAngle(angleRad: number): number {
  let a = angleRad % (2 * Math.PI);
  if (a > Math.PI) a -= 2 * Math.PI;
  if (a <= -Math.PI) a += 2 * Math.PI;
  return a;
}
