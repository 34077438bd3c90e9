/**
 * Fitting a glue tab onto a cut edge of a flat piece: a trapezoid outside the edge, as deep as the paper
 * wants, with its sides slanted just enough to clear the piece's other faces and tabs (convex polygons).
 * Flat coordinates, mm, y up; the face owning the edge lies to its left (counter-clockwise outline).
 */
import type { Vec2Mm } from './types';
import { pointsBounds, vec2Add, vec2Cross, vec2Length, vec2Scale, vec2Sub, vec2Unit } from './vec';

/**
 * Side slants tried at the (a, b) ends, degrees from the edge's perpendicular: gentle first, then one end
 * steep where a neighbouring face leaves only a narrow wedge (a cap beside its hinge wall), then both.
 */
const STEEP_DEG = [60, 76, 82, 86, 88, 89.5];
const TAPER_PAIRS_RAD = [
  [30, 30],
  [45, 45],
  ...STEEP_DEG.flatMap((d) => [
    [30, d],
    [d, 30],
  ]),
  ...STEEP_DEG.map((d) => [d, d]),
].map(([a, b]) => [(a! * Math.PI) / 180, (b! * Math.PI) / 180] as const);
/** The clearance probe's sides lean out by this much more (radians, at most half the side's own angle). */
const PROBE_WIDEN_RAD = (3 * Math.PI) / 180;
const BISECTION_STEPS = 16;

export interface FittedTab {
  polygonMm: Vec2Mm[];
  depthMm: number;
}

/**
 * The deepest tab up to depthWantedMm on edge a→b that overlaps none of the obstacles (convex, CCW), or a
 * zero-depth result with an empty polygon when nothing fits.
 */
export function tabFit(a: Vec2Mm, b: Vec2Mm, depthWantedMm: number, obstacles: readonly Vec2Mm[][]): FittedTab {
  const edgeMm = vec2Length(vec2Sub(b, a));
  const near = obstacles.filter((o) => boundsNear(o, a, b, depthWantedMm));
  let best: FittedTab = { polygonMm: [], depthMm: 0 };
  for (const taper of TAPER_PAIRS_RAD) {
    const depthCap = Math.min(depthWantedMm, (0.98 * edgeMm) / (Math.tan(taper[0]) + Math.tan(taper[1])));
    if (depthCap <= best.depthMm) continue;
    const probe = taper.map((t) => t - Math.min(PROBE_WIDEN_RAD, (Math.PI / 2 - t) / 2)) as unknown as readonly [
      number,
      number,
    ];
    const fits = (d: number) => !near.some((o) => convexOverlap(tabPolygon(a, b, d, probe, true), o));
    let depth = depthCap;
    if (!fits(depth)) {
      let lo = 0;
      let hi = depthCap;
      for (let i = 0; i < BISECTION_STEPS; i++) {
        const mid = (lo + hi) / 2;
        if (fits(mid)) lo = mid;
        else hi = mid;
      }
      depth = lo;
    }
    if (depth > best.depthMm) best = { polygonMm: tabPolygon(a, b, depth, taper, false), depthMm: depth };
    if (best.depthMm >= depthWantedMm * 0.999) break;
  }
  return best;
}

/** The trapezoid [b, a, a', b'] outside edge a→b; the probe form lifts its base corners off the edge. */
function tabPolygon(
  a: Vec2Mm,
  b: Vec2Mm,
  depthMm: number,
  taperRad: readonly [number, number],
  probe: boolean,
): Vec2Mm[] {
  const dir = vec2Unit(vec2Sub(b, a));
  const out: Vec2Mm = [dir[1], -dir[0]];
  const a2 = vec2Add(vec2Add(a, vec2Scale(out, depthMm)), vec2Scale(dir, depthMm * Math.tan(Math.max(0, taperRad[0]))));
  const b2 = vec2Add(vec2Sub(b, vec2Scale(dir, depthMm * Math.tan(Math.max(0, taperRad[1])))), vec2Scale(out, depthMm));
  if (!probe) return [b, a, a2, b2];
  const lift = 1e-3 * depthMm;
  const a1 = vec2Add(a, vec2Scale(vec2Unit(vec2Sub(a2, a)), lift));
  const b1 = vec2Add(b, vec2Scale(vec2Unit(vec2Sub(b2, b)), lift));
  return [b1, a1, a2, b2];
}

function boundsNear(poly: readonly Vec2Mm[], a: Vec2Mm, b: Vec2Mm, reachMm: number): boolean {
  const o = pointsBounds(poly);
  const e = pointsBounds([a, b]);
  return !(
    o.minX > e.maxX + reachMm ||
    o.maxX < e.minX - reachMm ||
    o.minY > e.maxY + reachMm ||
    o.maxY < e.minY - reachMm
  );
}

/** Whether two convex CCW polygons share interior points: a vertex inside the other, or crossing edges. */
export function convexOverlap(p: readonly Vec2Mm[], q: readonly Vec2Mm[]): boolean {
  if (p.some((v) => insideConvex(v, q)) || q.some((v) => insideConvex(v, p))) return true;
  for (let i = 0; i < p.length; i++) {
    const p1 = p[i]!,
      p2 = p[(i + 1) % p.length]!;
    for (let j = 0; j < q.length; j++) {
      if (segmentsCross(p1, p2, q[j]!, q[(j + 1) % q.length]!)) return true;
    }
  }
  return false;
}

function insideConvex(v: Vec2Mm, poly: readonly Vec2Mm[]): boolean {
  const eps = 1e-9;
  for (let i = 0; i < poly.length; i++) {
    const a = poly[i]!,
      b = poly[(i + 1) % poly.length]!;
    const len = vec2Length(vec2Sub(b, a));
    if (len === 0) continue;
    if (vec2Cross(vec2Sub(b, a), vec2Sub(v, a)) / len <= eps * Math.max(1, len)) return false;
  }
  return true;
}

function segmentsCross(a: Vec2Mm, b: Vec2Mm, c: Vec2Mm, d: Vec2Mm): boolean {
  const d1 = vec2Cross(vec2Sub(b, a), vec2Sub(c, a));
  const d2 = vec2Cross(vec2Sub(b, a), vec2Sub(d, a));
  const d3 = vec2Cross(vec2Sub(d, c), vec2Sub(a, c));
  const d4 = vec2Cross(vec2Sub(d, c), vec2Sub(b, c));
  const eps = 1e-12;
  return ((d1 > eps && d2 < -eps) || (d1 < -eps && d2 > eps)) && ((d3 > eps && d4 < -eps) || (d3 < -eps && d4 > eps));
}
