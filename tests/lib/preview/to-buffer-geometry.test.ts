import { describe, expect, test } from 'vitest';
import { Box3, type BufferGeometry } from 'three';
import { DEMO_IDS, demoModel } from '../geometry/fixtures';
import { modelPatterns } from '../../../src/lib/geometry/model-patterns';
import { modelMesh, PANEL_MESH_THICKNESS_MM } from '../../../src/lib/geometry/model-mesh';
import { bodyPatternShape } from '../../../src/lib/geometry/body-pattern-facets';
import { BUILD_GRADE_BAND_DEFAULT } from '../../../src/lib/geometry/buildability';
import { CHORD_TOLERANCE_MM } from '../../../src/lib/geometry/paper';
import { polygonArea } from '../../../src/lib/geometry/vec';
import {
  faceTriangles,
  modelMeshGeometry,
  pieceGeometry,
  pieceTabsGeometry,
} from '../../../src/lib/preview/to-buffer-geometry';
import { pieceTabsFold } from '../../../src/lib/preview/tab-fold';
import type { Piece } from '../../../src/lib/geometry/types';

const SCALES = [10, 20];
const FRACTIONS = [0, 0.37, 1];

function triangleAreaSum(g: BufferGeometry): number {
  const pos = g.getAttribute('position');
  const idx = g.getIndex()!;
  let sum = 0;
  for (let i = 0; i < idx.count; i += 3) {
    const [a, b, c] = [idx.getX(i), idx.getX(i + 1), idx.getX(i + 2)].map((k) => [
      pos.getX(k),
      pos.getY(k),
      pos.getZ(k),
    ]) as number[][];
    const u = [b![0]! - a![0]!, b![1]! - a![1]!, b![2]! - a![2]!];
    const v = [c![0]! - a![0]!, c![1]! - a![1]!, c![2]! - a![2]!];
    sum +=
      0.5 * Math.hypot(u[1]! * v[2]! - u[2]! * v[1]!, u[2]! * v[0]! - u[0]! * v[2]!, u[0]! * v[1]! - u[1]! * v[0]!);
  }
  return sum;
}

const kit = (id: string, scale: number): Piece[] =>
  modelPatterns(demoModel(id), { scaleDenominator: scale, paperGsm: 160 }).pieces;
const allPieces = DEMO_IDS.flatMap((id) =>
  SCALES.flatMap((s) => kit(id, s).map((p) => ({ name: `${id} 1:${s} ${p.id}`, piece: p }))),
);
const flatPieces = allPieces.filter(({ piece }) => !piece.hinge.curved);
const curvedPieces = allPieces.filter(({ piece }) => piece.hinge.curved);

describe('faceTriangles', () => {
  test('gives n − 2 counter-clockwise triangles for a convex polygon', () => {
    // A triangulation of a simple n-gon has n − 2 triangles (de Berg et al., Computational Geometry, Thm 3.1).
    const hexagon = Array.from(
      { length: 6 },
      (_, i) => [Math.cos((i * Math.PI) / 3), Math.sin((i * Math.PI) / 3)] as const,
    );
    const tris = faceTriangles(hexagon);
    expect(tris).toHaveLength(4);
    for (const t of tris) expect(polygonArea(t.map((i) => hexagon[i]!))).toBeGreaterThan(0);
  });

  test('returns no triangles for fewer than three points', () => {
    expect(
      faceTriangles([
        [0, 0],
        [1, 0],
      ]),
    ).toEqual([]);
  });

  test('strips a tube between its rulings so no triangle spans more than one step round the tube', () => {
    const tube = curvedPieces.find(({ piece }) => piece.hinge.curved!.kind === 'tube')!.piece;
    const face = tube.hinge.faces[0]!.polygonMm;
    const step = face[1]![0] - face[0]![0];
    for (const t of faceTriangles(face, tube.hinge.curved)) {
      const xs = t.map((i) => face[i]![0]);
      expect(Math.max(...xs) - Math.min(...xs)).toBeLessThanOrEqual(step * (1 + 1e-9));
    }
  });
});

describe('pieceGeometry', () => {
  test.each(allPieces)('keeps one triangle per polygon corner minus two at every fraction: $name', ({ piece }) => {
    const expected = piece.hinge.faces.reduce((s, f) => s + f.polygonMm.length - 2, 0);
    for (const f of FRACTIONS) expect(pieceGeometry(piece, f).surface.getIndex()!.count / 3).toBe(expected);
  });

  test.each(flatPieces)('keeps the face area at every fraction, as a rigid motion must: $name', ({ piece }) => {
    // Float32 positions: relative error ~1e-7 per coordinate, so 1e-6 relative on the area.
    for (const f of FRACTIONS)
      expect(triangleAreaSum(pieceGeometry(piece, f).surface) / piece.faceAreaMm2).toBeCloseTo(1, 6);
  });

  test.each(curvedPieces)('keeps the flat polygon area at fraction 0: $name', ({ piece }) => {
    const flatArea = piece.hinge.faces.reduce((s, f) => s + polygonArea(f.polygonMm), 0);
    expect(triangleAreaSum(pieceGeometry(piece, 0).surface) / flatArea).toBeCloseTo(1, 6);
  });

  test.each(curvedPieces.filter(({ piece }) => piece.hinge.curved!.kind === 'tube'))(
    'rolls a tube into the inscribed regular prism: $name',
    ({ piece }) => {
      const c = piece.hinge.curved as { kind: 'tube'; radiusMm: number; lengthMm: number };
      const n = piece.hinge.faces[0]!.polygonMm.length / 2 - 1;
      // Lateral area of a regular n-gon prism inscribed in radius r: n · 2r·sin(π/n) · L (perimeter × length).
      const expected = n * 2 * c.radiusMm * Math.sin(Math.PI / n) * c.lengthMm;
      expect(triangleAreaSum(pieceGeometry(piece, 1).surface) / expected).toBeCloseTo(1, 5);
    },
  );

  test.each(curvedPieces.filter(({ piece }) => piece.hinge.curved!.kind !== 'tube'))(
    'rolls a cone within the chord loss of its exact lateral area: $name',
    ({ piece }) => {
      const c = piece.hinge.curved as { baseRadiusMm: number; topRadiusMm: number; heightMm: number };
      const slant = Math.hypot(c.baseRadiusMm - c.topRadiusMm, c.heightMm);
      // Frustum lateral area π(R + r)·s (CRC Standard Mathematical Tables, solids); the rim chords cut off
      // segments of at most 2/3 · chord · sagitta each (Archimedes, Quadrature of the Parabola), and the rolled
      // sagitta is the flat one (≤ CHORD_TOLERANCE_MM) divided by sin of the cone's half-angle.
      const exact = Math.PI * (c.baseRadiusMm + c.topRadiusMm) * slant;
      const sinHalf = (c.baseRadiusMm - c.topRadiusMm) / slant;
      const loss = (2 / 3) * 2 * Math.PI * (c.baseRadiusMm + c.topRadiusMm) * (CHORD_TOLERANCE_MM / sinHalf);
      const area = triangleAreaSum(pieceGeometry(piece, 1).surface);
      expect(exact).toBeCloseTo(piece.faceAreaMm2, 6);
      expect(area).toBeLessThanOrEqual(exact);
      expect(area).toBeGreaterThanOrEqual(exact - loss);
    },
  );

  test('draws every face boundary as line segments', () => {
    const body = kit('skein-probe', 20)[0]!;
    const corners = body.hinge.faces.reduce((s, f) => s + f.polygonMm.length, 0);
    expect(pieceGeometry(body, 0.5).edges.getAttribute('position').count).toBe(2 * corners);
  });
});

describe('pieceGeometry folded at 1', () => {
  const box = (gs: BufferGeometry[]) => {
    const b = new Box3();
    for (const g of gs) {
      g.computeBoundingBox();
      b.union(g.boundingBox!);
    }
    return b;
  };
  // The skein probe and the puck: 1e-6 of the box diagonal (Float32 positions). Tube and cone rims are drawn
  // by both with vertices on the axes' extremes, so their boxes agree too. The Wren's panels are 1 mm slabs in
  // the mesh (PANEL_MESH_THICKNESS_MM) but paper in the preview, so its box may differ by that thickness.
  // At 1:10, where every boom is still a paper piece (thinner booms become rods: part-substitutes.ts). Paper
  // folds onto the shape its pattern unfolds: the puck's 24 facets are capped for cutting (body-pattern-facets.ts).
  test.each(DEMO_IDS)('matches the bounding box of modelMesh: %s', (id) => {
    const folded = box(kit(id, 10).map((p) => pieceGeometry(p, 1).surface));
    const m = demoModel(id);
    const mesh = box([
      modelMeshGeometry(modelMesh({ ...m, body: bodyPatternShape(m.body, 10, BUILD_GRADE_BAND_DEFAULT) }, 10)),
    ]);
    const diag = mesh.max.distanceTo(mesh.min);
    const slack = id === 'wren-3u' ? PANEL_MESH_THICKNESS_MM + 1e-6 * diag : 1e-6 * diag;
    for (const axis of ['x', 'y', 'z'] as const) {
      expect(Math.abs(folded.min[axis] - mesh.min[axis])).toBeLessThanOrEqual(slack);
      expect(Math.abs(folded.max[axis] - mesh.max[axis])).toBeLessThanOrEqual(slack);
    }
  });
});

describe('pieceTabsGeometry', () => {
  test.each(flatPieces)('keeps the area of the folded tabs at every fraction: $name', ({ piece }) => {
    const drawn = new Set(pieceTabsFold(piece, 0).map((t) => t.number));
    const flatArea = piece.tabs.filter((t) => drawn.has(t.number)).reduce((s, t) => s + polygonArea(t.polygonMm), 0);
    for (const f of FRACTIONS) {
      const g = pieceTabsGeometry(piece, f);
      if (flatArea === 0) expect(g.getIndex()!.count).toBe(0);
      else expect(triangleAreaSum(g) / flatArea).toBeCloseTo(1, 5);
    }
  });
});

describe('modelMeshGeometry', () => {
  test('keeps every triangle and vertex of the mesh', () => {
    const mesh = modelMesh(demoModel('skein-probe'), 20);
    const g = modelMeshGeometry(mesh);
    expect(g.getIndex()!.count).toBe(mesh.indices.length);
    expect(g.getAttribute('position').count * 3).toBe(mesh.positions.length);
  });
});
