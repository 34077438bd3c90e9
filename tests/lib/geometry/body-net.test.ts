import { describe, expect, test } from 'vitest';
import polygonClipping from 'polygon-clipping';
import { modelPatterns } from '../../../src/lib/geometry/model-patterns';
import { hingeTreeFold } from '../../../src/lib/geometry/hinge-tree';
import type { Piece } from '../../../src/lib/geometry/types';
import { DEMO_IDS, demoModel, model, sub, dot, cross } from './fixtures';

const prism = (sides: number, sizeM: number, heightM: number) =>
  model({ body: { kind: 'prism', sides, across: 'corners', sizeM, heightM } });
const bodyOf = (m: ReturnType<typeof model>, n = 10, gsm = 160) =>
  modelPatterns(m, { scaleDenominator: n, paperGsm: gsm }).pieces.find((p) => p.partKind === 'body')!;
const bodyPieces = (m: ReturnType<typeof model>, n = 10, gsm = 160) =>
  modelPatterns(m, { scaleDenominator: n, paperGsm: gsm }).pieces.filter((p) => p.partKind === 'body');
const clip = (poly: readonly (readonly [number, number])[]) => [[...poly.map((p) => [p[0], p[1]] as [number, number])]];
const areaOf = (mp: ReturnType<typeof polygonClipping.union>) =>
  mp.reduce((s, poly) => s + poly.reduce((t, ring, i) => t + (i === 0 ? 1 : -1) * Math.abs(ringArea(ring)), 0), 0);
const ringArea = (r: [number, number][]) =>
  r.reduce((s, p, i) => s + p[0] * r[(i + 1) % r.length]![1] - r[(i + 1) % r.length]![0] * p[1], 0) / 2;

describe('bodyNet (through modelPatterns)', () => {
  test.each([3, 4, 6, 7, 12, 24])('keeps the surface area of a %i-sided prism', (n) => {
    const R = 1; // across corners 2 m → circumradius 1 m → 100 mm at 1:10
    const pieces = bodyPieces(prism(n, 2 * R, 0.5));
    // CRC Standard Mathematical Tables: regular n-gon area (n/2)·R²·sin(2π/n), side 2R·sin(π/n).
    const Rmm = 100,
      H = 50;
    const expected = 2 * (n / 2) * Rmm ** 2 * Math.sin((2 * Math.PI) / n) + n * 2 * Rmm * Math.sin(Math.PI / n) * H;
    expect(pieces.reduce((s, p) => s + p.faceAreaMm2, 0)).toBeCloseTo(expected, 6);
  });

  test('gives a one-piece net of F faces exactly F − 1 folds between faces', () => {
    for (const n of [3, 6, 8]) {
      // Small enough (50 mm across corners at 1:20) for the one-piece net to fit office paper.
      const piece = bodyOf(prism(n, 1, 0.25), 20);
      // A one-piece net joins its F faces in a tree, and a tree on F vertices has F − 1 edges (from memory:
      // Diestel, Graph Theory, §1.5): F − 1 folds.
      expect(piece.hinge.faces.length).toBe(n + 2);
      expect(piece.hinge.joints.length).toBe(n + 1);
      expect(piece.folds.filter((f) => f.tabNumber === undefined).length).toBe(n + 1);
    }
  });

  test('splits a many-sided body into P pieces whose F faces have F − P folds', () => {
    for (const n of [9, 24]) {
      const pieces = bodyPieces(prism(n, 2, 0.5));
      // A forest of P trees on F nodes has F − P edges (any graph theory text, e.g. Harary, Graph Theory, thm 4.1).
      const faces = pieces.reduce((s, p) => s + p.hinge.faces.length, 0);
      const folds = pieces.reduce((s, p) => s + p.folds.filter((f) => f.tabNumber === undefined).length, 0);
      expect(pieces.map((p) => p.id)).toEqual(['body', 'body-top', 'body-bottom']);
      expect(faces).toBe(n + 2);
      expect(folds).toBe(n + 2 - pieces.length);
    }
  });

  test('folds the teeth of a cap ring into the cap without overlapping one another (polygon-clipping)', () => {
    for (const facets of [9, 24, 64, 256]) {
      const m = model({ body: { kind: 'cylinder', diameterM: 0.5, heightM: 0.15, facets } });
      const [wall, top] = bodyPieces(m, 5);
      const H = wall!.hinge.faces[0]!.polygonMm[2]![1];
      // Teeth per wall the pattern uses: at 1:5 the 64- and 256-facet cylinders are capped (bodyPatternFacets).
      const n = wall!.hinge.faces.length;
      const cap = top!.hinge.faces[0]!.polygonMm.map(
        (p) => [Math.round(p[0] * 1e6) / 1e6, Math.round(p[1] * 1e6) / 1e6] as [number, number],
      );
      // Each tooth folds about its own wall's top edge onto the cap plane: along the edge it keeps x − x_j,
      // away from it it goes toward the cap centre (cap flat = model x, y about the axis).
      const teeth = wall!.hinge.faces.map((f, j) => {
        const [x0, x1] = [f.polygonMm[0]![0], f.polygonMm[1]![0]];
        const [a, b] = [cap[j]!, cap[(j + 1) % n]!];
        const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
        const u = [(b[0] - a[0]) / len, (b[1] - a[1]) / len];
        const inward = [-u[1]!, u[0]!];
        // Wall j's tooth: the tab above its top edge, a tab of its own.
        const tooth = wall!.tabs.find((t) => t.labelAtMm[1] > H && t.labelAtMm[0] > x0 && t.labelAtMm[0] < x1)!;
        const pts = tooth.polygonMm.filter((p) => p[1] > H + 1e-9);
        const base = [[x0, H], [x1, H], ...pts.sort((p, q) => q[0] - p[0])] as [number, number][];
        // Snapped to 1 nm: polygon-clipping fails on corners shared to within rounding (about 1e-13 mm apart).
        const snap = (v: number) => Math.round(v * 1e6) / 1e6;
        return base.map(
          ([x, y]) =>
            [
              snap(a[0] + (x - x0) * u[0]! + (y - H) * inward[0]!),
              snap(a[1] + (x - x0) * u[1]! + (y - H) * inward[1]!),
            ] as [number, number],
        );
      });
      for (let j = 0; j < n; j++) {
        const tooth = teeth[j]!,
          next = teeth[(j + 1) % n]!;
        expect(
          areaOf(polygonClipping.intersection(clip(tooth), clip(next))),
          `${facets}: teeth ${j}, ${j + 1}`,
        ).toBeLessThan(1e-9 * Math.abs(ringArea(tooth)) + 1e-9);
        expect(
          areaOf(polygonClipping.intersection(clip(tooth), clip(cap))),
          `${facets}: tooth ${j} inside the cap`,
        ).toBeCloseTo(Math.abs(ringArea(tooth)), 6);
      }
    }
  });

  test('marks each fold mountain or valley by the side the child face folds to', () => {
    for (const id of DEMO_IDS) {
      for (const piece of modelPatterns(demoModel(id), { scaleDenominator: 20, paperGsm: 120 }).pieces) {
        const folded = new Map(hingeTreeFold(piece.hinge, 0.5).map((f) => [f.id, f.polygonMm]));
        piece.hinge.joints.forEach((j, i) => {
          const p = folded.get(j.parent)!,
            c = folded.get(j.child)!;
          const normal = cross(sub(p[1]!, p[0]!), sub(p[2]!, p[0]!));
          const centroid = c.reduce(
            (s, v) =>
              [s[0] + v[0] / c.length, s[1] + v[1] / c.length, s[2] + v[2] / c.length] as [number, number, number],
            [0, 0, 0] as [number, number, number],
          );
          const side = dot(sub(centroid, p[0]!), normal);
          // Mountain: seen from the printed side the child drops away behind the paper.
          expect(piece.folds[i]!.kind, `${piece.id} joint ${i}`).toBe(side < 0 ? 'mountain' : 'valley');
        });
      }
    }
  });

  test('pairs every tab number with exactly one edge label across the kit', () => {
    for (const id of DEMO_IDS) {
      const pieces = modelPatterns(demoModel(id), { scaleDenominator: 20, paperGsm: 160 }).pieces;
      const tabs = pieces.flatMap((p) => p.tabs.map((t) => t.number)).sort((a, b) => a - b);
      const labels = pieces.flatMap((p) => p.edgeLabels.map((l) => l.number)).sort((a, b) => a - b);
      expect(new Set(tabs).size).toBe(tabs.length);
      expect(labels).toEqual(tabs);
    }
  });

  test('puts a tab on every glued edge pair of a prism: 1 + 2(n − 1) of them', () => {
    for (const n of [3, 5, 8]) expect(bodyOf(prism(n, 1, 0.25), 20).tabs.length).toBe(1 + 2 * (n - 1));
  });

  test('splits the caps off a net too large for office paper, so the strip tiles along its length', () => {
    // At 1:20 the Skein's hexagonal net would be 424 × 285 mm, over the 190 × 259.4 mm A4 and Letter share.
    const pieces = bodyPieces(demoModel('skein-probe'), 20);
    expect(pieces.map((p) => p.id)).toEqual(['body', 'body-top', 'body-bottom']);
    expect(bodyPieces(demoModel('skein-probe'), 50).map((p) => p.id)).toEqual(['body']);
  });

  test('keeps tabs clear of faces and of each other (checked with polygon-clipping)', () => {
    for (const m of [prism(6, 2, 0.5), prism(24, 2, 0.5), demoModel('thermal-puck'), demoModel('wren-3u')]) {
      const piece: Piece = bodyOf(m, 5);
      const polys = [...piece.hinge.faces.map((f) => f.polygonMm), ...piece.tabs.map((t) => t.polygonMm)].filter(
        (p) => p.length >= 3,
      );
      for (let i = 0; i < polys.length; i++) {
        for (let j = i + 1; j < polys.length; j++) {
          const overlap = areaOf(polygonClipping.intersection(clip(polys[i]!), clip(polys[j]!)));
          expect(overlap, `${piece.id} polygons ${i} and ${j}`).toBeLessThan(1e-6);
        }
      }
      // The outline is the union of faces and tabs (reference library's union against ours).
      const union = areaOf(polygonClipping.union(clip(polys[0]!), ...polys.slice(1).map(clip)));
      expect(Math.abs(ringArea(piece.outlineMm.map((p) => [p[0], p[1]])))).toBeCloseTo(union, 4);
    }
  });

  test('gives every glued pair a real tab, even beside a many-sided cap', () => {
    for (const facets of [6, 24, 64, 256]) {
      const piece = bodyOf(model({ body: { kind: 'cylinder', diameterM: 0.5, heightM: 0.15, facets } }), 5);
      for (const t of piece.tabs)
        expect(
          Math.abs(ringArea(t.polygonMm.map((p) => [p[0], p[1]]))),
          `${facets} facets, tab ${t.number}`,
        ).toBeGreaterThan(0);
    }
  });

  test("folds a deployable panel's hinge strip as a valley when the panel stands straight out", () => {
    const panel = modelPatterns(demoModel('wren-3u'), { scaleDenominator: 5, paperGsm: 160 }).pieces.find(
      (p) => p.partKind === 'deployable-panel',
    )!;
    const strip = panel.folds.find((f) => f.tabNumber !== undefined)!;
    expect(strip.kind).toBe('valley');
    expect(strip.angleRad).toBeCloseTo(-Math.PI / 2, 12);
  });

  test('numbers the assembly steps body first, then one step per appendage', () => {
    // At 1:10 the axial booms are 10 mm paper tubes (thinner ones become rods: part-substitutes.ts).
    const pieces = modelPatterns(demoModel('skein-probe'), { scaleDenominator: 10, paperGsm: 160 }).pieces;
    expect(pieces[0]!.partKind).toBe('body');
    // The wall strip and its two caps are one step (types.ts: pieces of one step share a number).
    expect(pieces.map((p) => p.assemblyStep)).toEqual([1, 1, 1, 2, 3, 4, 5, 6, 7, 8]);
    expect(pieces.slice(0, 3).every((p) => p.partKind === 'body')).toBe(true);
  });

  test('widens tabs on heavier paper', () => {
    const light = bodyOf(prism(6, 2, 0.5), 5, 80),
      heavy = bodyOf(prism(6, 2, 0.5), 5, 300);
    const depth = (p: Piece) =>
      Math.max(...p.tabs[0]!.polygonMm.map((v) => Math.abs(v[0] - p.tabs[0]!.polygonMm[0]![0])));
    expect(depth(heavy)).toBeGreaterThan(depth(light));
  });
});
