import { describe, expect, test } from 'vitest';
import { modelPatterns } from '../../../src/lib/geometry/model-patterns';
import { modelMesh } from '../../../src/lib/geometry/model-mesh';
import { hingeTreeFold } from '../../../src/lib/geometry/hinge-tree';
import { bodyPatternFacets, bodyPatternShape } from '../../../src/lib/geometry/body-pattern-facets';
import { TOOTH_BASE_MIN_MM } from '../../../src/lib/geometry/paper';
import type { Piece } from '../../../src/lib/geometry/types';
import { model, norm, sub } from './fixtures';

const cylinder = (facets: number, diameterM = 0.5) =>
  model({ body: { kind: 'cylinder', diameterM, heightM: 0.15, facets } });
const patterns = (m: ReturnType<typeof model>, n: number) => modelPatterns(m, { scaleDenominator: n, paperGsm: 160 });
const wallOf = (pieces: Piece[]) => pieces.find((p) => p.id === 'body')!;

/** Tooth bases measured on the drawn ring polygons: the gaps between the ring's corners on the wall edge. */
function toothBasesMm(wall: Piece): number[][] {
  const H = wall.hinge.faces[0]!.polygonMm[2]![1];
  const rings = wall.tabs.filter((t) => t.polygonMm.length > 4);
  return rings.map((ring) => {
    const y = ring.labelAtMm[1] > H / 2 ? H : 0;
    const xs = [...new Set(ring.polygonMm.filter((p) => Math.abs(p[1] - y) < 1e-9).map((p) => p[0]))].sort(
      (a, b) => a - b,
    );
    return xs.slice(1).map((x, i) => x - xs[i]!);
  });
}

describe('bodyPatternFacets', () => {
  test('caps a 256-facet cylinder at 1:5 so every drawn tooth base is at least the minimum', () => {
    const m = cylinder(256); // 0.5 m across → R = 50 mm at 1:5; 256 facets would give 1.23 mm teeth
    const result = patterns(m, 5);
    const wall = wallOf(result.pieces);
    const used = wall.hinge.faces.length;
    expect(result.bodyFacets).toBe(used);
    expect(used).toBeLessThan(256);
    const rings = toothBasesMm(wall);
    expect(rings).toHaveLength(2);
    for (const bases of rings) {
      expect(bases).toHaveLength(used);
      // 1e-9 mm: the strip's corners are running sums of wall widths, a few ulps off the chord.
      for (const b of bases) expect(b).toBeGreaterThanOrEqual(TOOTH_BASE_MIN_MM - 1e-9);
    }
    // Largest such count: one facet more would be too narrow. CRC Standard Mathematical Tables: the side
    // of a regular n-gon of circumradius R is 2R·sin(π/n).
    expect(2 * 50 * Math.sin(Math.PI / (used + 1))).toBeLessThan(TOOTH_BASE_MIN_MM);
    // The assembled mesh for printing keeps all 256 facets: 256 corners on the base plane.
    const mesh = modelMesh(m, 5);
    let onBase = 0;
    for (let i = 2; i < mesh.positions.length; i += 3) if (mesh.positions[i] === 0) onBase++;
    expect(onBase).toBe(256);
  });

  test('leaves a 16-facet cylinder at 1:5 alone (teeth already wide enough)', () => {
    const m = cylinder(16);
    expect(bodyPatternShape(m.body, 5)).toBe(m.body);
    const result = patterns(m, 5);
    expect(result.bodyFacets).toBe(16);
    const wall = wallOf(result.pieces);
    // Every wall keeps its model width 2R·sin(π/16) = 19.51 mm (CRC n-gon side, R = 50 mm).
    for (const f of wall.hinge.faces)
      expect(f.polygonMm[1]![0] - f.polygonMm[0]![0]).toBeCloseTo(2 * 50 * Math.sin(Math.PI / 16), 9);
  });

  test('never goes below 6 facets, however small the cylinder', () => {
    // 50 mm across at 1:10 → R = 2.5 mm: even a hexagon's walls are R = 2.5 mm wide.
    expect(bodyPatternFacets(cylinder(64, 0.05).body, 10)).toBe(6);
    expect(patterns(cylinder(64, 0.05), 10).bodyFacets).toBe(6);
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
    const n = result.bodyFacets;
    const anchorNumber = result.pieces.find((p) => p.id === 'w-anchor')!.tabs[0]!.number;
    const mark = wall.edgeLabels.find((l) => l.number === anchorNumber)!;
    // Model side 200's centre is at azimuth 2π·200/256; pattern wall j is centred at 2πj/n.
    const j = Math.round((200 * n) / 256);
    const face = wall.hinge.faces[j]!.polygonMm;
    expect(mark.atMm[0]).toBeGreaterThan(face[0]![0]);
    expect(mark.atMm[0]).toBeLessThan(face[1]![0]);
  });
});
