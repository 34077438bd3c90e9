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

/**
 * The sheet rotation (radians, clockwise) for a piece that must be tiled through `window` (mm) with
 * overlapMm between tiles: among 0, 90° and every hull-edge pose, the one needing fewest tiles, then the
 * smallest box; within 1 % of that box an axis-aligned pose (the piece's own x along a sheet edge, so a
 * strip drawn along x is tiled along its length) wins, long side across the sheet first. A degenerate
 * outline gives 0.
 */
export function pieceOrientationForTilesRad(
  outlineMm: readonly Vec2Mm[],
  window: { widthMm: number; heightMm: number },
  overlapMm: number,
): number {
  const hull = pieceOrientationHull(outlineMm);
  if (hull.length < 3) return 0;
  const candidates = [0, Math.PI / 2];
  for (let i = 0; i < hull.length; i++) {
    const a = hull[i]!;
    const b = hull[(i + 1) % hull.length]!;
    const edge = Math.atan2(b[1] - a[1], b[0] - a[0]);
    candidates.push(edge, edge - Math.PI / 2);
  }
  const stepX = window.widthMm - overlapMm;
  const stepY = window.heightMm - overlapMm;
  if (stepX <= 0 || stepY <= 0) return 0;
  let best = { tiles: Infinity, aligned: false, across: false, area: Infinity, angle: 0 };
  for (const raw of candidates) {
    const angle = normaliseAngle(raw);
    const { widthMm, heightMm } = pieceOrientationBox(hull, angle);
    const tiles =
      Math.max(1, Math.ceil((widthMm - overlapMm) / stepX)) * Math.max(1, Math.ceil((heightMm - overlapMm) / stepY));
    const quarter = Math.abs(angle / (Math.PI / 2) - Math.round(angle / (Math.PI / 2)));
    const aligned = quarter < 1e-9;
    const area = widthMm * heightMm;
    // Of poses as good within 1 % of box area, an aligned one, then one lying long side across the sheet:
    // its tiles are short, so they share sheets with other pieces.
    const across = widthMm >= heightMm;
    const close = tiles === best.tiles && Math.abs(area - best.area) <= 0.01 * best.area;
    const better =
      tiles < best.tiles ||
      (tiles === best.tiles && area < 0.99 * best.area) ||
      (close && aligned && !best.aligned) ||
      (close && aligned === best.aligned && across && !best.across);
    if (better)
      best = {
        tiles,
        aligned,
        across,
        area,
        angle: aligned ? Math.round(angle / (Math.PI / 2)) * (Math.PI / 2) : angle,
      };
  }
  return normaliseAngle(best.angle) === 0 ? 0 : normaliseAngle(best.angle);
}

/** The box of hull points turned by the sheet rotation angleRad (flat y up, sheet y down), mm. */
function pieceOrientationBox(hull: readonly Vec2Mm[], angleRad: number): { widthMm: number; heightMm: number } {
  const c = Math.cos(angleRad);
  const s = Math.sin(angleRad);
  let minX = Infinity,
    maxX = -Infinity,
    minY = Infinity,
    maxY = -Infinity;
  for (const [x, y] of hull) {
    // The placement rule of placement.ts without translation: q = (x, −y), then rotate by angleRad.
    const rx = c * x + s * y;
    const ry = s * x - c * y;
    minX = Math.min(minX, rx);
    maxX = Math.max(maxX, rx);
    minY = Math.min(minY, ry);
    maxY = Math.max(maxY, ry);
  }
  return { widthMm: maxX - minX, heightMm: maxY - minY };
}
