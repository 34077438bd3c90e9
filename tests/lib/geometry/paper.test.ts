import { describe, expect, test } from 'vitest';
import {
  arcPoints,
  CHORD_TOLERANCE_MM,
  paperTabDepthMm,
  paperThicknessMm,
  PAPER_DENSITY_G_PER_CM3,
} from '../../../src/lib/geometry/paper';

describe('paperThicknessMm', () => {
  test('divides weight by the assumed density', () => {
    // Definition of grammage: thickness = (g/m²) / density. From memory: office paper ≈ 0.8 g/cm³, and
    // 80 g/m² office paper is sold as about 0.1 mm thick.
    expect(PAPER_DENSITY_G_PER_CM3).toBe(0.8);
    expect(paperThicknessMm(80)).toBeCloseTo(0.1, 12);
    expect(paperThicknessMm(300)).toBeCloseTo(0.375, 12);
  });
});

describe('paperTabDepthMm', () => {
  test('grows with paper weight and never exceeds 0.8 of its edge', () => {
    expect(paperTabDepthMm(300)).toBeGreaterThan(paperTabDepthMm(80));
    expect(paperTabDepthMm(300, 4)).toBeCloseTo(3.2, 12);
  });
});

describe('arcPoints', () => {
  test.each([1, 10, 100, 5000])('keeps every chord within the tolerance of a radius-%i arc', (r) => {
    const pts = arcPoints([3, -2], r, 0.3, 4.1);
    expect(pts[0]![0]).toBeCloseTo(3 + r * Math.cos(0.3), 9);
    expect(pts.at(-1)![1]).toBeCloseTo(-2 + r * Math.sin(4.1), 9);
    for (let i = 1; i < pts.length; i++) {
      const [a, b] = [pts[i - 1]!, pts[i]!];
      const mid = [(a[0] + b[0]) / 2 - 3, (a[1] + b[1]) / 2 + 2];
      // Sagitta = R − distance of the chord's midpoint from the centre.
      expect(r - Math.hypot(mid[0]!, mid[1]!)).toBeLessThanOrEqual(CHORD_TOLERANCE_MM + 1e-12);
    }
  });
});
