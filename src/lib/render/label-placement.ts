/**
 * Placing printed labels so they neither spill out of their piece nor cover one another: text boxes as
 * oriented rectangles in sheet mm (y down), an overlap test by the separating-axis theorem (Gottschalk et al.,
 * "OBBTree", SIGGRAPH 1996, §4 for the 2-D case of rectangles), and the points of a face farthest from its
 * edges (its pole of inaccessibility, found by a coarse grid refined twice, after Agafonkin's polylabel, 2016).
 */
import type { PlanePointMm, PlaneSpace } from '../geometry/types';
import type { SheetVec2Mm } from '../layout/types';

/** Width of a text in mm at a size (em height) mm, bold or not. */
export type LabelMeasure = (text: string, sizeMm: number, bold: boolean) => number;

/** Height of a text box as a fraction of the font size (ascender to descender), from memory: about 1.1 em. */
export const LABEL_BOX_HEIGHT_EM = 1.1;

/**
 * The four corners of a text box: `atMm` is the middle of its left end (anchor start) or its centre (anchor
 * middle), the baseline turned clockwise by angleRad on the sheet.
 */
export function labelBox(
  atMm: SheetVec2Mm,
  angleRad: number,
  widthMm: number,
  heightMm: number,
  anchor: 'start' | 'middle',
): SheetVec2Mm[] {
  const c = Math.cos(angleRad);
  const s = Math.sin(angleRad);
  const [x0, x1] = anchor === 'middle' ? [-widthMm / 2, widthMm / 2] : [0, widthMm];
  const h = heightMm / 2;
  return (
    [
      [x0, -h],
      [x1, -h],
      [x1, h],
      [x0, h],
    ] as const
  ).map(([x, y]) => [atMm[0] + c * x - s * y, atMm[1] + s * x + c * y]);
}

/**
 * Whether two convex polygons (corner lists) overlap by more than `slackMm` along every axis (separating
 * axis theorem; the x and y axes are tried first, as a cheap bounding-box rejection). Both in one plane.
 */
export function labelBoxesOverlap<S extends PlaneSpace>(
  a: readonly PlanePointMm<S>[],
  b: readonly PlanePointMm<NoInfer<S>>[],
  slackMm = 0,
): boolean {
  if (separatedAlong(a, b, 1, 0, slackMm) || separatedAlong(a, b, 0, 1, slackMm)) return false;
  for (const poly of [a, b]) {
    for (let i = 0; i < poly.length; i++) {
      const p = poly[i]!;
      const q = poly[(i + 1) % poly.length]!;
      const len = Math.hypot(q[0] - p[0], q[1] - p[1]);
      if (len === 0) continue;
      if (separatedAlong(a, b, -(q[1] - p[1]) / len, (q[0] - p[0]) / len, slackMm)) return false;
    }
  }
  return true;
}

/** True when the projections of a and b on the axis (nx, ny) overlap by no more than slackMm. */
function separatedAlong(
  a: readonly (readonly [number, number])[],
  b: readonly (readonly [number, number])[],
  nx: number,
  ny: number,
  slackMm: number,
): boolean {
  let [aMin, aMax, bMin, bMax] = [Infinity, -Infinity, Infinity, -Infinity];
  for (const v of a) {
    const d = v[0] * nx + v[1] * ny;
    if (d < aMin) aMin = d;
    if (d > aMax) aMax = d;
  }
  for (const v of b) {
    const d = v[0] * nx + v[1] * ny;
    if (d < bMin) bMin = d;
    if (d > bMax) bMax = d;
  }
  return aMax <= bMin + slackMm || bMax <= aMin + slackMm;
}

/** Whether point p lies inside a simple polygon of the same plane (even-odd rule). */
export function labelPointInside<S extends PlaneSpace>(
  p: PlanePointMm<S>,
  poly: readonly PlanePointMm<NoInfer<S>>[],
): boolean {
  let inside = false;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const a = poly[i]!;
    const b = poly[j]!;
    if (a[1] > p[1] !== b[1] > p[1] && p[0] < ((b[0] - a[0]) * (p[1] - a[1])) / (b[1] - a[1]) + a[0]) inside = !inside;
  }
  return inside;
}

/** Distance from p to the nearest edge of a polygon of the same plane, mm. */
export function labelEdgeClearanceMm<S extends PlaneSpace>(
  p: PlanePointMm<S>,
  poly: readonly PlanePointMm<NoInfer<S>>[],
): number {
  let best = Infinity;
  // Math.hypot is slow: an edge whose squared distance is clearly past the best so far cannot win, so only the
  // others are measured (by Math.hypot, so the result is the same to the last bit).
  let beyond = Infinity;
  for (let i = 0; i < poly.length; i++) {
    const a = poly[i]!;
    const b = poly[(i + 1) % poly.length]!;
    const dx = b[0] - a[0];
    const dy = b[1] - a[1];
    const t = Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / (dx * dx + dy * dy || 1)));
    const ex = p[0] - a[0] - t * dx;
    const ey = p[1] - a[1] - t * dy;
    if (ex * ex + ey * ey > beyond) continue;
    const d = Math.hypot(ex, ey);
    if (d < best) {
      best = d;
      beyond = best * best * (1 + 1e-9);
    }
  }
  return best;
}

/**
 * Points inside a polygon, best first: the pole of inaccessibility, then the other grid points by their
 * clearance from the edges (at most `count`); an empty or degenerate polygon gives [].
 */
export function labelCandidatePoints<S extends PlaneSpace>(
  poly: readonly PlanePointMm<S>[],
  count = 24,
): PlanePointMm<S>[] {
  if (poly.length < 3) return [];
  let [minX, minY, maxX, maxY] = [Infinity, Infinity, -Infinity, -Infinity];
  for (const [x, y] of poly)
    [minX, minY, maxX, maxY] = [Math.min(minX, x), Math.min(minY, y), Math.max(maxX, x), Math.max(maxY, y)];
  const scored: { p: PlanePointMm<S>; d: number }[] = [];
  const grid = (x0: number, y0: number, w: number, h: number, steps: number) => {
    for (let i = 0; i <= steps; i++) {
      for (let j = 0; j <= steps; j++) {
        const p: PlanePointMm<S> = [x0 + (w * i) / steps, y0 + (h * j) / steps];
        if (labelPointInside(p, poly)) scored.push({ p, d: labelEdgeClearanceMm(p, poly) });
      }
    }
  };
  grid(minX, minY, maxX - minX, maxY - minY, 10);
  // Two refinements round the best point so far find the pole to about 1 % of the box.
  for (let k = 0; k < 2 && scored.length > 0; k++) {
    const best = scored.reduce((a, b) => (b.d > a.d ? b : a));
    const w = (maxX - minX) / (5 * (k + 1));
    const h = (maxY - minY) / (5 * (k + 1));
    grid(best.p[0] - w / 2, best.p[1] - h / 2, w, h, 8);
  }
  return scored
    .sort((a, b) => b.d - a.d)
    .slice(0, count)
    .map((s) => s.p);
}
