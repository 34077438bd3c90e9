import { describe, expect, test } from 'vitest';
import { modelPatterns } from '../../../src/lib/geometry/model-patterns';
import { modelMesh } from '../../../src/lib/geometry/model-mesh';
import { bodyPatternShape } from '../../../src/lib/geometry/body-pattern-facets';
import { BUILD_GRADE_BAND_DEFAULT } from '../../../src/lib/geometry/buildability';
import { curvedDevelopmentPoint, hingeTreeFold } from '../../../src/lib/geometry/hinge-tree';
import { DEMO_IDS, demoModel, pointTriangleDistance, cross, norm, sub } from './fixtures';

const N = 20;

describe('hingeTreeFold', () => {
  test('keeps the flat piece flat and undistorted at fraction 0', () => {
    const body = modelPatterns(demoModel('skein-probe'), { scaleDenominator: N, paperGsm: 160 }).pieces[0]!;
    const flat = hingeTreeFold(body.hinge, 0);
    const all = flat.flatMap((f) => f.polygonMm);
    const flatAll = body.hinge.faces.flatMap((f) => f.polygonMm);
    for (let i = 1; i < all.length; i += 7) {
      expect(norm(sub(all[i]!, all[0]!))).toBeCloseTo(
        Math.hypot(flatAll[i]![0] - flatAll[0]![0], flatAll[i]![1] - flatAll[0]![1]),
        9,
      );
    }
    const n = cross(sub(all[1]!, all[0]!), sub(all[3]!, all[0]!));
    for (const p of all)
      expect(
        Math.abs((p[0] - all[0]![0]) * n[0] + (p[1] - all[0]![1]) * n[1] + (p[2] - all[0]![2]) * n[2]) / norm(n),
      ).toBeLessThan(1e-9);
  });

  test.each(DEMO_IDS)('folds every flat piece of %s back onto the assembled model', (id) => {
    const m = demoModel(id);
    // Paper folds onto the shape its pattern unfolds (a cylinder's facets may be capped for cutting).
    const mesh = modelMesh({ ...m, body: bodyPatternShape(m.body, N, BUILD_GRADE_BAND_DEFAULT) }, N);
    const tris: [number, number, number][][] = [];
    for (let i = 0; i < mesh.indices.length; i += 3) {
      tris.push(
        [0, 1, 2].map((k) => {
          const j = mesh.indices[i + k]! * 3;
          return [mesh.positions[j]!, mesh.positions[j + 1]!, mesh.positions[j + 2]!] as [number, number, number];
        }),
      );
    }
    const { pieces } = modelPatterns(m, { scaleDenominator: N, paperGsm: 160 });
    let sizeMm = 0;
    for (let i = 0; i < mesh.positions.length; i++) sizeMm = Math.max(sizeMm, Math.abs(mesh.positions[i]!));
    for (const piece of pieces.filter((p) => !p.hinge.curved)) {
      for (const face of hingeTreeFold(piece.hinge, 1)) {
        for (const p of face.polygonMm) {
          const d = Math.min(...tris.map(([a, b, c]) => pointTriangleDistance(p, a!, b!, c!)));
          // 1e-6 of the model's size, plus float32 rounding of the mesh positions (~6e-8 relative).
          expect(d, `${piece.id} face ${face.id}`).toBeLessThan(1e-6 * sizeMm + 1e-7 * sizeMm);
        }
      }
    }
  });

  test('rolls a tube onto a circle of its radius about its axis', () => {
    // At 1:10, where the boom is still a paper tube (thinner ones become rods: part-substitutes.ts).
    const boom = modelPatterns(demoModel('skein-probe'), { scaleDenominator: 10, paperGsm: 160 }).pieces.find(
      (p) => p.id === 'axial-top',
    )!;
    const [face] = hingeTreeFold(boom.hinge, 1);
    // The axial boom stands on the top centre along +z: radius 0.05 m → 5 mm at 1:10; top at 90 mm.
    for (const p of face!.polygonMm) {
      expect(Math.hypot(p[0], p[1])).toBeCloseTo(5, 6);
      expect(p[2]).toBeGreaterThanOrEqual(90 - 1e-9);
      expect(p[2]).toBeLessThanOrEqual(90 + 600 + 1e-9);
    }
  });

  test('keeps rolled lengths along the paper at every fraction', () => {
    const tube = { kind: 'tube' as const, radiusMm: 3, lengthMm: 10 };
    for (const f of [0.25, 0.5, 1]) {
      // Arc length of the rolled edge from x = 0 to x = 1 stays 1: sample two close points.
      const a = curvedDevelopmentPoint(tube, [0.5, 0], f),
        b = curvedDevelopmentPoint(tube, [0.5001, 0], f);
      expect(norm(sub(b, a))).toBeCloseTo(0.0001, 9);
    }
  });

  test('clamps fractions outside 0 to 1 and treats NaN as flat', () => {
    const body = modelPatterns(demoModel('wren-3u'), { scaleDenominator: N, paperGsm: 160 }).pieces[0]!;
    expect(hingeTreeFold(body.hinge, 2)).toEqual(hingeTreeFold(body.hinge, 1));
    expect(hingeTreeFold(body.hinge, Number.NaN)).toEqual(hingeTreeFold(body.hinge, 0));
  });
});
