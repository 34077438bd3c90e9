import { describe, expect, test } from 'vitest';
import type { SheetVec2Mm } from '../../../src/lib/layout/types';
import { segmentClipOutline } from '../../../src/lib/render/segment-clip';
import { ringArea } from '../layout/polygon-area';

const closed = (ring: readonly SheetVec2Mm[]) => {
  const [a, b] = [ring[0]!, ring[ring.length - 1]!];
  return a[0] === b[0] && a[1] === b[1];
};

describe('segmentClipOutline', () => {
  test('closes a square cut by the window along the window edge: area 5 × 10 (shoelace formula)', () => {
    const square: SheetVec2Mm[] = [
      [0, 0],
      [10, 0],
      [10, 10],
      [0, 10],
    ];
    const rings = segmentClipOutline(square, { xMm: 5, yMm: -5, widthMm: 20, heightMm: 20 });
    expect(rings).toHaveLength(1);
    expect(closed(rings[0]!)).toBe(true);
    expect(ringArea(rings[0]!.map((p) => [p[0], p[1]]))).toBeCloseTo(50, 9);
  });

  test('gives a U-shaped piece cut across its arms two closed contours of 2 × 4 each', () => {
    // A U: 6 wide, 6 tall, arms 2 wide, notch 2 wide and 4 deep; the window keeps y ≥ 2 (the arms only).
    const u: SheetVec2Mm[] = [
      [0, 0],
      [6, 0],
      [6, 6],
      [4, 6],
      [4, 2],
      [2, 2],
      [2, 6],
      [0, 6],
    ];
    const rings = segmentClipOutline(u, { xMm: -1, yMm: 2, widthMm: 8, heightMm: 10 });
    expect(rings).toHaveLength(2);
    for (const ring of rings) {
      expect(closed(ring)).toBe(true);
      expect(ringArea(ring.map((p) => [p[0], p[1]]))).toBeCloseTo(8, 9);
    }
  });

  test('returns the outline closed when there is no window, and nothing for a window beside the piece', () => {
    const tri: SheetVec2Mm[] = [
      [0, 0],
      [4, 0],
      [0, 3],
    ];
    expect(segmentClipOutline(tri)).toEqual([[...tri, tri[0]]]);
    expect(segmentClipOutline(tri, { xMm: 10, yMm: 10, widthMm: 5, heightMm: 5 })).toEqual([]);
  });
});
