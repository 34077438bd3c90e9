/**
 * The free space of a sheet as maximal rectangles, after taking out the rectangles the sheet furniture
 * occupies: the MaxRects split of Jylänki, "A Thousand Ways to Pack the Bin" (2010), §4.
 */
import type { RectMm } from './types';

/** Maximal free rectangles of `area` minus `obstacles` (all mm); obstacles outside the area are ignored. */
export function freeSpaceRects(area: RectMm, obstacles: readonly RectMm[]): RectMm[] {
  let free: RectMm[] = [area];
  for (const obstacle of obstacles) {
    const next: RectMm[] = [];
    for (const rect of free) next.push(...freeSpaceSplit(rect, obstacle));
    free = freeSpacePrune(next);
  }
  return free;
}

/** The up to four maximal pieces of `rect` outside `cut`; `rect` itself when they do not overlap. */
export function freeSpaceSplit(rect: RectMm, cut: RectMm): RectMm[] {
  const rx2 = rect.xMm + rect.widthMm;
  const ry2 = rect.yMm + rect.heightMm;
  const cx2 = cut.xMm + cut.widthMm;
  const cy2 = cut.yMm + cut.heightMm;
  if (cut.xMm >= rx2 || cx2 <= rect.xMm || cut.yMm >= ry2 || cy2 <= rect.yMm) return [rect];
  const out: RectMm[] = [];
  if (cut.xMm > rect.xMm) out.push({ ...rect, widthMm: cut.xMm - rect.xMm });
  if (cx2 < rx2) out.push({ ...rect, xMm: cx2, widthMm: rx2 - cx2 });
  if (cut.yMm > rect.yMm) out.push({ ...rect, heightMm: cut.yMm - rect.yMm });
  if (cy2 < ry2) out.push({ ...rect, yMm: cy2, heightMm: ry2 - cy2 });
  return out;
}

function freeSpacePrune(rects: RectMm[]): RectMm[] {
  return rects.filter(
    (a, i) =>
      !rects.some(
        (b, j) =>
          j !== i &&
          b.xMm <= a.xMm &&
          b.yMm <= a.yMm &&
          b.xMm + b.widthMm >= a.xMm + a.widthMm &&
          b.yMm + b.heightMm >= a.yMm + a.heightMm &&
          // Of two equal rectangles keep the first.
          (j < i || b.widthMm * b.heightMm > a.widthMm * a.heightMm),
      ),
  );
}
