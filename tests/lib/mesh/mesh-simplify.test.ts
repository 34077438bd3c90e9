import { describe, expect, test } from 'vitest';
import * as THREE from 'three';
import { meshCheck } from '../../../src/lib/mesh/mesh-repair';
import { MESH_SIMPLIFY_MIN_TRIANGLES, meshSimplify } from '../../../src/lib/mesh/mesh-simplify';
import { InputError } from '../../../src/lib/errors';
import type { ParsedMesh } from '../../../src/lib/mesh/mesh-types';
import { geometrySoup, meshVolume, soupMesh, type Soup } from './mesh-fixtures';

/** Welded and checked by the importer's own repair, as meshSimplify expects its input. */
const repaired = (soup: Soup, groups?: string[], triangleGroup?: number[]) =>
  meshCheck(soupMesh(soup, groups, triangleGroup)).mesh;

/** Surface area: the sum of three.js Triangle.getArea over the triangles. */
function area(m: ParsedMesh, group?: number): number {
  let s = 0;
  for (let t = 0; t < m.triangles.length / 3; t++) {
    if (group !== undefined && m.triangleGroup[t] !== group) continue;
    const [a, b, c] = [0, 1, 2].map((k) => new THREE.Vector3().fromArray(m.positions, m.triangles[t * 3 + k]! * 3));
    s += new THREE.Triangle(a, b, c).getArea();
  }
  return s;
}

/** V − E + F, counted here: vertices used, distinct undirected edges, triangles. */
function eulerCharacteristic(m: ParsedMesh): number {
  const used = new Set(m.triangles);
  const edges = new Set<string>();
  for (let t = 0; t < m.triangles.length; t += 3)
    for (let k = 0; k < 3; k++) {
      const a = m.triangles[t + k]!,
        b = m.triangles[t + ((k + 1) % 3)]!;
      edges.add(a < b ? `${a},${b}` : `${b},${a}`);
    }
  return used.size - edges.size + m.triangles.length / 3;
}

/** The error a call answers: an InputError (HTTP 400) whose message matches. */
async function refused(run: () => Promise<unknown>, message: RegExp): Promise<void> {
  const error = await run().then(
    () => null,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(InputError);
  expect((error as InputError).status).toBe(400);
  expect((error as InputError).message).toMatch(message);
}

// three.js BoxGeometry with 8 segments a side: each face an 8 × 8 grid of squares, 768 triangles in all.
const fineCube = () => geometrySoup(new THREE.BoxGeometry(2, 2, 2, 8, 8, 8));

describe('meshSimplify', () => {
  test('a finely split cube reduces to 12 triangles with its volume and area exact, one closed shell', async () => {
    const cube = repaired(fineCube());
    expect(cube.triangles.length / 3).toBe(6 * 8 * 8 * 2);
    const r = await meshSimplify(cube, 12);
    expect(r.trianglesBefore).toBe(768);
    // A cube's six flat square faces need two triangles each (a square splits into two along a diagonal).
    expect(r.trianglesAfter).toBe(12);
    expect(r.mesh.triangles.length / 3).toBe(12);
    // Textbook: a cube of side a has volume a³ and surface area 6a²; here a = 2.
    expect(Math.abs(meshVolume(r.mesh) - 8) / 8).toBeLessThan(1e-9);
    expect(Math.abs(area(r.mesh) - 24) / 24).toBeLessThan(1e-9);
    // Compact: only the cube's 8 corners are left.
    expect(r.mesh.positions.length / 3).toBe(8);
    const check = meshCheck(r.mesh);
    expect(check.problems).toEqual([]);
    expect(check.findings.openBoundaryEdges).toBe(0);
    expect(check.findings.shells).toBe(1);
    expect(check.findings.degenerateTriangles + check.findings.duplicateVerticesMerged).toBe(0);
    // Euler's polyhedron formula: V − E + F = 2 for one closed shell of genus 0 (8 − 18 + 12).
    expect(eulerCharacteristic(r.mesh)).toBe(2);
  });

  test('an icosphere reduced to a quarter of its triangles stays closed and keeps its volume within 2%', async () => {
    // three.js IcosahedronGeometry of detail 15: 20 × 16² = 5,120 triangles, every vertex on the sphere.
    const radius = 50;
    const sphere = repaired(geometrySoup(new THREE.IcosahedronGeometry(radius, 15)));
    expect(sphere.triangles.length / 3).toBe(5120);
    const r = await meshSimplify(sphere, 1280);
    expect(r.trianglesAfter).toBeLessThanOrEqual(1280);
    expect(r.trianglesAfter).toBeGreaterThan(1200);
    const check = meshCheck(r.mesh);
    expect(check.problems).toEqual([]);
    expect(check.findings.openBoundaryEdges).toBe(0);
    expect(eulerCharacteristic(r.mesh)).toBe(2); // Euler's formula for a sphere-like closed surface
    // The simplifier keeps a subset of the vertices (meshoptimizer README: the new index buffer uses the
    // original vertex buffer), so the result is inscribed in the sphere: below the ball's 4/3 πr³ (textbook).
    const before = meshVolume(sphere),
      after = meshVolume(r.mesh);
    expect(after).toBeLessThan((4 / 3) * Math.PI * radius ** 3);
    // Bound: an evenly spread inscribed mesh of F triangles misses about 4π/(√3 F) of the ball's volume
    // (caps of height e²/(6r) over triangles of side e, derived here, not from a source): 0.57% for
    // F = 1,280. The simplifier's triangles are uneven, so allow 2%, about three and a half times that.
    expect(Math.abs(after - before) / before).toBeLessThan(0.02);
    expect(r.relativeError).toBeGreaterThan(0);
    expect(r.relativeError).toBeLessThan(0.02);
  });

  test('targets that cannot work answer InputError, saying what would', async () => {
    const cube = repaired(fineCube());
    const range = /whole number from 4 to 768/;
    expect(MESH_SIMPLIFY_MIN_TRIANGLES).toBe(4);
    await refused(() => meshSimplify(cube, 3), range);
    await refused(() => meshSimplify(cube, 0), range);
    await refused(() => meshSimplify(cube, 12.5), range);
    await refused(() => meshSimplify(cube, Number.NaN), range);
    await refused(() => meshSimplify(cube, 769), range);
    const pair = repaired(geometrySoup(new THREE.BoxGeometry(2, 2, 2)).slice(0, 2)); // one square: 2 triangles
    await refused(() => meshSimplify(pair, 4), /has 2 triangles; only a mesh of at least 4/);
    // The whole count is allowed and changes nothing.
    const same = await meshSimplify(cube, 768);
    expect(same.trianglesAfter).toBe(768);
    expect(same.relativeError).toBe(0);
  });

  test('two parts keep their names, their shared edge and their areas; too few for their borders is refused', async () => {
    // The lid is the +y face; its rim of 4 × 8 = 32 edges is the border between the parts, held in place.
    const soup = fineCube();
    const lid = soup.map((tri) => (tri.every((p) => p[1] === 1) ? 1 : 0));
    const cube = repaired(soup, ['box', 'lid'], lid);
    expect(lid.filter((g) => g === 1).length).toBe(128);
    // A polygon of k corners needs at least k − 2 triangles (textbook triangulation count): the lid,
    // 32 corners, 30; so 12 for the whole cube cannot be met with the rim held.
    await refused(() => meshSimplify(cube, 12), /no fewer than \d+ triangles; ask for between \d+ and 768/);
    const message = await meshSimplify(cube, 12).catch((e: Error) => e.message);
    const least = Number(/no fewer than (\d+)/.exec(String(message))![1]);
    expect(least).toBeGreaterThanOrEqual(30 + 2); // the lid's 30, and the box's floor at least 2
    expect(least).toBeLessThan(768);
    const r = await meshSimplify(cube, least);
    expect(r.trianglesAfter).toBeLessThanOrEqual(least);
    expect(r.mesh.groups).toEqual(['box', 'lid']);
    const lidTriangles = [...r.mesh.triangleGroup.keys()].filter((t) => r.mesh.triangleGroup[t] === 1);
    expect(lidTriangles.length).toBeGreaterThanOrEqual(30); // the k − 2 bound above
    for (const t of lidTriangles)
      for (let k = 0; k < 3; k++) expect(r.mesh.positions[r.mesh.triangles[t * 3 + k]! * 3 + 1]).toBe(1);
    // Textbook: the lid is a 2 × 2 square, area 4; its corners all stay on its plane and its rim is held.
    expect(Math.abs(area(r.mesh, 1) - 4) / 4).toBeLessThan(1e-9);
    const check = meshCheck(r.mesh);
    expect(check.problems).toEqual([]);
    expect(check.findings.openBoundaryEdges).toBe(0);
    expect(eulerCharacteristic(r.mesh)).toBe(2);
    // With the rim held and no face bent, k − 2 again: each wall has 9 rim and 2 floor corners (9 triangles),
    // the floor 2, so the box needs 38 and the lid 30. At 100 only collapses within flat faces are needed: the
    // box keeps the other five faces' area, 5 × 2² = 20, and the solid its volume 2³ (textbook).
    const roomy = await meshSimplify(cube, 100);
    expect(roomy.trianglesAfter).toBeLessThanOrEqual(100);
    expect(Math.abs(area(roomy.mesh, 0) - 20) / 20).toBeLessThan(1e-9);
    expect(Math.abs(area(roomy.mesh, 1) - 4) / 4).toBeLessThan(1e-9);
    expect(Math.abs(meshVolume(roomy.mesh) - 8) / 8).toBeLessThan(1e-9);
  });
});
