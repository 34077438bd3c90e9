import polygonClipping from 'polygon-clipping';
import type { Ring } from 'polygon-clipping';
import { describe, expect, test } from 'vitest';
import { placementApply } from '../../../src/lib/layout/placement';
import { tilingLetter, tilingPiece } from '../../../src/lib/layout/tiling';
import type { Placement } from '../../../src/lib/layout/types';
import { cubeNetPiece, rectPiece } from '../../fixtures/pieces/pieces';
import { multiPolygonArea } from './polygon-area';

/** The tile's window carried back into the piece's flat plane (inverse of the placement rule). */
function windowInFlat(p: Placement): Ring {
  const w = p.tile!.windowMm;
  const c = Math.cos(p.rotationRad);
  const s = Math.sin(p.rotationRad);
  const back = (x: number, y: number): [number, number] => {
    const dx = x - p.xMm;
    const dy = y - p.yMm;
    const qx = c * dx + s * dy;
    const qy = -s * dx + c * dy;
    return [p.mirrored ? -qx : qx, -qy];
  };
  return [
    back(w.xMm, w.yMm),
    back(w.xMm + w.widthMm, w.yMm),
    back(w.xMm + w.widthMm, w.yMm + w.heightMm),
    back(w.xMm, w.yMm + w.heightMm),
  ];
}

describe('tilingPiece', () => {
  const window = { xMm: 10, yMm: 10, widthMm: 190, heightMm: 200 };

  test('covers the whole piece with its windows (difference has zero area, by polygon-clipping)', () => {
    for (const [piece, rotation] of [
      [rectPiece('long', 600, 40), 0],
      [cubeNetPiece('big', 150), 0.3],
      [rectPiece('sq', 500, 450), Math.PI / 2],
    ] as const) {
      const tiles = tilingPiece(piece, rotation, window, 12);
      const outline: Ring = piece.outlineMm.map(([x, y]) => [x, y]);
      const uncovered = polygonClipping.difference([outline], ...tiles.map((t) => [windowInFlat(t.placement)]));
      expect(multiPolygonArea(uncovered)).toBeLessThan(1e-6);
    }
  });

  test('overlaps neighbouring windows by exactly the stated strip', () => {
    const tiles = tilingPiece(rectPiece('sq', 500, 450), 0, window, 12);
    const at = (r: number, c: number) =>
      tiles.find((t) => t.placement.tile!.row === r && t.placement.tile!.col === c)!.placement;
    const shared = polygonClipping.intersection([windowInFlat(at(0, 0))], [windowInFlat(at(0, 1))]);
    expect(multiPolygonArea(shared)).toBeCloseTo(12 * 200, 6);
    const sharedDown = polygonClipping.intersection([windowInFlat(at(0, 0))], [windowInFlat(at(1, 0))]);
    expect(multiPolygonArea(sharedDown)).toBeCloseTo(12 * 190, 6);
    expect(at(0, 0).tile!.rows * at(0, 0).tile!.cols).toBe(tiles.length);
  });

  // A piece 10 mm longer each way than the window leaves a last row and column barely wider than the overlap,
  // where the strips of four tiles cross (the ring caps of the stack at 1:10 on A5).
  test.each([
    ['a large piece', rectPiece('sq', 500, 450)],
    ['a piece whose last row and column are short', rectPiece('cap', 200, 210)],
  ])(
    'prints each alignment mark of %s at the same point of the piece on exactly the two tiles it joins',
    (_, piece) => {
      const tiles = tilingPiece(piece, 0, window, 12);
      const byLetter = new Map<string, [number, number][]>();
      for (const t of tiles) {
        for (const m of t.alignmentMarks) {
          // Back to flat coordinates through the inverse of the rule; forward-check with placementApply.
          const c = Math.cos(t.placement.rotationRad);
          const s = Math.sin(t.placement.rotationRad);
          const dx = m.atMm[0] - t.placement.xMm;
          const dy = m.atMm[1] - t.placement.yMm;
          const flat: [number, number] = [c * dx + s * dy, -(-s * dx + c * dy)];
          expect(placementApply(t.placement, flat)[0]).toBeCloseTo(m.atMm[0], 9);
          byLetter.set(m.letter, [...(byLetter.get(m.letter) ?? []), flat]);
        }
      }
      expect(byLetter.size).toBeGreaterThan(0);
      for (const points of byLetter.values()) {
        expect(points).toHaveLength(2);
        expect(points[0]![0]).toBeCloseTo(points[1]![0], 9);
        expect(points[0]![1]).toBeCloseTo(points[1]![1], 9);
      }
    },
  );

  test('keeps the crosses of one tile apart: arms 3 mm long never meet when centres are over 6 mm apart', () => {
    const tiles = tilingPiece(rectPiece('cap', 200, 210), 0, window, 12);
    expect(tiles).toHaveLength(4);
    for (const { alignmentMarks: marks } of tiles)
      for (let i = 0; i < marks.length; i++)
        for (let j = i + 1; j < marks.length; j++) {
          const [a, b] = [marks[i]!.atMm, marks[j]!.atMm];
          expect(Math.hypot(a[0] - b[0], a[1] - b[1]), `${marks[i]!.letter} ${marks[j]!.letter}`).toBeGreaterThan(6);
        }
  });

  test('returns no tiles when the window is no wider than the overlap', () => {
    expect(tilingPiece(rectPiece('x', 100, 100), 0, { xMm: 0, yMm: 0, widthMm: 10, heightMm: 50 }, 12)).toEqual([]);
  });
});

describe('tilingLetter', () => {
  test('counts like spreadsheet columns', () => {
    expect([0, 25, 26, 27, 701, 702].map(tilingLetter)).toEqual(['A', 'Z', 'AA', 'AB', 'ZZ', 'AAA']);
  });
});
