/**
 * An imported mesh as the engine's model (src/lib/mesh/mesh-model.ts, mesh-binary.ts): stored bytes read back
 * bit for bit; the model's solid keeps the mesh's volume (a cube of side a holds a³, textbook; the volume is
 * summed by the divergence theorem with three.js vectors in mesh-fixtures.ts); its pieces cover the cube's
 * area 6a² (textbook) once united by polygon-clipping; a model from a request cannot carry a mesh; and content
 * hashes tell two meshes apart by their digest, not by the arrays' text.
 */
import polygonClipping, { type Polygon } from 'polygon-clipping';
import * as THREE from 'three';
import { describe, expect, test } from 'vitest';
import { modelMesh } from '../../../src/lib/geometry/model-mesh';
import { modelPatterns } from '../../../src/lib/geometry/model-patterns';
import { ModelSchema } from '../../../src/lib/geometry/model-schema';
import { contentHash } from '../../../src/lib/kit/content-hash';
import { meshDecode, meshEncode } from '../../../src/lib/mesh/mesh-binary';
import { meshModelOf } from '../../../src/lib/mesh/mesh-model';
import { meshCheck } from '../../../src/lib/mesh/mesh-repair';
import type { MeshShape } from '../../../src/lib/mesh/mesh-types';
import { geometrySoup, meshVolume, soupMesh } from './mesh-fixtures';

const SIDE = 60;
const cube = () => meshCheck(soupMesh(geometrySoup(new THREE.BoxGeometry(SIDE, SIDE, SIDE)), ['Box'])).mesh;
const shape = (digest = 'a'.repeat(64)): MeshShape => ({ digest, unit: 'mm', mesh: cube() });

describe('stored mesh bytes', () => {
  test('read back exactly, part names and all', () => {
    const mesh = meshCheck(
      soupMesh(
        geometrySoup(new THREE.IcosahedronGeometry(1 / 3, 1)),
        ['Ünïcode part', 'Two'],
        [...Array(80)].map((_, i) => i % 2),
      ),
    ).mesh;
    const back = meshDecode(meshEncode(mesh));
    expect(back.positions).toEqual(mesh.positions);
    expect(back.triangles).toEqual(mesh.triangles);
    expect(back.triangleGroup).toEqual(mesh.triangleGroup);
    expect(back.groups).toEqual(mesh.groups);
  });

  test('refuses bytes it did not write', () => {
    expect(() => meshDecode(new Uint8Array(40))).toThrow(/not a stored mesh/);
    const bytes = meshEncode(cube());
    expect(() => meshDecode(bytes.subarray(0, bytes.length - 1))).toThrow(/wrong length/);
  });
});

describe('an imported mesh as a model', () => {
  test('is a box of its size in metres, whose solid is the mesh standing on z = 0', () => {
    const model = meshModelOf(shape(), 'Cube');
    expect(model.body).toEqual({ kind: 'box', widthM: 0.06, depthM: 0.06, heightM: 0.06 });
    const solid = modelMesh(model, 2);
    const zs = [...solid.positions].filter((_, i) => i % 3 === 2);
    expect(Math.min(...zs)).toBeCloseTo(0, 9);
    const volume = meshVolume({
      positions: Float64Array.from(solid.positions),
      triangles: solid.indices,
      triangleGroup: new Uint16Array(solid.indices.length / 3),
      groups: ['x'],
    });
    expect(volume).toBeCloseTo((SIDE / 2) ** 3, 6);
  });

  test('unfolds into pieces that cover the cube once', () => {
    const { pieces, threads, substitutes } = modelPatterns(meshModelOf(shape(), 'Cube'), {
      scaleDenominator: 2,
      paperGsm: 160,
      gradeBand: '6-8',
    });
    expect(threads).toEqual([]);
    expect(substitutes).toEqual([]);
    // A mesh of one part prints the model's name on its pieces, not the file's solid name ("Box").
    for (const p of pieces) expect(p.label).toMatch(/^Cube \d/);
    const faces = pieces.flatMap((p) => p.hinge.faces.map((f) => [f.polygonMm] as Polygon));
    const areaOf = (poly: Polygon) => {
      const r = poly[0]!;
      return (
        Math.abs(r.reduce((a, p, i) => a + p[0] * r[(i + 1) % r.length]![1] - r[(i + 1) % r.length]![0] * p[1], 0)) / 2
      );
    };
    // Per piece, the union of its faces has the faces' summed area (no overlap); all pieces hold 6a².
    for (const piece of pieces) {
      const own = piece.hinge.faces.map((f) => [f.polygonMm] as Polygon);
      const union = polygonClipping.union(own[0]!, ...own.slice(1));
      expect(union.reduce((a, p) => a + areaOf(p), 0)).toBeCloseTo(
        own.reduce((a, p) => a + areaOf(p), 0),
        6,
      );
    }
    expect(faces.reduce((a, p) => a + areaOf(p), 0)).toBeCloseTo(6 * (SIDE / 2) ** 2, 6);
  });

  test('cannot come from a request: JSON holds no typed arrays', () => {
    const sent = JSON.parse(JSON.stringify(meshModelOf(shape(), 'Cube')));
    const parsed = ModelSchema.safeParse(sent);
    expect(parsed.success).toBe(false);
    expect(JSON.stringify(parsed.error?.issues)).toMatch(/upload the file/);
    expect(ModelSchema.safeParse(meshModelOf(shape(), 'Cube')).success).toBe(true);
  });

  test('hashes by its digest: same digest same hash, another digest another hash', async () => {
    const a = await contentHash(meshModelOf(shape('a'.repeat(64)), 'Cube'));
    expect(await contentHash(meshModelOf(shape('a'.repeat(64)), 'Cube'))).toBe(a);
    expect(await contentHash(meshModelOf(shape('b'.repeat(64)), 'Cube'))).not.toBe(a);
  });
});
