import { describe, expect, test } from 'vitest';
import { solveKitScale, solvePaperScale } from '../../../src/lib/layout/scale-solver';
import {
  buildabilityShortfalls,
  convexHull,
  pieceAcrossMm,
  pieceTabDepthMm,
} from '../../../src/lib/geometry/buildability';
import { tabFit } from '../../../src/lib/geometry/tab-fit';
import { vec2Add, vec2Scale, vec2Sub, vec2Unit } from '../../../src/lib/geometry/vec';
import { sheetPack } from '../../../src/lib/layout/sheet-packer';
import { VENUES, venueCustom } from '../../../src/lib/layout/venues';
import { SHEET_MARGIN_MM, SHEET_SIZES } from '../../../src/lib/layout/sheet-sizes';
import { InputError } from '../../../src/lib/errors';
import { modelPatterns } from '../../../src/lib/geometry/model-patterns';
import { demoModel } from '../geometry/fixtures';
import { ModelSchema } from '../../../src/lib/geometry/model-schema';
import type { Piece, Vec2Mm } from '../../../src/lib/geometry/types';

// ASME Y14.1: Letter 8.5 × 11 in; printable area inside the 10 mm margin.
const letter = [8.5 * 25.4 - 2 * SHEET_MARGIN_MM, 11 * 25.4 - 2 * SHEET_MARGIN_MM] as const;

describe('solvePaperScale', () => {
  test('puts the Skein probe at 1:50 on US Letter for adults, the body net deciding', () => {
    const m = demoModel('skein-probe');
    const r = solvePaperScale(m, { sheetId: 'letter', paperGsm: 160, gradeBand: 'adult' });
    expect(r.scaleDenominator).toBe(50);
    expect(r.sheetCount).toBe(1);
    expect(r.tiledPieceIds).toEqual([]);
    // CRC Handbook (regular polygons): the side of a regular hexagon with apothem 1.2 m (2.4 m across the
    // flats, the model file) is 2·1.2·tan 30° = 1.3856 m, so at 1:25 the six-wall strip is 6 · 1385.6 / 25 =
    // 332.6 mm long and 900 / 25 = 36 mm tall. Measured on the strip the engine lays out: the long side of
    // its walls' outline (convex hull, collinear corners dropped) and its narrowest width.
    const wall = modelPatterns(m, { scaleDenominator: 25, paperGsm: 160 }).pieces.find((p) => p.id === 'body')!;
    expect(wall.hinge.faces).toHaveLength(6);
    const outline = convexHull(wall.hinge.faces.flatMap((f) => f.polygonMm));
    const sides = outline.map((p, i) => Math.hypot(...vec2Sub(outline[(i + 1) % outline.length]!, p)));
    const stripMm = (6 * 2 * 1200 * Math.tan(Math.PI / 6)) / 25;
    expect(Math.max(...sides)).toBeCloseTo(stripMm, 6);
    expect(pieceAcrossMm(wall)).toBeCloseTo(900 / 25, 6);
    // Longer than Letter's printable 259.4 mm: the solver cuts it at a fold into parts that fit (issue 10,
    // item 5), so nothing is tiled.
    expect(Math.max(...sides)).toBeGreaterThan(letter[1]);
    expect(solvePaperScale(m, { sheetId: 'letter', paperGsm: 160, scaleDenominator: 25 }).tiledPieceIds).toEqual([]);
  });

  test('ranks buildability first: grades 6–8 get the Wren at 1:5, not the one-sheet 1:10 with 10 mm panels', () => {
    const r = solvePaperScale(demoModel('wren-3u'), { sheetId: 'letter', paperGsm: 160, gradeBand: '6-8' });
    expect(r.scaleDenominator).toBe(5);
    expect(r.shortfalls).toEqual([]);
    // Wren's panels are 0.1 m wide (its model file): 100 / 5 = 20 mm and 100 / 10 = 10 mm.
    expect(r.explanation).toMatch(/^1:5 on one US Letter sheet: the smallest piece is 20 mm, right for grades 6–8\./);
    expect(r.explanation).toMatch(/1:10 .*Solar panel .* would be 10 mm across \(grades 6–8 need 15 mm\)/);
  });

  test('ranks sheet count second: a larger model on more sheets when the smaller one is not buildable', () => {
    // K–2 need 40 mm pieces: Wren's 0.1 m panels pass at 1:2 (50 mm) only, over more than one sheet.
    const r = solvePaperScale(demoModel('wren-3u'), { sheetId: 'letter', paperGsm: 160, gradeBand: 'K-2' });
    expect(r.scaleDenominator).toBe(2);
    expect(r.sheetCount).toBeGreaterThan(1);
    expect(r.explanation).toMatch(
      /^1:2 on \d+ US Letter sheets: .* right for grades K–2\. 1:5 fits one US Letter sheet, but/,
    );
  });

  test.each([
    ['wren-3u', '6-8'],
    ['thermal-puck', '6-8'],
    ['wren-3u', '9-12'],
    ['thermal-puck', 'adult'],
  ] as const)(
    'with any ratio, gives the %s for %s the largest model among the buildable scales on fewest sheets',
    (id, band) => {
      const m = demoModel(id);
      const r = solvePaperScale(m, { sheetId: 'a4', paperGsm: 160, ratios: 'any', gradeBand: band });
      const patterns = (n: number) => modelPatterns(m, { scaleDenominator: n, paperGsm: 160, gradeBand: band });
      const pieces = (n: number) => patterns(n).pieces;
      const sheets = (n: number) =>
        sheetPack(pieces(n), {
          sheetSize: SHEET_SIZES.a4,
          units: 'metric',
          copies: 1,
          substitutes: patterns(n).substitutes,
        }).length;
      // Measured independently of the solver: the chosen scale is buildable, the next smaller one is not, and
      // the next larger one needs more sheets.
      expect(buildabilityShortfalls(pieces(r.scaleDenominator), band)).toEqual([]);
      expect(buildabilityShortfalls(pieces(r.buildableDenominator! + 1), band).length).toBeGreaterThan(0);
      expect(r.sheetCount).toBe(sheets(r.scaleDenominator));
      expect(r.sheetCount).toBe(sheets(r.buildableDenominator!));
      if (r.scaleDenominator > 1) expect(sheets(r.scaleDenominator - 1)).toBeGreaterThan(r.sheetCount!);
    },
  );

  test('refuses a scale that makes a piece smaller than the 5 mm floor and says which ratio works', () => {
    const m = demoModel('skein-probe');
    let error: unknown;
    try {
      solvePaperScale(m, { sheetId: 'letter', paperGsm: 160, scaleDenominator: 500 });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(InputError);
    const message = (error as InputError).message;
    expect(message).toMatch(
      /^At 1:500 the .* would be \d+(\.\d)? mm across \(adults need 5\.0 mm\); 1:\d+ is the smallest ratio at which every piece can be cut and glued/,
    );
    // The ratio it names works, and every piece there is at least 5 mm across.
    const named = Number(/; 1:(\d+)/.exec(message)![1]);
    const r = solvePaperScale(m, { sheetId: 'letter', paperGsm: 160, scaleDenominator: named });
    expect(r.scaleDenominator).toBe(named);
    for (const p of modelPatterns(m, { scaleDenominator: named, paperGsm: 160 }).pieces)
      expect(pieceAcrossMm(p)).toBeGreaterThanOrEqual(5);
  });

  test('lists the pieces no fold can cut, to tile at a requested large scale', () => {
    const r = solvePaperScale(demoModel('thermal-puck'), { sheetId: 'a4', paperGsm: 160, scaleDenominator: 1 });
    // At 1:1 the wall strip is π·500 mm long and each cap 500 mm across, all over A4's 190 × 277 mm printable
    // area: the strip is cut at its folds into parts, the caps (one flat face each) are tiled.
    expect(r.tiledPieceIds).toEqual(['body-top', 'body-bottom']);
    expect(r.explanation).toMatch(/no fold to cut it at .* printed in tiles across sheets/);
  });
});

describe('pieceTabDepthMm', () => {
  /** The shallowest reach of a folded tab's free corners from its fold line, mm (measured, not the stated depth). */
  const foldedTabReachMm = (piece: Piece, number: number): number | null => {
    const fold = piece.folds.find((f) => f.tabNumber === number);
    const tab = piece.tabs.find((t) => t.number === number)!;
    if (!fold) return null;
    const [a, b] = [fold.fromMm, fold.toMm];
    const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
    const reach = tab.polygonMm.map(
      (p) => Math.abs((b[0] - a[0]) * (p[1] - a[1]) - (b[1] - a[1]) * (p[0] - a[0])) / len,
    );
    return Math.min(...reach.filter((r) => r > 1e-6));
  };
  const cylinder = (facets: number) =>
    ModelSchema.parse({
      schemaVersion: 1,
      name: `Cylinder ${facets}`,
      body: { kind: 'cylinder', diameterM: 0.5, heightM: 0.3, facets },
      appendages: [],
    });
  const cases = [
    ...['skein-probe', 'wren-3u', 'thermal-puck'].map((id) => [id, demoModel(id)] as const),
    ...[16, 64, 256].map((f) => [`cylinder ${f}`, cylinder(f)] as const),
  ];

  test.each(cases)('keeps every tab of the %s at least 3 mm deep as cut at the chosen scale', (name, m) => {
    for (const sheetId of ['letter', 'a4'] as const) {
      const { scaleDenominator } = solvePaperScale(m, { sheetId, paperGsm: 160 });
      for (const piece of modelPatterns(m, { scaleDenominator, paperGsm: 160 }).pieces) {
        // The buildability floor's tab (buildability.ts, common practice): a fingertip can press a 3 mm flap.
        expect(pieceTabDepthMm(piece), `${name} 1:${scaleDenominator} ${piece.id}`).toBeGreaterThanOrEqual(3);
        for (const t of piece.tabs) {
          const reach = foldedTabReachMm(piece, t.number);
          // Measured from the drawn polygon, so a stated depth cannot hide a trimmed tab (1 µm rounding).
          if (reach !== null) expect(reach, `${name} ${piece.id} tab ${t.number}`).toBeGreaterThanOrEqual(3 - 1e-3);
          if (reach !== null && t.depthMm !== undefined) expect(reach).toBeCloseTo(t.depthMm, 6);
        }
      }
    }
  });

  test('measures the trimmed depth, so a crowded tab is refused at a scale where the untrimmed one passes', () => {
    // A 12-gon's hinged cap used to crowd the tabs beside its hinge wall to a wedge of 30°. Here a neighbour
    // 1.7 mm out from a wall tab's edge, along all of it, crowds that tab; the engine's fitter trims it.
    const wall = modelPatterns(cylinder(16), { scaleDenominator: 5, paperGsm: 160 }).pieces[0]!;
    expect(buildabilityShortfalls([wall], 'adult')).toEqual([]);
    const tab = wall.tabs[1]!;
    // A fitted tab is [b, a, a', b'] on edge a→b, outside to its right (tab-fit.ts).
    const [b, a] = tab.polygonMm as [Vec2Mm, Vec2Mm];
    const along = vec2Unit(vec2Sub(b, a));
    const out: Vec2Mm = [along[1], -along[0]];
    const at = (p: Vec2Mm, outMm: number, alongMm: number) =>
      vec2Add(vec2Add(p, vec2Scale(out, outMm)), vec2Scale(along, alongMm));
    const neighbour = [at(b, 1.7, 10), at(a, 1.7, -10), at(a, 20, -10), at(b, 20, 10)];
    const fitted = tabFit(a, b, tab.depthMm!, [neighbour]);
    const crowded = {
      ...wall,
      tabs: wall.tabs.map((t, i) => (i === 1 ? { ...t, polygonMm: fitted.polygonMm, depthMm: fitted.depthMm } : t)),
    };
    // Measured from the drawn polygon, the trimmed tab reaches the neighbour (to the fitter's 16 bisection
    // steps), and the piece's tab depth is that trimmed depth, stated or read off the polygon alike.
    expect(foldedTabReachMm(crowded, tab.number)).toBeCloseTo(1.7, 3);
    expect(pieceTabDepthMm(crowded)).toBeCloseTo(foldedTabReachMm(crowded, tab.number)!, 6);
    const unstated = crowded.tabs.map(({ depthMm: _stated, ...t }) => t);
    expect(pieceTabDepthMm({ tabs: unstated })).toBeCloseTo(1.7, 3);
    // So the adult floor (a 3 mm tab) refuses the crowded piece, naming the tab depth it measured.
    const shortfalls = buildabilityShortfalls([crowded], 'adult');
    expect(shortfalls).toEqual([expect.objectContaining({ pieceId: wall.id, what: 'tabMm', minimumMm: 3 })]);
    expect(shortfalls[0]!.measuredMm).toBeCloseTo(1.7, 3);
  });
});

describe('solveKitScale', () => {
  test('finds one scale for paper and football field, and offers a bigger separate boom layout', () => {
    const r = solveKitScale(
      demoModel('skein-probe'),
      { sheetId: 'letter', paperGsm: 160, gradeBand: 'adult' },
      VENUES['football-field'],
    );
    expect(r.scaleDenominator).toBe(50);
    expect(r.alternatives[0]!.label).toMatch(/Separate boom layout at 1:2 \(not the kit's scale\)/);
  });

  test('explains why no one scale does both when the venue is too small', () => {
    const r = solveKitScale(
      demoModel('skein-probe'),
      { sheetId: 'letter', paperGsm: 160, gradeBand: 'adult' },
      venueCustom({ lengthM: 0.2, widthM: 0.2 }),
    );
    expect(r.scaleDenominator).toBeNull();
    expect(r.explanation).toMatch(/^No one scale does both/);
    expect(r.alternatives.map((a) => a.label)).toEqual([
      'Paper model at 1:50',
      expect.stringMatching(/^Separate boom layout at 1:\d+ \(not the paper model's scale\)$/),
    ]);
  });
});
