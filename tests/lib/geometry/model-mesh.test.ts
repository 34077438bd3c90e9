import { describe, expect, test } from 'vitest';
import { modelMesh } from '../../../src/lib/geometry/model-mesh';
import { DEMO_IDS, demoModel, model } from './fixtures';

/** Connected components of a mesh as lists of triangle indices. */
function components(indices: Uint32Array): number[][] {
  const parent = new Map<number, number>();
  const find = (x: number): number => ((parent.get(x) ?? x) === x ? x : find(parent.get(x)!));
  for (let i = 0; i < indices.length; i += 3) {
    const [a, b, c] = [find(indices[i]!), find(indices[i + 1]!), find(indices[i + 2]!)];
    parent.set(b, a);
    parent.set(c, a);
    if (!parent.has(a)) parent.set(a, a);
  }
  const groups = new Map<number, number[]>();
  for (let t = 0; t < indices.length / 3; t++) {
    const r = find(indices[t * 3]!);
    groups.set(r, [...(groups.get(r) ?? []), t]);
  }
  return [...groups.values()];
}

/** Signed volume by the divergence theorem (sum of tetrahedra to the origin). */
function volume(
  pos: Float32Array,
  idx: Uint32Array,
  tris: number[] = Array.from({ length: idx.length / 3 }, (_, i) => i),
): number {
  let v = 0;
  for (const t of tris) {
    const [a, b, c] = [0, 1, 2].map((k) => idx[t * 3 + k]! * 3);
    v +=
      (pos[a!]! * (pos[b! + 1]! * pos[c! + 2]! - pos[b! + 2]! * pos[c! + 1]!) -
        pos[a! + 1]! * (pos[b!]! * pos[c! + 2]! - pos[b! + 2]! * pos[c!]!) +
        pos[a! + 2]! * (pos[b!]! * pos[c! + 1]! - pos[b! + 1]! * pos[c!]!)) /
      6;
  }
  return v;
}

describe('modelMesh', () => {
  test.each(DEMO_IDS)('builds closed, consistently wound parts with V − E + F = 2 (%s)', (id) => {
    const mesh = modelMesh(demoModel(id), 20);
    for (const tris of components(mesh.indices)) {
      const verts = new Set<number>();
      const directed = new Set<string>();
      for (const t of tris) {
        for (let k = 0; k < 3; k++) {
          const a = mesh.indices[t * 3 + k]!,
            b = mesh.indices[t * 3 + ((k + 1) % 3)]!;
          verts.add(a);
          expect(directed.has(`${a}>${b}`)).toBe(false);
          directed.add(`${a}>${b}`);
        }
      }
      // Closed and consistently oriented: every directed edge has its reverse.
      for (const e of directed) expect(directed.has(e.split('>').reverse().join('>'))).toBe(true);
      // Euler's polyhedron formula, V − E + F = 2 for a convex polyhedron (a classical theorem).
      expect(verts.size - directed.size / 2 + tris.length).toBe(2);
      // Counter-clockwise seen from outside: positive volume.
      expect(volume(mesh.positions, mesh.indices, tris)).toBeGreaterThan(0);
    }
  });

  test('gives a prism the volume (n/2)·R²·sin(2π/n)·H', () => {
    const m = model({ body: { kind: 'prism', sides: 7, across: 'corners', sizeM: 2, heightM: 0.5 } });
    const mesh = modelMesh(m, 10);
    // CRC Standard Mathematical Tables: regular n-gon area; float32 positions give ~1e-7 relative error.
    const expected = (7 / 2) * 100 ** 2 * Math.sin((2 * Math.PI) / 7) * 50;
    expect(volume(mesh.positions, mesh.indices) / expected).toBeCloseTo(1, 6);
  });

  test('gives a 3U box the volume 10 × 10 × 34 cm', () => {
    const mesh = modelMesh(model({ body: { kind: 'box', smallsat: '3U' } }), 1);
    expect(volume(mesh.positions, mesh.indices)).toBeCloseTo(100 * 100 * 340, -1);
  });
});
