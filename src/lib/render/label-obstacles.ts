/**
 * What a printed label must stay clear of on a sheet: drawn lines (cut, folds, guides, registration marks)
 * as segments and furniture (QR code, check square, legend) as convex polygons, in sheet mm (y down),
 * bucketed in a uniform grid so a label's box is tested only against what lies near it.
 */
import type { SheetVec2Mm } from '../layout/types';
import { labelBoxesOverlap } from './label-placement';

/** Side of a grid cell, mm: about a label's length, so a query touches a few cells. */
const CELL_MM = 8;

/** Clear paper kept between a label's box and a drawn line's centre, mm: half a line's width and a hair more. */
export const LABEL_LINE_CLEARANCE_MM = 0.35;

interface Obstacle {
  points: readonly SheetVec2Mm[];
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
  seen: number;
}

/** A set of segments and convex polygons that label boxes are tested against. */
export class LabelObstacles {
  private readonly cells = new Map<number, Obstacle[]>();
  private query = 0;
  /** padMm: clear paper a box must keep from every obstacle (0: boxes may touch it). */
  constructor(private readonly padMm: number) {}

  /** Adds every segment of a polyline (closed: the last point joins the first). */
  addPolyline(points: readonly SheetVec2Mm[], closed = false) {
    for (let i = 0; i + 1 < points.length; i++) this.add([points[i]!, points[i + 1]!]);
    if (closed && points.length > 2) this.add([points[points.length - 1]!, points[0]!]);
  }

  /** Adds a convex polygon (or a single segment) as one obstacle. */
  add(points: readonly SheetVec2Mm[]) {
    const o: Obstacle = { points, minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity, seen: 0 };
    for (const [x, y] of points) {
      o.minX = Math.min(o.minX, x);
      o.minY = Math.min(o.minY, y);
      o.maxX = Math.max(o.maxX, x);
      o.maxY = Math.max(o.maxY, y);
    }
    const [i0, i1, j0, j1] = [cell(o.minX), cell(o.maxX), cell(o.minY), cell(o.maxY)];
    for (let i = i0; i <= i1; i++)
      for (let j = j0; j <= j1; j++) {
        const list = this.cells.get(cellKey(i, j));
        if (list) list.push(o);
        else this.cells.set(cellKey(i, j), [o]);
      }
  }

  /** Whether a convex box (corners) comes within the clearance of any obstacle. */
  hits(box: readonly SheetVec2Mm[]): boolean {
    const pad = this.padMm;
    let [x0, y0, x1, y1] = [Infinity, Infinity, -Infinity, -Infinity];
    for (const [x, y] of box) [x0, y0, x1, y1] = [Math.min(x0, x), Math.min(y0, y), Math.max(x1, x), Math.max(y1, y)];
    const grown = pad > 0 ? labelBoxGrown(box, pad) : box;
    const stamp = ++this.query;
    const [i0, i1, j0, j1] = [cell(x0 - pad), cell(x1 + pad), cell(y0 - pad), cell(y1 + pad)];
    for (let i = i0; i <= i1; i++)
      for (let j = j0; j <= j1; j++) {
        const list = this.cells.get(cellKey(i, j));
        if (!list) continue;
        for (const o of list) {
          if (o.seen === stamp) continue;
          o.seen = stamp;
          if (o.maxX < x0 - pad || o.minX > x1 + pad || o.maxY < y0 - pad || o.minY > y1 + pad) continue;
          if (labelBoxesOverlap(grown, o.points)) return true;
        }
      }
    return false;
  }
}

/** The grid column or row of a coordinate, mm. */
function cell(v: number): number {
  return Math.floor(v / CELL_MM);
}

/** The key of grid cell (i, j) in the cell map. */
function cellKey(i: number, j: number): number {
  return i * 100_003 + j;
}

/** A box (corners p0…p3, p0→p1 along the baseline) grown by padMm on every side. */
export function labelBoxGrown(box: readonly SheetVec2Mm[], padMm: number): SheetVec2Mm[] {
  const [p0, p1, p2, p3] = box as [SheetVec2Mm, SheetVec2Mm, SheetVec2Mm, SheetVec2Mm];
  const u = paddedUnit(p0, p1, padMm);
  const v = paddedUnit(p0, p3, padMm);
  return [
    [p0[0] - u[0] - v[0], p0[1] - u[1] - v[1]],
    [p1[0] + u[0] - v[0], p1[1] + u[1] - v[1]],
    [p2[0] + u[0] + v[0], p2[1] + u[1] + v[1]],
    [p3[0] - u[0] + v[0], p3[1] - u[1] + v[1]],
  ];
}

/** The direction from a to b, padMm long ([0, 0] when they coincide). */
function paddedUnit(a: SheetVec2Mm, b: SheetVec2Mm, padMm: number): SheetVec2Mm {
  const l = Math.hypot(b[0] - a[0], b[1] - a[1]) || 1;
  return [((b[0] - a[0]) / l) * padMm, ((b[1] - a[1]) / l) * padMm];
}

/** The point of a convex box's boundary nearest to p (p itself when inside is not expected: p is outside). */
export function labelBoxNearestPoint(box: readonly SheetVec2Mm[], p: SheetVec2Mm): SheetVec2Mm {
  let best: SheetVec2Mm = box[0]!;
  let bestD = Infinity;
  for (let i = 0; i < box.length; i++) {
    const a = box[i]!;
    const b = box[(i + 1) % box.length]!;
    const [dx, dy] = [b[0] - a[0], b[1] - a[1]];
    const t = Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / (dx * dx + dy * dy || 1)));
    const q: SheetVec2Mm = [a[0] + t * dx, a[1] + t * dy];
    const d = Math.hypot(p[0] - q[0], p[1] - q[1]);
    if (d < bestD) [best, bestD] = [q, d];
  }
  return best;
}
