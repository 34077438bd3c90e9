/**
 * The STL print plate read back as a slicer would: three's STLLoader parses the binary file (a triangle soup),
 * vertices are welded by their exact float32 coordinates, and the mesh is checked against the textbook
 * definition of a closed, orientable 2-manifold surface (e.g. Botsch et al., Polygon Mesh Processing, 2010,
 * §1.3): every edge is shared by exactly two triangles, which run along it in opposite directions (consistent
 * winding), and every connected body has a positive signed volume by the divergence theorem
 * (V = Σ a · (b × c) / 6 over outward triangles), so its normals point out.
 */
import { BufferGeometry } from 'three';
import { STLLoader } from 'three/examples/jsm/loaders/STLLoader.js';
import { describe, expect, test } from 'vitest';
import type { Model } from '../../../src/lib/geometry/model-schema';
import {
  PRINT_BEDS,
  PRINT_BED_IDS,
  printPlate,
  printPlateMesh,
  solvePrintScale,
  type PrintTarget,
} from '../../../src/lib/layout/print-plate';
import { buildKit } from '../../../src/lib/kit/build-kit';
import { KitRequestSchema } from '../../../src/lib/kit/kit-request';
import { stlBinary } from '../../../src/lib/render/stl';
import { fixtureFonts } from '../../fixtures/pieces/kit-layout';
import { boxMesh } from '../../fixtures/pieces/meshes';
import { DEMO_IDS, demoModel, model } from '../geometry/fixtures';

const SCALES = [10, 20, 25, 50] as const;

interface MeshReport {
  triangles: number;
  /** Undirected edges not shared by exactly two triangles. */
  nonManifoldEdges: number;
  /** Directed edges used twice (two neighbours wound the same way). */
  inconsistentEdges: number;
  /** Signed volume of each connected body, mm³. */
  bodyVolumes: number[];
  min: [number, number, number];
  max: [number, number, number];
}

function stlMeshReport(bytes: Uint8Array): MeshReport {
  const geometry: BufferGeometry = new STLLoader().parse(
    bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer,
  );
  const p = geometry.getAttribute('position');
  const ids = new Map<string, number>();
  const points: [number, number, number][] = [];
  const tri: number[] = [];
  for (let i = 0; i < p.count; i++) {
    const v: [number, number, number] = [p.getX(i), p.getY(i), p.getZ(i)];
    const key = v.join(',');
    if (!ids.has(key)) {
      ids.set(key, points.length);
      points.push(v);
    }
    tri.push(ids.get(key)!);
  }
  const directed = new Map<string, number>();
  const undirected = new Map<string, number>();
  const parent = points.map((_, i) => i);
  const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i]!)));
  for (let t = 0; t < tri.length; t += 3) {
    for (let e = 0; e < 3; e++) {
      const [a, b] = [tri[t + e]!, tri[t + ((e + 1) % 3)]!];
      directed.set(`${a}>${b}`, (directed.get(`${a}>${b}`) ?? 0) + 1);
      const key = a < b ? `${a}-${b}` : `${b}-${a}`;
      undirected.set(key, (undirected.get(key) ?? 0) + 1);
      parent[find(a)] = find(b);
    }
  }
  const volumes = new Map<number, number>();
  for (let t = 0; t < tri.length; t += 3) {
    const [a, b, c] = [points[tri[t]!]!, points[tri[t + 1]!]!, points[tri[t + 2]!]!];
    const v =
      a[0] * (b[1] * c[2] - b[2] * c[1]) - a[1] * (b[0] * c[2] - b[2] * c[0]) + a[2] * (b[0] * c[1] - b[1] * c[0]);
    const root = find(tri[t]!);
    volumes.set(root, (volumes.get(root) ?? 0) + v / 6);
  }
  const min: [number, number, number] = [Infinity, Infinity, Infinity];
  const max: [number, number, number] = [-Infinity, -Infinity, -Infinity];
  for (const v of points)
    for (let k = 0; k < 3; k++) {
      min[k] = Math.min(min[k]!, v[k]!);
      max[k] = Math.max(max[k]!, v[k]!);
    }
  return {
    triangles: tri.length / 3,
    nonManifoldEdges: [...undirected.values()].filter((n) => n !== 2).length,
    inconsistentEdges: [...directed.values()].filter((n) => n !== 1).length,
    bodyVolumes: [...volumes.values()],
    min,
    max,
  };
}

const standard: PrintTarget = { bed: PRINT_BEDS.standard, nozzleMm: 0.4 };

describe('the mesh check', () => {
  test('finds the edges of two boxes that meet along a line (shared by 4 triangles) and a flipped triangle', () => {
    // Two unit cubes touching along the edge x = y = 1, z = 0..1 (the way panels once met the Wren's body).
    const cube = boxMesh(1, 1, 1);
    const moved = cube.positions.map((v, i) => (i % 3 === 2 ? v : v + 1));
    const twoCubes = stlMeshReport(
      stlBinary({
        positions: Float32Array.from([...cube.positions, ...moved]),
        indices: Uint32Array.from([...cube.indices, ...[...cube.indices].map((i) => i + 8)]),
      }),
    );
    expect(twoCubes.nonManifoldEdges).toBe(1);
    const good = stlMeshReport(stlBinary(cube));
    expect([good.nonManifoldEdges, good.inconsistentEdges]).toEqual([0, 0]);
    expect(good.bodyVolumes).toHaveLength(1);
    expect(good.bodyVolumes[0]).toBeCloseTo(1, 6);
    const flipped = Uint32Array.from(cube.indices);
    [flipped[1], flipped[2]] = [flipped[2]!, flipped[1]!];
    expect(stlMeshReport(stlBinary({ positions: cube.positions, indices: flipped })).inconsistentEdges).toBeGreaterThan(
      0,
    );
  });
});

describe('printPlate', () => {
  for (const id of DEMO_IDS)
    for (const bedId of PRINT_BED_IDS)
      test(`${id} on the ${bedId} bed: every offered scale gives closed, outward bodies inside the bed`, () => {
        const target: PrintTarget = { bed: PRINT_BEDS[bedId], nozzleMm: 0.4 };
        const m = demoModel(id);
        let offered = 0;
        for (const n of SCALES) {
          let plate;
          try {
            plate = solvePrintScale(m, target, n).plate;
          } catch {
            continue; // the solver offers nothing on this bed at or below this scale
          }
          offered++;
          expect(plate.overflow).toBeNull();
          const r = stlMeshReport(stlBinary(printPlateMesh(plate)));
          const where = `${id} 1:${plate.scaleDenominator} ${bedId}`;
          expect(r.triangles, where).toBeGreaterThan(0);
          expect(r.nonManifoldEdges, where).toBe(0);
          expect(r.inconsistentEdges, where).toBe(0);
          expect(r.bodyVolumes.length, where).toBe(plate.parts.length);
          for (const v of r.bodyVolumes) expect(v, where).toBeGreaterThan(0);
          // On the bed: z from 0, x and y inside its width and depth (float32: 1e-3 mm).
          expect(r.min[2]).toBeCloseTo(0, 3);
          expect(Math.min(r.min[0], r.min[1])).toBeGreaterThanOrEqual(0);
          expect(r.max[0]).toBeLessThanOrEqual(target.bed.widthMm + 1e-3);
          expect(r.max[1]).toBeLessThanOrEqual(target.bed.depthMm + 1e-3);
          expect(r.max[2]).toBeLessThanOrEqual(target.bed.heightMm + 1e-3);
        }
        expect(offered, `${id} ${bedId}`).toBeGreaterThan(0);
      });

  test('makes the Skein probe one body, booms and a hollow dish, and its wire booms thread', () => {
    const plate = printPlate(demoModel('skein-probe'), 50, standard);
    expect(plate.parts.map((p) => p.partId)).toEqual(['body', 'axial-top', 'axial-bottom', 'dish']);
    expect(plate.substitutes.map((s) => s.partId)).toEqual(['wire-px', 'wire-py', 'wire-mx', 'wire-my']);
    // 35 m at 1:50 = 700 mm deployed, plus the 100 mm tie-off allowance of the paper kit.
    expect(plate.substitutes[0]!.instead).toMatch(/^thread, 800 mm/);
    // Body: a hexagonal prism 2.4 m across flats, 0.9 m tall; at 1:50 48 mm across flats, 18 mm tall.
    const body = plate.parts[0]!;
    expect(body.sizeMm[2]).toBeCloseTo(18, 4);
    expect(Math.min(body.sizeMm[0], body.sizeMm[1])).toBeCloseTo(48, 3);
    // The dish is a bowl, not a plug: its volume is well under the solid cone of the same size (π R² h / 3).
    const dish = stlMeshReport(stlBinary(printPlateMesh({ ...plate, parts: [plate.parts[3]!] })));
    const [R, h] = [300 / 50, 150 / 50];
    expect(dish.bodyVolumes[0]!).toBeLessThan(0.8 * ((Math.PI * R * R * h) / 3));
    expect(dish.bodyVolumes[0]!).toBeGreaterThan(0);
  });

  test('gives a boom longer than the bed as a stick cut to its length, keeping the scale', () => {
    // Skein at 1:20: axial booms 6 m → 300 mm, over the 210 mm inside the standard bed; 0.1 m → 5 mm across.
    const plate = printPlate(demoModel('skein-probe'), 20, standard);
    expect(plate.overflow).toBeNull();
    expect(plate.parts.map((p) => p.partId)).toEqual(['body', 'dish']);
    const top = plate.substitutes.find((s) => s.partId === 'axial-top')!;
    expect(top.instead).toBe('a round stick (a bamboo skewer or a drinking straw) about 5.0 mm across, cut to 300 mm');
    expect(plate.substitutes.map((s) => s.step)).toEqual(
      [...plate.substitutes.map((s) => s.step)].sort((a, b) => a - b),
    );
  });

  test('thickens a boom thinner than two nozzle widths and says so', () => {
    const thin: Model = model({
      body: { kind: 'box', widthM: 0.5, depthM: 0.5, heightM: 0.5 },
      appendages: [{ kind: 'rigid-boom', id: 'b', label: 'Thin boom', face: 'top', lengthM: 2, diameterM: 0.01 }],
    });
    const boom = printPlate(thin, 50, standard).parts[1]!;
    // 10 mm at 1:50 = 0.2 mm, under 2 × 0.4 mm: printed 0.8 mm across.
    expect(Math.min(boom.sizeMm[1], boom.sizeMm[2])).toBeGreaterThanOrEqual(0.8 * Math.cos(Math.PI / 8) - 1e-6);
    expect(boom.note).toMatch(/0\.2 mm at this scale, printed 0\.8 mm/);
  });

  test('answers with a smaller scale when the asked one overflows the bed, in words', () => {
    // Skein at 1:10: the hexagonal body is 2.4 m / cos 30° = 2.771 m across corners, 277 mm, over the
    // 210 mm inside the standard bed's 5 mm edge; at 1:20 it is 139 mm and fits.
    const answer = solvePrintScale(demoModel('skein-probe'), standard, 10);
    expect(answer.plate.scaleDenominator).toBe(20);
    expect(answer.explanation).toMatch(/^At 1:10 the Body is 277 mm long, over the bed's 210 mm/);
    expect(() =>
      solvePrintScale(demoModel('skein-probe'), { bed: { widthMm: 10, depthMm: 10, heightMm: 10 }, nozzleMm: 0.4 }),
    ).toThrow(/choose a larger print bed/);
  });
});

describe('the kit STL', () => {
  const base = { scaleDenominator: 20, sheetSizeId: 'letter', qrUrl: null };
  test.each(DEMO_IDS)('%s: the kit build writes the plate its JSON describes, closed and on the bed', async (id) => {
    for (const scaleDenominator of SCALES) {
      const request = KitRequestSchema.parse({
        ...base,
        model: demoModel(id),
        scaleDenominator,
        print: { bed: { kind: 'custom', widthMm: 200, depthMm: 150, heightMm: 180 }, nozzleMm: 0.6 },
      });
      const kit = await buildKit(request, fixtureFonts(), { outputs: ['stl', 'json'] });
      const r = stlMeshReport(kit.stl!);
      expect([r.nonManifoldEdges, r.inconsistentEdges], `${id} 1:${scaleDenominator}`).toEqual([0, 0]);
      expect(r.bodyVolumes.every((v) => v > 0)).toBe(true);
      expect(r.bodyVolumes).toHaveLength(kit.print!.parts.length);
      expect(r.max[0]).toBeLessThanOrEqual(200 + 1e-3);
      expect(r.max[1]).toBeLessThanOrEqual(150 + 1e-3);
      expect(r.max[2]).toBeLessThanOrEqual(180 + 1e-3);
      expect(JSON.parse(kit.json!).print.scaleDenominator).toBe(kit.print!.scaleDenominator);
      expect(kit.print!.explanation).toMatch(/2 × the 0\.6 mm nozzle/);
    }
  });

  test('takes the standard bed and a 0.4 mm nozzle when the request names none, and refuses bad targets', () => {
    const ok = KitRequestSchema.parse({ ...base, model: demoModel('wren-3u') });
    expect(ok.print).toEqual({ bed: { kind: 'preset', id: 'standard' }, nozzleMm: 0.4 });
    const bad = (print: unknown) => KitRequestSchema.safeParse({ ...base, model: demoModel('wren-3u'), print });
    expect(bad({ bed: { kind: 'preset', id: 'huge' }, nozzleMm: 0.4 }).success).toBe(false);
    expect(bad({ bed: { kind: 'preset', id: 'small' }, nozzleMm: 0.3 }).error!.issues[0]!.message).toMatch(
      /nozzle must be one of 0\.25, 0\.4, 0\.6, 0\.8 mm/,
    );
    expect(
      bad({ bed: { kind: 'custom', widthMm: 20, depthMm: 200, heightMm: 200 }, nozzleMm: 0.4 }).error!.issues[0]!
        .message,
    ).toMatch(/bed width must be at least 50 mm/);
  });
});
