import { describe, expect, test } from 'vitest';
import { coneDevelopment } from '../../../src/lib/geometry/cone-development';
import { modelPatterns } from '../../../src/lib/geometry/model-patterns';
import { hingeTreeFold } from '../../../src/lib/geometry/hinge-tree';
import { CHORD_TOLERANCE_MM } from '../../../src/lib/geometry/paper';
import { polygonArea } from '../../../src/lib/geometry/vec';
import { model, cross, dot, sub, norm } from './fixtures';

describe('coneDevelopment', () => {
  test('develops a 3-4-5 cone as a 216° sector of radius 50', () => {
    // Giesecke et al., Technical Drawing, developments: sector radius L = √(r² + h²), angle 360°·r/L.
    const d = coneDevelopment(30, 0, 40)!;
    expect(d.outerRadiusMm).toBeCloseTo(50, 12);
    expect(d.innerRadiusMm).toBe(0);
    expect((d.sectorAngleRad * 180) / Math.PI).toBeCloseTo(216, 10);
  });

  test('develops a frustum as an annular sector with radii s·R/(R − r) and s·r/(R − r)', () => {
    // R = 40, r = 20, h = 21 → slant s = 29 (20-21-29 triangle): radii 58 and 29, angle 360°·20/29.
    const d = coneDevelopment(40, 20, 21)!;
    expect(d.outerRadiusMm).toBeCloseTo(58, 12);
    expect(d.innerRadiusMm).toBeCloseTo(29, 12);
    expect(d.sectorAngleRad).toBeCloseTo((2 * Math.PI * 20) / 29, 12);
  });

  test('makes each sector arc as long as the circle it rolls into (2πr)', () => {
    for (const [R, r, h] of [
      [30, 0, 40],
      [40, 20, 21],
      [100, 1, 3],
      [5, 4.9, 200],
    ] as const) {
      const d = coneDevelopment(R, r, h)!;
      expect(d.outerRadiusMm * d.sectorAngleRad).toBeCloseTo(2 * Math.PI * R, 9);
      expect(d.innerRadiusMm * d.sectorAngleRad).toBeCloseTo(2 * Math.PI * r, 9);
    }
  });

  test('returns null for degenerate cones', () => {
    expect(coneDevelopment(0, 0, 1)).toBeNull();
    expect(coneDevelopment(1, 2, 1)).toBeNull();
    expect(coneDevelopment(1, 0, 0)).toBeNull();
    expect(coneDevelopment(Number.NaN, 0, 1)).toBeNull();
  });
});

const dishModel = (innerDiameterM?: number) =>
  model({
    body: { kind: 'box', widthM: 1, depthM: 1, heightM: 1 },
    appendages: [
      {
        kind: 'dish',
        id: 'dish',
        label: 'Dish',
        face: 'side:1',
        orientation: { tiltDeg: 20, azimuthDeg: 40 },
        diameterM: 0.6,
        depthM: 0.15,
        ...(innerDiameterM ? { innerDiameterM } : {}),
      },
    ],
  });

describe('conePiece (through modelPatterns)', () => {
  test.each([[undefined], [0.2]])('has the lateral area of its cone or frustum (inner diameter %s)', (inner) => {
    const piece = modelPatterns(dishModel(inner), { scaleDenominator: 10, paperGsm: 160 }).pieces.find(
      (p) => p.id === 'dish',
    )!;
    const [R, r, h] = [30, (inner ?? 0) * 50, 15];
    // CRC Standard Mathematical Tables: frustum lateral area π(R + r)·s (r = 0 for a cone).
    const s = Math.hypot(R - r, h);
    expect(piece.faceAreaMm2).toBeCloseTo(Math.PI * (R + r) * s, 8);
    // The polyline outline loses under chord tolerance × perimeter.
    const poly = polygonArea(piece.hinge.faces[0]!.polygonMm);
    expect(piece.faceAreaMm2 - poly).toBeGreaterThanOrEqual(0);
    expect(piece.faceAreaMm2 - poly).toBeLessThan(CHORD_TOLERANCE_MM * 2 * Math.PI * (R + r) * (R / (R - r) + 1));
  });

  test.each([[undefined], [0.2]])('rolls every outline vertex onto the cone surface (inner diameter %s)', (inner) => {
    const piece = modelPatterns(dishModel(inner), { scaleDenominator: 10, paperGsm: 160 }).pieces.find(
      (p) => p.id === 'dish',
    )!;
    const [face] = hingeTreeFold(piece.hinge, 1);
    const R = 30,
      r = (inner ?? 0) * 50,
      h = 15;
    // Independent geometry: the axis leaves the face of side 1 (+y) tilted 20° toward azimuth 40°.
    const t = (20 * Math.PI) / 180,
      az = (40 * Math.PI) / 180;
    const n = [0, 1, 0] as const,
      u = [-1, 0, 0] as const,
      v = [0, 0, 1] as const;
    const axis = [0, 1, 2].map(
      (i) => Math.cos(t) * n[i]! + Math.sin(t) * (Math.cos(az) * u[i]! + Math.sin(az) * v[i]!),
    ) as [number, number, number];
    const foot = [0, 50, 50] as const;
    const tol = 1e-6 * 60;
    for (const p of face!.polygonMm) {
      const along = dot(sub(p, foot), axis);
      const radial = norm(cross(sub(p, foot), axis));
      expect(along).toBeGreaterThan(-tol);
      expect(along).toBeLessThan(h + tol);
      expect(radial).toBeCloseTo(r + ((R - r) * along) / h, 6);
    }
  });
});
