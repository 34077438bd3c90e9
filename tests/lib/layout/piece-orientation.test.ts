import { describe, expect, test } from 'vitest';
import { pieceOrientationForTilesRad } from '../../../src/lib/layout/piece-orientation';
import { placementBounds } from '../../../src/lib/layout/placement';
import { tilingGrid } from '../../../src/lib/layout/tiling';
import type { Vec2Mm } from '../../../src/lib/geometry/types';

const rect = (w: number, h: number, turnRad = 0): Vec2Mm[] =>
  (
    [
      [0, 0],
      [w, 0],
      [w, h],
      [0, h],
    ] as const
  ).map(([x, y]) => [x * Math.cos(turnRad) - y * Math.sin(turnRad), x * Math.sin(turnRad) + y * Math.cos(turnRad)]);
const window = { widthMm: 190, heightMm: 200 };
const boxOf = (outlineMm: Vec2Mm[], rotationRad: number) =>
  placementBounds({ xMm: 0, yMm: 0, rotationRad, mirrored: false }, { outlineMm });

describe('pieceOrientationForTilesRad', () => {
  test('tiles a long strip along its length, lying across the sheet', () => {
    const strip = rect(600, 40);
    const angle = pieceOrientationForTilesRad(strip, window, 12);
    expect(angle).toBe(0);
    // By hand: columns ⌈(600 − 12) / (190 − 12)⌉ = 4, one row.
    expect(tilingGrid(boxOf(strip, angle), window, 12)).toEqual({ cols: 4, rows: 1 });
  });

  test('turns a strip drawn upright to lie across the sheet, both poses needing four tiles', () => {
    const angle = pieceOrientationForTilesRad(rect(40, 600), window, 12);
    expect(Math.abs(angle)).toBeCloseTo(Math.PI / 2, 12);
  });

  test('straightens a strip drawn at 30° onto the sheet axes instead of tiling it diagonally', () => {
    const strip = rect(300, 40, Math.PI / 6);
    const box = boxOf(strip, pieceOrientationForTilesRad(strip, window, 12));
    // Aligned with its own edges the box is the rectangle itself (either way round), to rounding.
    expect(Math.max(box.widthMm, box.heightMm)).toBeCloseTo(300, 6);
    expect(Math.min(box.widthMm, box.heightMm)).toBeCloseTo(40, 6);
  });

  test('gives 0 for a degenerate outline', () => {
    expect(
      pieceOrientationForTilesRad(
        [
          [0, 0],
          [1, 1],
        ],
        window,
        12,
      ),
    ).toBe(0);
  });
});
