import { describe, expect, test } from 'vitest';
import * as THREE from 'three';
import { meshCheck } from '../../../src/lib/mesh/mesh-repair';
import { meshPrepare } from '../../../src/lib/mesh/mesh-prepare';
import { InputError } from '../../../src/lib/errors';
import { geometrySoup, meshVolume as volume, soupMesh, stlBytes, type Soup } from './mesh-fixtures';

const cube = () => geometrySoup(new THREE.BoxGeometry(2, 2, 2));
const flip = (tri: number[][]) => [tri[0]!, tri[2]!, tri[1]!];

describe('meshCheck', () => {
  test('a clean cube soup: 36 corners weld into 8 vertices, nothing else to repair', () => {
    const c = meshCheck(soupMesh(cube()));
    expect(c.findings.duplicateVerticesMerged).toBe(36 - 8);
    expect(c.problems).toEqual([]);
    expect(c.findings.shells).toBe(1);
    expect(c.findings.openBoundaryEdges).toBe(0);
    expect(volume(c.mesh)).toBeCloseTo(8, 9); // 2³
  });

  test('one triangle wound against its neighbours is turned; an inside-out cube is turned outward', () => {
    const s = cube();
    s[3] = flip(s[3]!);
    const one = meshCheck(soupMesh(s));
    expect(one.findings.windingFlipped).toBe(1);
    expect(one.repairs).toContain('Turned 1 triangles to wind like their neighbours.');
    expect(volume(one.mesh)).toBeCloseTo(8, 9);
    const inside = meshCheck(soupMesh(cube().map(flip)));
    expect(inside.findings.shellsTurnedOutward).toBe(1);
    expect(volume(inside.mesh)).toBeCloseTo(8, 9);
  });

  test('zero-area and repeated triangles are dropped and said', () => {
    const s = cube();
    s.push(
      [
        [0, 0, 0],
        [1, 1, 1],
        [2, 2, 2],
      ],
      [
        [1, 1, 1],
        [1, 1, 1],
        [0, 0, 0],
      ],
      s[0]!,
    );
    const c = meshCheck(soupMesh(s));
    expect(c.findings.degenerateTriangles).toBe(2);
    expect(c.findings.duplicateTriangles).toBe(1);
    expect(c.mesh.triangles.length / 3).toBe(12);
    expect(c.problems).toEqual([]);
  });

  test('an open box is allowed: its rim is a free paper edge', () => {
    const s = cube().filter((tri) => !tri.every((p) => p[1] === 1)); // drop the two triangles of the +y face
    const c = meshCheck(soupMesh(s));
    expect(c.findings.openBoundaryEdges).toBe(4);
    expect(c.problems).toEqual([]);
  });

  test('an edge shared by three triangles is refused, naming where', () => {
    const book: Soup = [
      [
        [0, 0, 0],
        [0, 0, 1],
        [1, 0, 0],
      ],
      [
        [0, 0, 1],
        [0, 0, 0],
        [-1, 0, 0],
      ],
      [
        [0, 0, 0],
        [0, 0, 1],
        [0, 1, 0],
      ],
    ];
    const c = meshCheck(soupMesh(book));
    expect(c.findings.nonManifoldEdges).toBe(1);
    expect(c.problems[0]!.code).toBe('non_manifold_edge');
    expect(c.problems[0]!.message).toMatch(/edge from \(0, 0, [01]\) to \(0, 0, [01]\) is shared by 3 triangles/);
    const bytes = stlBytes(book, true);
    expect(() => meshPrepare(bytes, 'book.stl')).toThrow(InputError);
    expect(() => meshPrepare(bytes, 'book.stl')).toThrow(/shared by 3 triangles/);
  });

  test('a Möbius strip (one-sided) is refused', () => {
    // A band of 12 quads turned half a twist: the last quad joins the first with its sides swapped.
    const n = 12;
    const pt = (i: number, s: number): number[] => {
      const u = (2 * Math.PI * i) / n;
      const w = s * Math.cos(u / 2) * 0.3,
        h = s * Math.sin(u / 2) * 0.3;
      return [(1 + w) * Math.cos(u), (1 + w) * Math.sin(u), h];
    };
    const soup: Soup = [];
    for (let i = 0; i < n; i++) {
      soup.push([pt(i, -1), pt(i + 1, -1), pt(i + 1, 1)], [pt(i, -1), pt(i + 1, 1), pt(i, 1)]);
    }
    const c = meshCheck(soupMesh(soup));
    expect(c.problems.map((p) => p.code)).toContain('one_sided_surface');
  });

  test('a surface through itself is refused; two shells pushed into each other are only reported', () => {
    const dented = cube().map((tri) => tri.map((p) => (p[0] === 1 && p[1] === 1 && p[2] === 1 ? [0.5, 0.5, -3] : p)));
    const c = meshCheck(soupMesh(dented));
    expect(c.problems.map((p) => p.code)).toContain('self_intersection');
    const two = [...cube(), ...cube().map((tri) => tri.map((p) => [p[0]! + 1, p[1]! + 0.5, p[2]! + 0.25]))];
    const d = meshCheck(soupMesh(two));
    expect(d.findings.shells).toBe(2);
    expect(d.findings.shellsCrossing).toBeGreaterThan(0);
    expect(d.problems).toEqual([]);
  });

  test('two tetrahedra touching at one corner: a non-manifold vertex, counted, two shells', () => {
    const tet = geometrySoup(new THREE.TetrahedronGeometry(1));
    const corner = tet[0]![0]!;
    const other = tet.map((tri) =>
      tri.map((p) => [2 * corner[0]! - p[0]!, 2 * corner[1]! - p[1]!, 2 * corner[2]! - p[2]!]),
    );
    const c = meshCheck(soupMesh([...tet, ...other.map(flip)]));
    expect(c.findings.nonManifoldVertices).toBe(1);
    expect(c.findings.shells).toBe(2);
    expect(c.problems).toEqual([]);
  });
});
