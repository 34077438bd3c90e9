import { describe, expect, test } from 'vitest';
import * as THREE from 'three';
import polygonClipping, { type MultiPolygon } from 'polygon-clipping';
import { meshPrepare, meshPreparedUnfold } from '../../../src/lib/mesh/mesh-prepare';
import type { Piece, Vec2Mm } from '../../../src/lib/geometry/types';
import { modelMesh } from '../../../src/lib/geometry/model-mesh';
import { stlBinary } from '../../../src/lib/render/stl';
import { demoModel } from '../geometry/fixtures';
import { multiPolygonArea } from '../geometry/multi-polygon-area';
import { CUBE_NETS, freePolyominoes, polyominoCanonical } from './cube-nets';
import { geometrySoup, PLATONIC, spikySoup, starPrismSoup, stlBytes, type Soup } from './mesh-fixtures';

const LARGE_SHEET = { widthMm: 2000, heightMm: 2000 };
const A4_INSIDE = { widthMm: 190, heightMm: 277 };

function unfold(bytes: Uint8Array, pieceMaxMm = A4_INSIDE, name = 'mesh.stl') {
  const prepared = meshPrepare(bytes, name);
  return { prepared, ...meshPreparedUnfold(prepared, { unit: 'mm', scaleDenominator: 1, paperGsm: 160, pieceMaxMm }) };
}

const snap = (x: number) => Math.round(x * 1e6) / 1e6;
const ring = (p: readonly Vec2Mm[]): [number, number][] => p.map((q) => [snap(q[0]), snap(q[1])]);

/**
 * Overlap inside one piece, judged by polygon-clipping (npm registry): the summed area of its faces and tabs
 * less the area of their union. Zero (to rounding) when nothing overlaps.
 */
function overlapAreaMm2(piece: Piece): number {
  const polys = [...piece.hinge.faces.map((f) => f.polygonMm), ...piece.tabs.map((t) => t.polygonMm)];
  const sum = polys.reduce((s, p) => s + multiPolygonArea([[ring(p)]]), 0);
  const union = polygonClipping.union([[ring(polys[0]!)]], ...polys.slice(1).map((p) => [[ring(p)]] as MultiPolygon));
  return sum - multiPolygonArea(union);
}

/**
 * Folds every piece with three.js matrices (rotation about each joint's axis, composed from the root, placed
 * by the root frame) and returns the largest distance from a folded vertex to the nearest mesh vertex.
 */
function foldBackDistanceMm(pieces: Piece[], soup: Soup): number {
  const verts = soup.flat().map((p) => new THREE.Vector3(p[0], p[1], p[2]));
  let worst = 0;
  for (const piece of pieces) {
    const h = piece.hinge;
    const m = new Map<number, THREE.Matrix4>([[h.root, new THREE.Matrix4()]]);
    let grew = true;
    while (grew) {
      grew = false;
      for (const j of h.joints) {
        if (m.has(j.child) || !m.has(j.parent)) continue;
        const a = new THREE.Vector3(j.axisMm[0][0], j.axisMm[0][1], 0);
        const dir = new THREE.Vector3(j.axisMm[1][0], j.axisMm[1][1], 0).sub(a).normalize();
        const local = new THREE.Matrix4()
          .makeTranslation(a.x, a.y, 0)
          .multiply(new THREE.Matrix4().makeRotationAxis(dir, j.angleRad))
          .multiply(new THREE.Matrix4().makeTranslation(-a.x, -a.y, 0));
        m.set(j.child, m.get(j.parent)!.clone().multiply(local));
        grew = true;
      }
    }
    const f = h.rootFrame;
    const x = new THREE.Vector3(...f.xAxis),
      y = new THREE.Vector3(...f.yAxis);
    const frame = new THREE.Matrix4().makeBasis(x, y, x.clone().cross(y)).setPosition(...f.originMm);
    for (const face of h.faces) {
      const world = frame.clone().multiply(m.get(face.id)!);
      for (const [px, py] of face.polygonMm) {
        const p = new THREE.Vector3(px, py, 0).applyMatrix4(world);
        worst = Math.max(worst, Math.min(...verts.map((v) => v.distanceTo(p))));
      }
    }
  }
  return worst;
}

function soupAreaMm2(soup: Soup): number {
  return soup.reduce(
    (s, [a, b, c]) =>
      s + new THREE.Triangle(new THREE.Vector3(...a!), new THREE.Vector3(...b!), new THREE.Vector3(...c!)).getArea(),
    0,
  );
}

const faceArea = (pieces: Piece[]) => pieces.reduce((s, p) => s + p.faceAreaMm2, 0);

describe('the test judges can fail', () => {
  const square = (x: number, y: number): Vec2Mm[] => [
    [x, y],
    [x + 10, y],
    [x + 10, y + 10],
    [x, y + 10],
  ];
  test('overlap area sees two faces on top of each other', () => {
    const piece = {
      hinge: {
        faces: [
          { id: 0, polygonMm: square(0, 0) },
          { id: 1, polygonMm: square(5, 0) },
        ],
      },
      tabs: [],
    };
    expect(overlapAreaMm2(piece as unknown as Piece)).toBeCloseTo(50, 9);
  });
  test('fold-back distance sees a wrong fold angle', () => {
    const soup = geometrySoup(PLATONIC.cube.make());
    const { pieces } = unfold(stlBytes(soup, true), LARGE_SHEET);
    const bent = pieces.map((p) => ({
      ...p,
      hinge: { ...p.hinge, joints: p.hinge.joints.map((j) => ({ ...j, angleRad: j.angleRad * 0.9 })) },
    }));
    expect(foldBackDistanceMm(bent, soup)).toBeGreaterThan(1);
  });
});

describe('the five Platonic solids (three.js geometries)', () => {
  test.each(Object.keys(PLATONIC) as (keyof typeof PLATONIC)[])('%s: counts, area, one piece, no overlap', (name) => {
    const solid = PLATONIC[name];
    const soup = geometrySoup(solid.make());
    const { prepared, pieces } = unfold(stlBytes(soup, true), LARGE_SHEET);
    const faces = prepared.faces;
    const vertices = new Set(faces.flatMap((f) => f.loop));
    const edges = faces.reduce((s, f) => s + f.loop.length, 0) / 2;
    expect([faces.length, edges, vertices.size]).toEqual([solid.F, solid.E, solid.V]);
    // Edge length measured on the mesh; area against the textbook formula for that edge.
    const p = prepared.check.mesh.positions;
    const [i, j] = [faces[0]!.loop[0]! * 3, faces[0]!.loop[1]! * 3];
    const a = Math.hypot(p[i]! - p[j]!, p[i + 1]! - p[j + 1]!, p[i + 2]! - p[j + 2]!);
    expect(faceArea(pieces) / solid.area(a)).toBeCloseTo(1, 5);
    // Every edge unfolding of a Platonic solid is a net (Horiyama & Shoji, "Edge unfoldings of Platonic
    // solids never overlap", CCCG 2011): one piece.
    expect(pieces).toHaveLength(1);
    expect(Math.abs(overlapAreaMm2(pieces[0]!))).toBeLessThan(1e-6);
    expect(foldBackDistanceMm(pieces, soup)).toBeLessThan(1e-3); // float32 STL coordinates
  });

  test('the cube nets found by rolling a die: 35 free hexominoes, 11 of them nets (known counts)', () => {
    expect(freePolyominoes(6)).toHaveLength(35);
    expect(CUBE_NETS.size).toBe(11);
  });

  test('a generated cube net is one of the 11 cube nets', () => {
    const { pieces } = unfold(stlBytes(geometrySoup(PLATONIC.cube.make()), true), LARGE_SHEET);
    const faces = pieces[0]!.hinge.faces;
    const centre = (f: readonly Vec2Mm[]) => [
      f.reduce((s, q) => s + q[0], 0) / f.length,
      f.reduce((s, q) => s + q[1], 0) / f.length,
    ];
    const [p0, p1] = [faces[0]!.polygonMm[0]!, faces[0]!.polygonMm[1]!];
    const edge = Math.hypot(p1[0] - p0[0], p1[1] - p0[1]);
    const ang = Math.atan2(p1[1] - p0[1], p1[0] - p0[0]);
    const cells = faces.map((f) => {
      const [cx, cy] = centre(f.polygonMm);
      const u = (Math.cos(-ang) * cx! - Math.sin(-ang) * cy!) / edge,
        v = (Math.sin(-ang) * cx! + Math.cos(-ang) * cy!) / edge;
      expect(Math.abs(u - 0.5 - Math.round(u - 0.5))).toBeLessThan(1e-6);
      return [Math.round(u - 0.5), Math.round(v - 0.5)] as const;
    });
    expect(CUBE_NETS.has(polyominoCanonical(cells))).toBe(true);
  });
});

describe('harder solids unfold with no overlap and fold back', () => {
  const cases: [string, () => Soup][] = [
    ['an icosphere of 1,280 faces', () => geometrySoup(new THREE.IcosahedronGeometry(60, 7))],
    ['a torus (genus 1)', () => geometrySoup(new THREE.TorusGeometry(50, 20, 16, 32))],
    // 800 steps round the ring turn neighbouring quads 0.45° apart: they stay separate faces.
    ['a finely bent torus of 4,800 triangles', () => geometrySoup(new THREE.TorusGeometry(60, 20, 3, 800))],
    ['a five-pointed star prism (non-convex caps)', () => starPrismSoup()],
    ['a spiky icosahedron (star-shaped, non-convex)', () => spikySoup()],
  ];
  test.each(cases)('%s', (_name, make) => {
    const soup = make();
    const { pieces, summary } = unfold(stlBytes(soup, true));
    for (const piece of pieces) {
      expect(Math.abs(overlapAreaMm2(piece))).toBeLessThan(1e-6);
      const xs = piece.outlineMm.map((q) => q[0]),
        ys = piece.outlineMm.map((q) => q[1]);
      const [w, h] = [Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys)].sort((p, q) => p - q);
      expect(w).toBeLessThanOrEqual(A4_INSIDE.widthMm);
      expect(h).toBeLessThanOrEqual(A4_INSIDE.heightMm);
    }
    expect(faceArea(pieces) / soupAreaMm2(soup)).toBeCloseTo(1, 6);
    const size = Math.max(...soup.flat().flat()) - Math.min(...soup.flat().flat());
    // STL stores float32: folded corners land on the stored vertices within float32 rounding of the size.
    expect(foldBackDistanceMm(pieces, soup) / size).toBeLessThan(1e-6);
    expect(summary.foldBackDeviationMm / size).toBeLessThan(1e-6);
    expect(summary.pieceCount).toBe(pieces.length);
  });
});

test('the engine STL of a demo model round-trips: the pieces cover the mesh area', () => {
  const mesh = modelMesh(demoModel('skein-probe'), 20);
  const soup: Soup = [];
  for (let t = 0; t < mesh.indices.length; t += 3)
    soup.push(
      [0, 1, 2].map((k) => Array.from(mesh.positions.subarray(mesh.indices[t + k]! * 3, mesh.indices[t + k]! * 3 + 3))),
    );
  const { pieces, prepared } = unfold(stlBinary(mesh));
  expect(prepared.check.problems).toEqual([]);
  expect(faceArea(pieces) / soupAreaMm2(soup)).toBeCloseTo(1, 5);
  for (const piece of pieces) expect(Math.abs(overlapAreaMm2(piece))).toBeLessThan(1e-6);
});
