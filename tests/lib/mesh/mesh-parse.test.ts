import { describe, expect, test } from 'vitest';
import * as THREE from 'three';
import { meshParse, meshFileKind } from '../../../src/lib/mesh/mesh-parse';
import { stlParse } from '../../../src/lib/mesh/mesh-stl';
import { objParse } from '../../../src/lib/mesh/mesh-obj';
import { MESH_TRIANGLES_MAX } from '../../../src/lib/mesh/mesh-limits';
import { InputError } from '../../../src/lib/errors';
import { geometrySoup, objBytes, stlBytes } from './mesh-fixtures';

const enc = (s: string) => new TextEncoder().encode(s);

/** The error a parse throws: an InputError (HTTP 400) whose message matches. */
function refused(run: () => unknown, message: RegExp): void {
  let error: unknown;
  try {
    run();
  } catch (e) {
    error = e;
  }
  expect(error).toBeInstanceOf(InputError);
  expect((error as InputError).status).toBe(400);
  expect((error as InputError).message).toMatch(message);
}

const cube = geometrySoup(new THREE.BoxGeometry(10, 20, 30));

describe('STL', () => {
  // Binary layout (80-byte header, uint32 count, 50 bytes a triangle) and ASCII grammar as written by
  // three.js's STLExporter, a reference writer from the npm registry.
  test.each([true, false])('reads a cube written by three.js (binary %s)', (binary) => {
    const mesh = stlParse(stlBytes(cube, binary));
    expect(mesh.triangles.length / 3).toBe(12);
    const xs = Array.from(mesh.positions.filter((_, i) => i % 3 === 0));
    expect(Math.max(...xs) - Math.min(...xs)).toBeCloseTo(10, 5);
  });

  test('a 0-byte file is refused', () => refused(() => stlParse(new Uint8Array(0)), /empty \(0 bytes\)/));

  test('a truncated binary STL is refused, naming the shortfall', () => {
    const full = stlBytes(cube, true);
    refused(
      () => stlParse(full.subarray(0, full.length - 20)),
      /cut short: its header says 12 triangles \(684 bytes\) but the file has 664/,
    );
    refused(() => stlParse(full.subarray(0, 40)), /shorter than the 84-byte header/);
  });

  test('a triangle count that disagrees with a longer file is refused', () => {
    const full = stlBytes(cube, true);
    const longer = new Uint8Array(full.length + 50);
    longer.set(full);
    refused(() => stlParse(longer), /triangle count \(12, 684 bytes\) disagrees with the file length \(734 bytes\)/);
  });

  test('an ASCII STL with a missing endloop is refused with its line', () => {
    const text = new TextDecoder().decode(stlBytes(cube, false));
    const broken = text.replace(/\n\s*endloop/, '');
    refused(
      () => stlParse(enc(broken)),
      /malformed at line 7: expected "endloop" after three vertices, found "endfacet"/,
    );
  });

  test.each(['nan', 'inf', '-Infinity', '1e999'])('an ASCII coordinate "%s" is refused', (word) => {
    const text = new TextDecoder().decode(stlBytes(cube, false)).replace(/vertex (\S+)/, `vertex ${word}`);
    refused(() => stlParse(enc(text)), new RegExp(`"${word}" that is not a finite number`));
  });

  test('a NaN float in a binary STL is refused', () => {
    const bytes = stlBytes(cube, true).slice();
    new DataView(bytes.buffer).setFloat32(84 + 12 + 4, NaN, true);
    refused(() => stlParse(bytes), /Triangle 1 .* not a finite number \(NaN\)/);
  });

  test('1,000,000 declared triangles are refused by the limit before any triangle is read', () => {
    const bytes = new Uint8Array(84 + 50 * 1_000_000);
    new DataView(bytes.buffer).setUint32(80, 1_000_000, true);
    // The triangles are all zeros; only the header's count can produce this message.
    refused(() => stlParse(bytes), /declares 1,000,000 triangles; the most a kit can take is 100,000/);
  });

  test('an ASCII STL stops at the limit, at the first facet past it', () => {
    const facet = 'facet normal 0 0 1\nouter loop\nvertex 0 0 0\nvertex 1 0 0\nvertex 0 1 0\nendloop\nendfacet\n';
    const text = `solid big\n${facet.repeat(MESH_TRIANGLES_MAX + 1)}endsolid big\n`;
    refused(() => stlParse(enc(text)), /more than 100,000 triangles/);
  });

  test('the whole file is capped at 20 MB before parsing', () => {
    refused(() => meshParse(new Uint8Array(20_000_001), 'stl'), /the most accepted is 20000000 bytes/);
  });
});

describe('OBJ', () => {
  test('reads polygon faces with texture and normal indices, keeping groups as part names', () => {
    const text = [
      'v 0 0 0',
      'v 1 0 0',
      'v 1 1 0',
      'v 0 1 0',
      'v 0 0 1',
      'vt 0 0',
      'vn 0 0 1',
      'g Bus',
      'f 1/1/1 2/1/1 3/1/1 4/1/1',
      'o Mast',
      'f 1//1 2//1 5//1',
    ].join('\n');
    const mesh = objParse(enc(text));
    expect(mesh.triangles.length / 3).toBe(3);
    expect(mesh.groups).toEqual(['Bus', 'Mast']);
    expect(Array.from(mesh.triangleGroup)).toEqual([0, 0, 1]);
  });

  test('negative indices count back from the latest vertex (OBJ relative indices)', () => {
    const absolute = objParse(enc('v 0 0 0\nv 1 0 0\nv 0 1 0\nf 1 2 3\nv 0 0 1\nf 1 2 4'));
    const relative = objParse(enc('v 0 0 0\nv 1 0 0\nv 0 1 0\nf -3 -2 -1\nv 0 0 1\nf -4 -3 -1'));
    expect(Array.from(relative.triangles)).toEqual(Array.from(absolute.triangles));
  });

  test('a face indexing past the vertex list is refused with its line', () =>
    refused(
      () => objParse(enc('v 0 0 0\nv 1 0 0\nv 0 1 0\nf 1 2 9')),
      /Line 4 .* refers to vertex 9, but only 3 vertices/,
    ));

  test('index 0 is refused', () =>
    refused(() => objParse(enc('v 0 0 0\nv 1 0 0\nv 0 1 0\nf 0 1 2')), /vertex index 0/));

  test('NaN coordinates are refused', () =>
    refused(() => objParse(enc('v 0 nan 0\n')), /"nan" that is not a finite number/));

  test('a 0-byte file and a file without faces are refused', () => {
    refused(() => objParse(new Uint8Array(0)), /empty/);
    refused(() => objParse(enc('v 0 0 0\n')), /no faces/);
  });

  test('reads a cube written by three.js OBJExporter', () => {
    expect(objParse(objBytes(cube)).triangles.length / 3).toBe(12);
  });

  test('non-convex polygons are split by ear clipping into triangles of the same total area', () => {
    // An L-shaped hexagon of area 3 (unit squares): a fan from corner 1 would cross outside it.
    const text = 'v 0 0 0\nv 2 0 0\nv 2 1 0\nv 1 1 0\nv 1 2 0\nv 0 2 0\nf 3 4 5 6 1 2';
    const mesh = objParse(enc(text));
    let area = 0;
    for (let t = 0; t < mesh.triangles.length; t += 3) {
      const [a, b, c] = [0, 1, 2].map((k) => mesh.triangles[t + k]! * 3);
      const p = mesh.positions;
      area += ((p[b!]! - p[a!]!) * (p[c! + 1]! - p[a! + 1]!) - (p[b! + 1]! - p[a! + 1]!) * (p[c!]! - p[a!]!)) / 2;
    }
    expect(mesh.triangles.length / 3).toBe(4);
    expect(area).toBeCloseTo(3, 12);
  });

  test('the OBJ limit counts triangles as faces are read', () => {
    const text = `v 0 0 0\nv 1 0 0\nv 0 1 0\n${'f 1 2 3\n'.repeat(MESH_TRIANGLES_MAX + 1)}`;
    refused(() => objParse(enc(text)), /more than 100,000 triangles \(reached at line 100004\)/);
  });
});

test('file kinds by extension', () => {
  expect(meshFileKind('Probe.STL')).toBe('stl');
  expect(meshFileKind('a.obj')).toBe('obj');
  refused(() => meshFileKind('a.ply'), /use a .stl or .obj file/);
});
