/**
 * Fitting a glue tab onto a cut edge of a flat piece: a trapezoid outside the edge, as deep as the paper
 * wants, with its sides slanted just enough to clear the piece's other faces and tabs (convex polygons).
 * Flat coordinates, mm, y up; the face owning the edge lies to its left (counter-clockwise outline).
 */
import type { Vec2Mm } from './types';
import { pointsBounds, vec2Length, vec2Sub, vec2Unit } from './vec';

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
/** Each slant pair with the tangents the fit needs: the tab's sides, its probe's sides, and their sum. */
const TAPERS = TAPER_PAIRS_RAD.map((taper) => {
  const probe = taper.map((t) => t - Math.min(PROBE_WIDEN_RAD, (Math.PI / 2 - t) / 2));
  const tan = (t: number) => Math.tan(Math.max(0, t));
  return {
    tanSum: Math.tan(taper[0]) + Math.tan(taper[1]),
    tabTan: [tan(taper[0]), tan(taper[1])] as const,
    probeTan: [tan(probe[0]!), tan(probe[1]!)] as const,
  };
});
const BISECTION_STEPS = 16;

export interface FittedTab {
  polygonMm: Vec2Mm[];
  depthMm: number;
}

/**
 * The deepest tab up to depthWantedMm on edge a→b that overlaps none of the obstacles (convex, CCW), or a
 * zero-depth result with an empty polygon when nothing fits. A caller that drops tabs shallower than
 * depthMinMm says so, and slants that cannot reach it are not searched (the result is then below it too).
 */
export function tabFit(
  a: Vec2Mm,
  b: Vec2Mm,
  depthWantedMm: number,
  obstacles: readonly Vec2Mm[][],
  depthMinMm = 0,
): FittedTab {
  const edgeMm = vec2Length(vec2Sub(b, a));
  const edge = tabEdge(a, b);
  const near = obstacles
    .filter((o) => boundsNear(o, a, b, depthWantedMm))
    .map((polygon) => ({ flat: flatConvex(polygon), bounds: pointsBounds(polygon) }));
  const probe: TabProbe = {
    edge,
    tan: [0, 0],
    shape: { xy: [0, 0, 0, 0, 0, 0, 0, 0], lengths: [0, 0, 0, 0] },
    obstacles: [],
  };
  let best: FittedTab = { polygonMm: [], depthMm: 0 };
  for (const taper of TAPERS) {
    const depthCap = Math.min(depthWantedMm, (0.98 * edgeMm) / taper.tanSum);
    if (depthCap <= best.depthMm) continue;
    probe.tan = taper.probeTan;
    // Every probe up to depthCap lies in the trapezoid at depthCap (its sides are rays from a and b), so an
    // obstacle clear of that trapezoid's bounds can never meet one: test only the rest.
    tabProbeInto(edge, depthCap, probe.tan, probe.shape.xy, false);
    const reach = cornersBounds(probe.shape.xy);
    const pad = 1e-6 * Math.max(1, edgeMm, depthCap);
    probe.obstacles = near.filter((o) => !boundsApart(o.bounds, reach, pad)).map((o) => o.flat);
    // A probe grows with its depth, so a slant whose probe at the depth to beat is blocked cannot beat it.
    const floor = Math.max(best.depthMm, depthMinMm);
    if (depthCap < floor || (floor > 0 && !probeFits(probe, floor))) continue;
    let depth = depthCap;
    if (!probeFits(probe, depth)) {
      let lo = 0;
      let hi = depthCap;
      for (let i = 0; i < BISECTION_STEPS; i++) {
        const mid = (lo + hi) / 2;
        if (probeFits(probe, mid)) lo = mid;
        else hi = mid;
      }
      depth = lo;
    }
    if (depth > best.depthMm) best = { polygonMm: tabPolygon(edge, depth, taper.tabTan), depthMm: depth };
    if (best.depthMm >= depthWantedMm * 0.999) break;
  }
  return best;
}

/** The clearance probe of one slant pair on an edge, with the obstacles that may meet it. */
interface TabProbe {
  edge: TabEdge;
  tan: readonly [number, number];
  /** Scratch: the probe at the depth last tried. */
  shape: FlatConvex;
  obstacles: FlatConvex[];
}

/**
 * Whether the probe at depthMm is clear of every obstacle. The answer does not depend on their order, so the
 * one that blocked it is moved to the front, where the next (usually deeper or equal) try meets it first.
 */
function probeFits(probe: TabProbe, depthMm: number): boolean {
  tabProbeInto(probe.edge, depthMm, probe.tan, probe.shape.xy);
  flatLengthsSet(probe.shape);
  const obstacles = probe.obstacles;
  for (let i = 0; i < obstacles.length; i++) {
    if (!flatOverlap(probe.shape, obstacles[i]!)) continue;
    if (i > 0) obstacles.unshift(...obstacles.splice(i, 1));
    return false;
  }
  return true;
}

function cornersBounds(c: number[]): { minX: number; minY: number; maxX: number; maxY: number } {
  return {
    minX: Math.min(c[0]!, c[2]!, c[4]!, c[6]!),
    minY: Math.min(c[1]!, c[3]!, c[5]!, c[7]!),
    maxX: Math.max(c[0]!, c[2]!, c[4]!, c[6]!),
    maxY: Math.max(c[1]!, c[3]!, c[5]!, c[7]!),
  };
}

/** Edge a→b with its unit direction and outward normal (right of a→b). */
interface TabEdge {
  a: Vec2Mm;
  b: Vec2Mm;
  dir: Vec2Mm;
  out: Vec2Mm;
}

function tabEdge(a: Vec2Mm, b: Vec2Mm): TabEdge {
  const dir = vec2Unit(vec2Sub(b, a));
  return { a, b, dir, out: [dir[1], -dir[0]] };
}

/** The trapezoid [b, a, a', b'] outside edge a→b, its sides leaning in by the given tangents. */
function tabPolygon(e: TabEdge, depthMm: number, tan: readonly [number, number]): Vec2Mm[] {
  const p = [0, 0, 0, 0, 0, 0, 0, 0];
  tabProbeInto(e, depthMm, tan, p, false);
  return [
    [p[0]!, p[1]!],
    [p[2]!, p[3]!],
    [p[4]!, p[5]!],
    [p[6]!, p[7]!],
  ];
}

/**
 * Writes the trapezoid's corners (x, y pairs) into `into`; the probe form lifts its base corners off the edge
 * by a thousandth of the depth, so the face owning the edge never counts as touching it.
 */
function tabProbeInto(e: TabEdge, depthMm: number, tan: readonly [number, number], into: number[], probe = true): void {
  const { a, b, dir, out } = e;
  const a2x = a[0] + out[0] * depthMm + dir[0] * (depthMm * tan[0]),
    a2y = a[1] + out[1] * depthMm + dir[1] * (depthMm * tan[0]);
  const b2x = b[0] - dir[0] * (depthMm * tan[1]) + out[0] * depthMm,
    b2y = b[1] - dir[1] * (depthMm * tan[1]) + out[1] * depthMm;
  let a1x = a[0],
    a1y = a[1],
    b1x = b[0],
    b1y = b[1];
  if (probe) {
    const lift = 1e-3 * depthMm;
    const [ua0, ua1] = vec2Unit([a2x - a[0], a2y - a[1]]);
    const [ub0, ub1] = vec2Unit([b2x - b[0], b2y - b[1]]);
    a1x = a[0] + ua0 * lift;
    a1y = a[1] + ua1 * lift;
    b1x = b[0] + ub0 * lift;
    b1y = b[1] + ub1 * lift;
  }
  into[0] = b1x;
  into[1] = b1y;
  into[2] = a1x;
  into[3] = a1y;
  into[4] = a2x;
  into[5] = a2y;
  into[6] = b2x;
  into[7] = b2y;
}

function boundsApart(
  o: { minX: number; minY: number; maxX: number; maxY: number },
  r: { minX: number; minY: number; maxX: number; maxY: number },
  pad: number,
): boolean {
  return o.minX > r.maxX + pad || o.maxX < r.minX - pad || o.minY > r.maxY + pad || o.maxY < r.minY - pad;
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
  return flatOverlap(flatConvex(p), flatConvex(q));
}

/** A convex polygon as packed corners (x, y pairs) with the length of each edge i → i + 1, worked out once. */
interface FlatConvex {
  xy: number[];
  lengths: number[];
}

function flatConvex(poly: readonly Vec2Mm[]): FlatConvex {
  const xy: number[] = [];
  for (const v of poly) xy.push(v[0], v[1]);
  const out = { xy, lengths: poly.map(() => 0) };
  flatLengthsSet(out);
  return out;
}

function flatLengthsSet(c: FlatConvex): void {
  const { xy, lengths } = c;
  const n = lengths.length;
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    lengths[i] = Math.hypot(xy[j * 2]! - xy[i * 2]!, xy[j * 2 + 1]! - xy[i * 2 + 1]!);
  }
}

function flatOverlap(p: FlatConvex, q: FlatConvex): boolean {
  const n = p.lengths.length,
    m = q.lengths.length;
  for (let i = 0; i < n; i++) if (flatInside(p.xy[i * 2]!, p.xy[i * 2 + 1]!, q)) return true;
  for (let k = 0; k < m; k++) if (flatInside(q.xy[k * 2]!, q.xy[k * 2 + 1]!, p)) return true;
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    for (let k = 0; k < m; k++) {
      const l = (k + 1) % m;
      const [a, b] = [p.xy, q.xy];
      if (
        segmentsCrossXY(
          a[i * 2]!,
          a[i * 2 + 1]!,
          a[j * 2]!,
          a[j * 2 + 1]!,
          b[k * 2]!,
          b[k * 2 + 1]!,
          b[l * 2]!,
          b[l * 2 + 1]!,
        )
      )
        return true;
    }
  }
  return false;
}

/**
 * (x, y) lies left of every edge by more than a billionth of a millimetre (or of the edge, if longer); an
 * edge of no length passes.
 */
function flatInside(x: number, y: number, c: FlatConvex): boolean {
  const { xy, lengths } = c;
  const n = lengths.length;
  for (let i = 0; i < n; i++) {
    const len = lengths[i]!;
    if (len === 0) continue;
    const j = (i + 1) % n;
    const ax = xy[i * 2]!,
      ay = xy[i * 2 + 1]!;
    const ex = xy[j * 2]! - ax,
      ey = xy[j * 2 + 1]! - ay;
    if (!((ex * (y - ay) - ey * (x - ax)) / len > 1e-9 * Math.max(1, len))) return false;
  }
  return true;
}

function segmentsCrossXY(
  ax: number,
  ay: number,
  bx: number,
  by: number,
  cx: number,
  cy: number,
  dx: number,
  dy: number,
): boolean {
  const d1 = (bx - ax) * (cy - ay) - (by - ay) * (cx - ax);
  const d2 = (bx - ax) * (dy - ay) - (by - ay) * (dx - ax);
  const d3 = (dx - cx) * (ay - cy) - (dy - cy) * (ax - cx);
  const d4 = (dx - cx) * (by - cy) - (dy - cy) * (bx - cx);
  const eps = 1e-12;
  return ((d1 > eps && d2 < -eps) || (d1 < -eps && d2 > eps)) && ((d3 > eps && d4 < -eps) || (d3 < -eps && d4 > eps));
}
