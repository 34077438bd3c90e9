import { describe, expect, test } from 'vitest';
import { hingeTreeFold } from '../../../src/lib/geometry/hinge-tree';
import { modelPatterns } from '../../../src/lib/geometry/model-patterns';
import { pieceSplit, SPLIT_CUTS_TRIED_MAX } from '../../../src/lib/geometry/piece-split';
import type { Piece } from '../../../src/lib/geometry/types';
import { polygonArea } from '../../../src/lib/geometry/vec';
import { demoModel } from './fixtures';

const wall = () =>
  modelPatterns(demoModel('skein-probe'), { scaleDenominator: 20, paperGsm: 160 }).pieces.find((p) => p.id === 'body')!;
const longSideMm = (p: Piece) => {
  const xs = p.outlineMm.map((v) => v[0]);
  const ys = p.outlineMm.map((v) => v[1]);
  return Math.max(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys));
};
/** The highest joint number on a piece: its tabs and the numbers of other pieces' tabs printed on it. */
const maxTab = (p: Piece) => Math.max(...[...p.tabs, ...p.edgeLabels].map((t) => t.number));

describe('pieceSplit', () => {
  // CRC Standard Mathematical Tables: a regular hexagon with apothem a has side 2a·tan 30°; the Skein's
  // 2.4 m across the flats gives 1385.6 mm walls, 69.28 mm at 1:20, so the six-wall strip is 415.7 mm long.
  const side = (2 * 1200 * Math.tan(Math.PI / 6)) / 20;

  test('cuts a 64-facet wall strip (more joints than it tries at one cut) into whole walls that each fit', () => {
    // A cylinder of 64 facets, 1 m across at 1:10: its wall strip is about 314 mm long (the circumference).
    const model = {
      schemaVersion: 1 as const,
      name: 'Drum',
      body: { kind: 'cylinder' as const, diameterM: 1, heightM: 0.5, facets: 64 },
      appendages: [],
    };
    const strip = modelPatterns(model, { scaleDenominator: 10, paperGsm: 160 }).pieces.find((p) => p.id === 'body')!;
    expect(strip.hinge.joints.length).toBeGreaterThan(SPLIT_CUTS_TRIED_MAX);
    let next = maxTab(strip);
    const parts = pieceSplit(
      strip,
      (p) => longSideMm(p) <= 100,
      160,
      () => ++next,
    );
    for (const p of parts) expect(longSideMm(p)).toBeLessThanOrEqual(100);
    // Every face lands in exactly one part, whole.
    expect(parts.reduce((a, p) => a + p.hinge.faces.length, 0)).toBe(strip.hinge.faces.length);
    expect(parts.reduce((a, p) => a + p.faceAreaMm2, 0)).toBeCloseTo(strip.faceAreaMm2, 6);
    const walls = parts.map((p) => p.hinge.faces.length);
    expect(Math.min(...walls)).toBeGreaterThanOrEqual(Math.max(...walls) / 2);
  });

  test('cuts the Skein wall strip at 1:20 into parts of whole walls that each fit the limit', () => {
    let next = maxTab(wall());
    const parts = pieceSplit(
      wall(),
      (p) => longSideMm(p) <= 259.4,
      160,
      () => ++next,
    );
    expect(parts.map((p) => p.id)).toEqual(['body-1', 'body-2']);
    expect(parts.map((p) => p.label)).toEqual(['Body wall, part 1 of 2', 'Body wall, part 2 of 2']);
    for (const p of parts) expect(longSideMm(p)).toBeLessThanOrEqual(259.4);
    // Whole walls: each part's face area is a whole number of 69.28 × 45 mm walls (0.9 m / 20 = 45 mm).
    const walls = parts.map((p) => p.faceAreaMm2 / (side * 45));
    for (const w of walls) expect(Math.abs(w - Math.round(w))).toBeLessThan(1e-6);
    expect(walls.reduce((a, b) => a + b, 0)).toBeCloseTo(6, 9);
  });

  test('joins the parts by one new tab whose number is printed once on a tab and once on an edge', () => {
    const before = maxTab(wall());
    let next = before;
    const parts = pieceSplit(
      wall(),
      (p) => longSideMm(p) <= 259.4,
      160,
      () => ++next,
    );
    expect(next).toBe(before + 1);
    const onTabs = parts.flatMap((p) => p.tabs.filter((t) => t.number === next));
    const onEdges = parts.flatMap((p) => p.edgeLabels.filter((l) => l.number === next));
    expect(onTabs).toHaveLength(1);
    expect(onEdges).toHaveLength(1);
    // The tab as deep as the paper wants: a tab is a trapezoid of positive area on its part's outline.
    expect(polygonArea(onTabs[0]!.polygonMm)).toBeGreaterThan(0);
    expect(onTabs[0]!.depthMm).toBeGreaterThan(5);
    // Every number of the whole piece is still on exactly one of its parts.
    const numbers = (ps: Piece[]) => ps.flatMap((p) => [...p.tabs, ...p.edgeLabels].map((t) => t.number)).sort();
    expect(numbers(parts).filter((n) => n !== next)).toEqual(numbers([wall()]));
  });

  test('folds every part back to the faces of the whole piece (the cut loses no face and moves none)', () => {
    const whole = wall();
    let next = maxTab(whole);
    const parts = pieceSplit(
      whole,
      (p) => longSideMm(p) <= 150,
      160,
      () => ++next,
    );
    expect(parts.length).toBe(3);
    const key = (poly: readonly (readonly number[])[]) =>
      poly.map((v) => v.map((c) => c.toFixed(4)).join(',')).join(' ');
    const folded = (ps: Piece[]) => ps.flatMap((p) => hingeTreeFold(p.hinge, 1).map((f) => key(f.polygonMm))).sort();
    expect(folded(parts)).toEqual(folded([whole]));
  });

  test('leaves a piece that fits, or one with no fold to cut, whole', () => {
    const whole = wall();
    const fits = pieceSplit(
      whole,
      () => true,
      160,
      () => 0,
    );
    expect(fits).toEqual([whole]);
    const cap = modelPatterns(demoModel('skein-probe'), { scaleDenominator: 20, paperGsm: 160 }).pieces.find(
      (p) => p.id === 'body-top',
    )!;
    expect(
      pieceSplit(
        cap,
        () => false,
        160,
        () => 0,
      ),
    ).toEqual([cap]);
  });
});
