import { BufferGeometry } from 'three';
import { STLLoader } from 'three/examples/jsm/loaders/STLLoader.js';
import { describe, expect, test } from 'vitest';
import type { ModelMesh } from '../../../src/lib/geometry/types';
import { stlAscii, stlBinary } from '../../../src/lib/render/stl';
import { boxMesh, prismMesh } from '../../fixtures/pieces/meshes';

/** Volume of a closed triangle mesh by the divergence theorem: Σ (a · (b × c)) / 6 over outward triangles. */
function meshVolume(geometry: BufferGeometry): number {
  const p = geometry.getAttribute('position');
  let v = 0;
  for (let i = 0; i < p.count; i += 3) {
    const [ax, ay, az] = [p.getX(i), p.getY(i), p.getZ(i)];
    const [bx, by, bz] = [p.getX(i + 1), p.getY(i + 1), p.getZ(i + 1)];
    const [cx, cy, cz] = [p.getX(i + 2), p.getY(i + 2), p.getZ(i + 2)];
    v += ax * (by * cz - bz * cy) - ay * (bx * cz - bz * cx) + az * (bx * cy - by * cx);
  }
  return v / 6;
}

const toBuffer = (bytes: Uint8Array) =>
  bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer;

describe('stlBinary', () => {
  test('reads back with three STLLoader: 12 triangles and volume w·h·d for a box', () => {
    const mesh = boxMesh(40, 25, 60);
    const bytes = stlBinary(mesh);
    // Binary STL: 80-byte header, uint32 count, 50 bytes per triangle.
    expect(bytes.length).toBe(84 + 50 * 12);
    const geometry = new STLLoader().parse(toBuffer(bytes));
    expect(geometry.getAttribute('position').count / 3).toBe(12);
    // float32 coordinates: relative error ~1e-7.
    expect(meshVolume(geometry)).toBeCloseTo(40 * 25 * 60, 1);
  });

  test('gives a regular n-gon prism the volume (n/2)·R²·sin(2π/n)·h (CRC Standard Mathematical Tables)', () => {
    for (const n of [3, 6, 17, 64]) {
      const [r, h] = [30, 45];
      const geometry = new STLLoader().parse(toBuffer(stlBinary(prismMesh(n, r, h))));
      expect(geometry.getAttribute('position').count / 3).toBe(4 * n - 4);
      const expected = (n / 2) * r * r * Math.sin((2 * Math.PI) / n) * h;
      expect(Math.abs(meshVolume(geometry) - expected) / expected).toBeLessThan(1e-6);
    }
  });

  test('writes a valid empty file for an empty mesh', () => {
    const empty: ModelMesh = { positions: new Float32Array(), indices: new Uint32Array() };
    expect(stlBinary(empty).length).toBe(84);
  });
});

describe('stlAscii', () => {
  test('reads back as the same triangles as the binary file', () => {
    const mesh = prismMesh(6, 20, 10);
    const text = stlAscii(mesh);
    expect(text.startsWith('solid')).toBe(true);
    const geometry = new STLLoader().parse(text);
    expect(geometry.getAttribute('position').count / 3).toBe(20);
    expect(meshVolume(geometry)).toBeCloseTo(3 * 400 * Math.sin(Math.PI / 3) * 10, 1);
  });
});
