/**
 * Lines and outlines down to a tile's window. Fold lines: Liang–Barsky parametric clipping (Liang & Barsky,
 * "A new concept and method for line clipping", ACM TOG 3(1), 1984), keeping only the parts inside the window.
 * Cut outlines: the piece's area intersected with the window by polygon-clipping, so each tile's cut contour
 * is closed (it runs along the window edge where the tile ends) and a cutting machine frees the tile.
 */
import polygonClipping from 'polygon-clipping';
import type { RectMm, SheetVec2Mm } from '../layout/types';

/** The part of segment a→b inside the rectangle, or null when none of it is. */
export function segmentClipToRect(a: SheetVec2Mm, b: SheetVec2Mm, rect: RectMm): [SheetVec2Mm, SheetVec2Mm] | null {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  let t0 = 0;
  let t1 = 1;
  const edges: [number, number][] = [
    [-dx, a[0] - rect.xMm],
    [dx, rect.xMm + rect.widthMm - a[0]],
    [-dy, a[1] - rect.yMm],
    [dy, rect.yMm + rect.heightMm - a[1]],
  ];
  for (const [p, q] of edges) {
    if (p === 0) {
      if (q < 0) return null;
      continue;
    }
    const t = q / p;
    if (p < 0) t0 = Math.max(t0, t);
    else t1 = Math.min(t1, t);
    if (t0 > t1) return null;
  }
  return [
    [a[0] + t0 * dx, a[1] + t0 * dy],
    [a[0] + t1 * dx, a[1] + t1 * dy],
  ];
}

/**
 * A polyline (closed when `closed`) clipped to the rectangle, as the open polylines that stay inside;
 * a rectangle of undefined (no window) returns the polyline itself.
 */
export function segmentClipPolyline(points: readonly SheetVec2Mm[], closed: boolean, rect?: RectMm): SheetVec2Mm[][] {
  if (!rect) return [closed && points.length > 0 ? [...points, points[0]!] : [...points]];
  const out: SheetVec2Mm[][] = [];
  let current: SheetVec2Mm[] = [];
  const count = closed ? points.length : points.length - 1;
  for (let i = 0; i < count; i++) {
    const clipped = segmentClipToRect(points[i]!, points[(i + 1) % points.length]!, rect);
    if (!clipped) continue;
    const last = current[current.length - 1];
    if (last && Math.abs(last[0] - clipped[0][0]) < 1e-9 && Math.abs(last[1] - clipped[0][1]) < 1e-9)
      current.push(clipped[1]);
    else {
      if (current.length > 1) out.push(current);
      current = [clipped[0], clipped[1]];
    }
  }
  if (current.length > 1) out.push(current);
  return out;
}

/**
 * The closed outlines of a closed polygon's area inside the rectangle (several when the window cuts a
 * concave piece in parts), each repeating its first point at the end; no window returns the outline itself.
 */
export function segmentClipOutline(points: readonly SheetVec2Mm[], rect?: RectMm): SheetVec2Mm[][] {
  if (!rect) return segmentClipPolyline(points, true);
  if (points.length < 3) return [];
  const { xMm: x, yMm: y, widthMm: w, heightMm: h } = rect;
  const window: [number, number][] = [
    [x, y],
    [x + w, y],
    [x + w, y + h],
    [x, y + h],
  ];
  const area = polygonClipping.intersection([points.map((p): [number, number] => [p[0], p[1]])], [window]);
  // Outer rings and holes alike are cut lines; polygon-clipping closes each ring by repeating its first point.
  return area.flatMap((polygon) => polygon.map((ring) => ring.map((p): SheetVec2Mm => [p[0], p[1]])));
}
