import { describe, expect, test } from 'vitest';
import { BOOM_STOCK, boomStockFor, partSubstituteWords } from '../../../src/lib/geometry/part-substitutes';
import { modelPatterns } from '../../../src/lib/geometry/model-patterns';
import { demoModel } from './fixtures';

describe('boomStockFor', () => {
  test('keeps a paper tube at a pencil’s width and swaps thinner booms for the rod that fits', () => {
    // The pencil threshold (from memory: about 7 mm across) and the rods' sizes are stated in the modules.
    expect(boomStockFor(7, 300)).toBeNull();
    expect(boomStockFor(5, 150)).toBe('drinking-straw');
    expect(boomStockFor(5, BOOM_STOCK['drinking-straw'].lengthMm + 1)).toBe('bamboo-skewer');
    expect(boomStockFor(2, 120)).toBe('bamboo-skewer');
    expect(boomStockFor(4, BOOM_STOCK['bamboo-skewer'].lengthMm + 1)).toBe('wooden-dowel');
  });
});

describe('modelPatterns substitutes', () => {
  test('the Skein at 1:25 for grades 6–8: skewers for its axial booms, a flat disc for its dish, thread for its wires', () => {
    const { pieces, substitutes, threads } = modelPatterns(demoModel('skein-probe'), {
      scaleDenominator: 25,
      paperGsm: 160,
      gradeBand: '6-8',
    });
    // By hand from the model file: axial booms 0.1 m × 6 m → 4 mm × 240 mm at 1:25; dish 0.6 m → 24 mm.
    const rods = substitutes.filter((s) => s.kind === 'boom-stock');
    expect(rods.map((r) => [r.partId, r.kind === 'boom-stock' && r.stock])).toEqual([
      ['axial-top', 'bamboo-skewer'],
      ['axial-bottom', 'bamboo-skewer'],
    ]);
    for (const r of rods) {
      expect(r.lengthMm).toBeCloseTo(240, 9);
      if (r.kind === 'boom-stock') expect(Math.hypot(...r.toMm.map((v, i) => v - r.fromMm[i]!))).toBeCloseTo(240, 9);
    }
    expect(pieces.some((p) => p.partId === 'axial-top')).toBe(false);
    const dish = substitutes.find((s) => s.kind === 'flat-disc')!;
    expect(dish.diameterMm).toBeCloseTo(24, 9);
    const disc = pieces.find((p) => p.partId === 'dish')!;
    expect(disc.hinge.curved).toBeUndefined();
    expect(disc.tabs).toEqual([]);
    // The printed disc is an inscribed polygon of the 12 mm circle: its area is under π·12² by less than the
    // perimeter times the chord tolerance (each chord's sagitta, CHORD_TOLERANCE_MM = 0.05 mm).
    expect(disc.faceAreaMm2).toBeLessThan(Math.PI * 12 * 12);
    expect(disc.faceAreaMm2).toBeGreaterThan(Math.PI * 12 * 12 - 2 * Math.PI * 12 * 0.05);
    expect(partSubstituteWords(rods[0]!, '6-8')).toBe(
      'Axial boom, top: a bamboo skewer cut to 240 mm (the paper tube would be 4.0 mm thick, thinner than a pencil)',
    );
    // Wire booms are always thread: 35 m at 1:25 is 1400 mm, plus 100 mm for the knots.
    expect(threads.map((t) => Math.round(t.threadLengthMm))).toEqual([1500, 1500, 1500, 1500]);
  });

  test('the Skein at 1:10 keeps paper tubes (10 mm across) and a rolled dish (60 mm)', () => {
    const { pieces, substitutes } = modelPatterns(demoModel('skein-probe'), { scaleDenominator: 10, paperGsm: 160 });
    expect(substitutes).toEqual([]);
    expect(pieces.find((p) => p.partId === 'axial-top')!.hinge.curved?.kind).toBe('tube');
    expect(pieces.find((p) => p.partId === 'dish')!.hinge.curved?.kind).toBe('cone');
  });
});
