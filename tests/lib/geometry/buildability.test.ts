import { describe, expect, test } from 'vitest';
import {
  BUILD_GRADE_BANDS,
  BUILDABILITY_MINIMUMS,
  buildabilityBand,
  buildabilityShortfalls,
  pieceFoldGapMm,
  pieceStripMm,
  polygonWidthMm,
  segmentDistanceMm,
} from '../../../src/lib/geometry/buildability';
import { modelPatterns } from '../../../src/lib/geometry/model-patterns';
import { demoModel } from './fixtures';

describe('BUILDABILITY_MINIMUMS', () => {
  test('asks more of younger classes on every measure', () => {
    // The bands run from youngest to adults; each minimum may only shrink along them.
    for (let i = 1; i < BUILD_GRADE_BANDS.length; i++) {
      const [older, younger] = [
        BUILDABILITY_MINIMUMS[BUILD_GRADE_BANDS[i]!],
        BUILDABILITY_MINIMUMS[BUILD_GRADE_BANDS[i - 1]!],
      ];
      for (const key of Object.keys(older) as (keyof typeof older)[])
        expect(older[key], `${BUILD_GRADE_BANDS[i]} ${key}`).toBeLessThanOrEqual(younger[key]);
    }
  });
});

describe('polygonWidthMm', () => {
  test('matches the textbook widths of a rectangle, an equilateral triangle and a regular hexagon', () => {
    expect(
      polygonWidthMm([
        [0, 0],
        [30, 0],
        [30, 7],
        [0, 7],
      ]),
    ).toBeCloseTo(7, 12);
    // Equilateral triangle of side s: its narrowest width is its height s·√3/2 (CRC Standard Mathematical Tables).
    const s = 20;
    expect(
      polygonWidthMm([
        [0, 0],
        [s, 0],
        [s / 2, (s * Math.sqrt(3)) / 2],
      ]),
    ).toBeCloseTo((s * Math.sqrt(3)) / 2, 12);
    // Regular hexagon of circumradius R: width across the flats 2·R·cos 30° = R·√3 (CRC).
    const R = 10;
    const hex = Array.from(
      { length: 6 },
      (_, i) => [R * Math.cos((i * Math.PI) / 3), R * Math.sin((i * Math.PI) / 3)] as const,
    );
    expect(polygonWidthMm(hex)).toBeCloseTo(R * Math.sqrt(3), 12);
  });
});

describe('segmentDistanceMm', () => {
  test('gives the gap between parallel segments, the end gap of collinear ones, and 0 when they cross', () => {
    expect(segmentDistanceMm([0, 0], [10, 0], [2, 3], [8, 3])).toBeCloseTo(3, 12);
    expect(segmentDistanceMm([0, 0], [10, 0], [13, 0], [20, 0])).toBeCloseTo(3, 12);
    // 3-4-5 triangle: from (0,0)–(0,10) to the point (3,14) the nearest end is (0,10), 5 mm away.
    expect(segmentDistanceMm([0, 0], [0, 10], [3, 14], [3, 30])).toBeCloseTo(5, 12);
    expect(segmentDistanceMm([0, 0], [10, 10], [0, 10], [10, 0])).toBe(0);
  });
});

describe('piece measures on the demo kits', () => {
  test('the Skein wall strip at 1:20 has folds one hexagon side apart and faces one side wide', () => {
    // CRC: a regular hexagon with apothem a has side 2·a·tan 30°; Skein is 2.4 m across the flats, so at 1:20
    // a = 60 mm and each wall is 69.28 mm wide and 900 / 20 = 45 mm tall.
    const side = 2 * 60 * Math.tan(Math.PI / 6);
    const body = modelPatterns(demoModel('skein-probe'), { scaleDenominator: 20, paperGsm: 160 }).pieces.find(
      (p) => p.id === 'body',
    )!;
    const walls = body.hinge.faces.filter((f) => f.polygonMm.length === 4);
    expect(walls.length).toBeGreaterThanOrEqual(6);
    expect(pieceStripMm(body)).toBeCloseTo(45, 6);
    const gap = pieceFoldGapMm(body);
    // Wall folds are one side apart; tab folds along a wall's top and bottom are its height apart.
    expect(gap).toBeCloseTo(Math.min(side, 45), 6);
  });

  test('names the Wren solar panels as what grades 6–8 cannot build at 1:10, and finds the band each scale suits', () => {
    // Wren's panels are 0.1 m wide: 10 mm at 1:10, under grades 6–8's 15 mm piece.
    const at10 = modelPatterns(demoModel('wren-3u'), { scaleDenominator: 10, paperGsm: 160 }).pieces;
    const short = buildabilityShortfalls(at10, '6-8');
    expect(short[0]).toMatchObject({ what: 'pieceMm', minimumMm: 15 });
    expect(short[0]!.measuredMm).toBeCloseTo(10, 9);
    expect(short.map((s) => s.pieceId)).toEqual(expect.arrayContaining(['panel-px', 'panel-mx']));
    expect(buildabilityBand(at10)).toBe('9-12');
    const at5 = modelPatterns(demoModel('wren-3u'), { scaleDenominator: 5, paperGsm: 160 }).pieces;
    expect(buildabilityShortfalls(at5, '6-8')).toEqual([]);
  });
});
