import { describe, expect, test } from 'vitest';
import polygonClipping from 'polygon-clipping';
import { tabFit } from '../../../src/lib/geometry/tab-fit';
import type { Vec2Mm } from '../../../src/lib/geometry/types';
import { multiPolygonArea } from './multi-polygon-area';

// Edge a→b along the x axis, so its outside (right of a→b, where tabs go) is y < 0.
const A: Vec2Mm = [0, 0];
const B: Vec2Mm = [40, 0];

/** Area shared by two polygons, by polygon-clipping (npm registry), independent of tab-fit's own tests. */
function sharedAreaMm2(p: Vec2Mm[], q: Vec2Mm[]): number {
  const ring = (r: Vec2Mm[]) => [r.map(([x, y]): [number, number] => [x, y])];
  return multiPolygonArea(polygonClipping.intersection(ring(p), ring(q)));
}

/** A counter-clockwise slab wider than the edge, parallel to it, `gapMm` outside it: no tab passes it. */
const slab = (gapMm: number): Vec2Mm[] => [
  [-20, -gapMm - 10],
  [60, -gapMm - 10],
  [60, -gapMm],
  [-20, -gapMm],
];

describe('tabFit', () => {
  test('gives the full depth and 30° sides on a clear edge', () => {
    const fit = tabFit(A, B, 8, []);
    expect(fit.depthMm).toBe(8);
    // A trapezoid of depth d on an edge of length L with both sides slanted 30° in from the perpendicular
    // has area d·L − d²·tan 30° (elementary geometry: the rectangle less two right triangles).
    expect(sharedAreaMm2(fit.polygonMm, fit.polygonMm)).toBeCloseTo(8 * 40 - 64 * Math.tan(Math.PI / 6), 6);
  });

  test('stops just short of a slab in front of the edge and never overlaps it', () => {
    const fit = tabFit(A, B, 8, [slab(5)]);
    // Sixteen halvings of the 8 mm search leave the tab at most 8 / 2^16 mm short of the slab.
    expect(fit.depthMm).toBeLessThanOrEqual(5);
    expect(fit.depthMm).toBeGreaterThan(5 - 8 / 2 ** 16);
    expect(sharedAreaMm2(fit.polygonMm, slab(5))).toBeLessThan(1e-9);
  });

  test('gives the same tab with a reachable minimum depth', () => {
    expect(tabFit(A, B, 8, [slab(5)], 4)).toEqual(tabFit(A, B, 8, [slab(5)]));
  });

  test('answers below the minimum depth when no tab reaches it', () => {
    const fit = tabFit(A, B, 8, [slab(3)], 4);
    expect(tabFit(A, B, 8, [slab(3)]).depthMm).toBeLessThan(4);
    expect(fit.depthMm).toBeLessThan(4);
    if (fit.polygonMm.length > 0) expect(sharedAreaMm2(fit.polygonMm, slab(3))).toBeLessThan(1e-9);
  });
});
