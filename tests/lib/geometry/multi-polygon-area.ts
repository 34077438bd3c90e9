import type { MultiPolygon } from 'polygon-clipping';

/** Area of a polygon-clipping result, mm²: outer rings count, holes are taken away (shoelace formula). */
export function multiPolygonArea(mp: MultiPolygon): number {
  let area = 0;
  for (const poly of mp)
    poly.forEach((r, k) => {
      let s = 0;
      for (let i = 0; i < r.length; i++)
        s += r[i]![0] * r[(i + 1) % r.length]![1] - r[(i + 1) % r.length]![0] * r[i]![1];
      area += (k === 0 ? 1 : -1) * Math.abs(s / 2);
    });
  return area;
}
