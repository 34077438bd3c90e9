import { describe, expect, test } from 'vitest';
import { modelPatterns } from '../../../src/lib/geometry/model-patterns';
import { modelMesh } from '../../../src/lib/geometry/model-mesh';
import { hingeTreeFold } from '../../../src/lib/geometry/hinge-tree';
import {
  bodyPatternFacets,
  bodyPatternShape,
  bodyPatternWallMinMm,
} from '../../../src/lib/geometry/body-pattern-facets';
import { BUILD_GRADE_BANDS, pieceMeasures, type BuildGradeBand } from '../../../src/lib/geometry/buildability';
import type { Piece } from '../../../src/lib/geometry/types';
import { model, norm, sub } from './fixtures';

const cylinder = (facets: number, diameterM = 0.5) =>
  model({ body: { kind: 'cylinder', diameterM, heightM: 0.15, facets } });
const patterns = (m: ReturnType<typeof model>, n: number, gradeBand: BuildGradeBand = '6-8') =>
  modelPatterns(m, { scaleDenominator: n, paperGsm: 160, gradeBand });
const wallOf = (pieces: Piece[]) => pieces.find((p) => p.id === 'body')!;
/** Wall widths measured on the laid-out strip (each wall face's bottom edge). */
const wallWidthsMm = (wall: Piece) => wall.hinge.faces.map((f) => f.polygonMm[1]![0] - f.polygonMm[0]![0]);
/** The ring teeth: tabs along the strip's top or bottom edge (the seam tab stands on a vertical edge). */
const teethOf = (wall: Piece) => wall.tabs.filter((t) => Math.abs(t.polygonMm[1]![1] - t.polygonMm[0]![1]) < 1e-9);
/** Base widths of the ring teeth as drawn: each tooth's two corners on the wall edge. */
const toothBasesMm = (wall: Piece) => teethOf(wall).map((t) => Math.abs(t.polygonMm[1]![0] - t.polygonMm[0]![0]));

describe('bodyPatternFacets', () => {
  test.each(BUILD_GRADE_BANDS)('caps a 256-facet cylinder at 1:5 to walls and teeth a class of %s can fold', (band) => {
    const m = cylinder(256); // 0.5 m across → R = 50 mm at 1:5; 256 facets would give 1.23 mm walls
    const wall = wallOf(patterns(m, 5, band).pieces);
    const used = wall.hinge.faces.length;
    const min = bodyPatternWallMinMm(band);
    expect(used).toBeLessThan(256);
    // Two rings of one tooth per wall.
    expect(teethOf(wall)).toHaveLength(2 * used);
    // 1e-9 mm: the strip's corners are running sums of wall widths, a few ulps off the chord.
    for (const w of [...wallWidthsMm(wall), ...toothBasesMm(wall)]) expect(w).toBeGreaterThanOrEqual(min - 1e-9);
    // The measures the scale solver holds against the band (buildability.ts) pass for the folds and strips.
    const measured = pieceMeasures(wall);
    expect(measured.foldGapMm).toBeGreaterThanOrEqual(min - 1e-9);
    expect(measured.stripMm).toBeGreaterThanOrEqual(min - 1e-9);
    // Largest such count: one facet more would be too narrow. CRC Standard Mathematical Tables: the side
    // of a regular n-gon of circumradius R is 2R·sin(π/n).
    expect(2 * 50 * Math.sin(Math.PI / (used + 1))).toBeLessThan(min);
    // The assembled mesh for printing keeps all 256 facets: 256 corners on the base plane.
    const mesh = modelMesh(m, 5);
    let onBase = 0;
    for (let i = 2; i < mesh.positions.length; i += 3) if (mesh.positions[i] === 0) onBase++;
    expect(onBase).toBe(256);
  });

  test('leaves a 16-facet cylinder at 1:5 alone (teeth already wide enough)', () => {
    const m = cylinder(16);
    expect(bodyPatternShape(m.body, 5, '6-8')).toBe(m.body);
    const wall = wallOf(patterns(m, 5).pieces);
    expect(wall.hinge.faces).toHaveLength(16);
    // Every wall keeps its model width 2R·sin(π/16) = 19.51 mm (CRC n-gon side, R = 50 mm).
    for (const f of wall.hinge.faces)
      expect(f.polygonMm[1]![0] - f.polygonMm[0]![0]).toBeCloseTo(2 * 50 * Math.sin(Math.PI / 16), 9);
  });

  test('never goes below 6 facets, however small the cylinder', () => {
    // 50 mm across at 1:10 → R = 2.5 mm: even a hexagon's walls are R = 2.5 mm wide.
    expect(bodyPatternFacets(cylinder(64, 0.05).body, 10, 'adult')).toBe(6);
    expect(wallOf(patterns(cylinder(64, 0.05), 10, 'adult').pieces).hinge.faces).toHaveLength(6);
  });

  test('gives younger bands fewer, wider walls', () => {
    // R = 50 mm; the largest n whose side 2R·sin(π/n) (CRC n-gon side) is at least the band's wall, counted up.
    const counts = BUILD_GRADE_BANDS.map((band) => bodyPatternFacets(cylinder(256).body, 5, band));
    for (const [i, band] of BUILD_GRADE_BANDS.entries()) {
      let n = 6;
      while (2 * 50 * Math.sin(Math.PI / (n + 1)) >= bodyPatternWallMinMm(band)) n++;
      expect(counts[i], band).toBe(n);
    }
    expect([...counts].sort((a, b) => a - b)).toEqual(counts);
  });

  test.each([
    [256, 5],
    [256, 20],
    [64, 10],
    [24, 20],
  ])('makes the wall strip of a %i-facet cylinder at 1:%i the perimeter of the n-gon it uses', (facets, N) => {
    const wall = wallOf(patterns(cylinder(facets), N).pieces);
    const n = wall.hinge.faces.length;
    const xs = wall.hinge.faces.flatMap((f) => f.polygonMm.map((p) => p[0]));
    const R = 250 / N;
    // Corners on the circle (body-shape.ts), so the regular n-gon is inscribed: perimeter 2nR·sin(π/n).
    expect(Math.max(...xs) - Math.min(...xs)).toBeCloseTo(2 * n * R * Math.sin(Math.PI / n), 9);
  });

  test('folds the capped wall strip shut with every corner on the circle', () => {
    const wall = wallOf(patterns(cylinder(256), 5).pieces);
    const folded = hingeTreeFold(wall.hinge, 1);
    const first = folded[0]!.polygonMm,
      last = folded[folded.length - 1]!.polygonMm;
    // The last wall's right edge (corners 1, 2) meets the first wall's left edge (corners 0, 3).
    expect(norm(sub(last[1]!, first[0]!))).toBeLessThan(1e-9);
    expect(norm(sub(last[2]!, first[3]!))).toBeLessThan(1e-9);
    for (const f of folded) for (const p of f.polygonMm) expect(Math.hypot(p[0], p[1])).toBeCloseTo(50, 9);
  });

  test('puts a mark for side:200 of a 256-facet cylinder on the capped wall that holds it', () => {
    const m = model({
      body: { kind: 'cylinder', diameterM: 0.5, heightM: 0.15, facets: 256 },
      appendages: [
        {
          kind: 'wire-boom',
          id: 'w',
          label: 'Wire',
          face: 'side:200',
          position: { uM: 0, vM: 0 },
          orientation: { tiltDeg: 0, azimuthDeg: 0 },
          lengthM: 1,
        },
      ],
    });
    const result = patterns(m, 5);
    const wall = wallOf(result.pieces);
    const n = wall.hinge.faces.length;
    const anchorNumber = result.pieces.find((p) => p.id === 'w-anchor')!.tabs[0]!.number;
    const mark = wall.edgeLabels.find((l) => l.number === anchorNumber)!;
    // Model side 200's centre is at azimuth 2π·200/256; pattern wall j is centred at 2πj/n.
    const j = Math.round((200 * n) / 256);
    const face = wall.hinge.faces[j]!.polygonMm;
    expect(mark.atMm[0]).toBeGreaterThan(face[0]![0]);
    expect(mark.atMm[0]).toBeLessThan(face[1]![0]);
  });
});
