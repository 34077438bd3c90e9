/**
 * Buildability notes per sheet, checked against sizes worked out by hand from the demo models' dimensions: the
 * Wren is a 3U small satellite, 100 × 100 × 340.5 mm (CubeSat Design Specification), with 100 × 300 mm panels;
 * the Skein's dish is 0.6 m across and its axial booms 6 m long and 0.1 m thick (content/models). Where a mark
 * goes is checked with an even-odd point-in-polygon test written here, on the placed outline.
 */
import { describe, expect, test } from 'vitest';
import type { SheetVec2Mm } from '../../../src/lib/layout/types';
import { buildKit } from '../../../src/lib/kit/build-kit';
import { KitRequestSchema } from '../../../src/lib/kit/kit-request';
import { kitSheetNotes, pieceSpotMm } from '../../../src/lib/kit/sheet-notes';
import { placementApply } from '../../../src/lib/layout/placement';
import { fixtureFonts } from '../../fixtures/pieces/kit-layout';
import { demoModel } from '../geometry/fixtures';

/** US Letter, 8.5 × 11 in at 25.4 mm to the inch (ANSI/ASME Y14.1). */
const LETTER_MM = [8.5 * 25.4, 11 * 25.4] as const;

async function layoutOf(modelId: string, scaleDenominator: number, gradeBand: string) {
  const request = KitRequestSchema.parse({
    model: demoModel(modelId),
    scaleDenominator,
    sheetSizeId: 'letter',
    paperGsm: 160,
    copies: 1,
    units: 'metric',
    gradeBand,
    qrUrl: null,
  });
  return (await buildKit(request, fixtureFonts(), { outputs: [] })).layout;
}

/** Even-odd ray casting (O'Rourke, Computational Geometry in C, §7.4). */
function inside([x, y]: SheetVec2Mm, poly: readonly SheetVec2Mm[]): boolean {
  let odd = false;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const [a, b] = [poly[i]!, poly[j]!];
    if (a[1] > y !== b[1] > y && x < a[0] + ((b[0] - a[0]) * (y - a[1])) / (b[1] - a[1])) odd = !odd;
  }
  return odd;
}

describe('kitSheetNotes', () => {
  test('the Wren at 1:10 for grades K–2: its 10 mm panels and 10 mm faces, marked on the pieces', async () => {
    const layout = await layoutOf('wren-3u', 10, 'K-2');
    const notes = kitSheetNotes(layout);
    expect(notes.bandWords).toBe('grades K–2');
    expect(notes.shortPieces).toBe(3);
    const sheet = notes.sheets[0]!;
    const panel = sheet.find((n) => n.pieceId === 'panel-px')!;
    // 100 mm panel / 10 = 10 mm across and 10 mm wide; K–2 need a 40 mm piece and a 12 mm strip.
    expect(panel.label).toBe('Solar panel +X');
    expect(panel.kind).toBe('shortfall');
    expect(panel.words).toEqual([
      'The piece is 10 mm across; grades K–2 need 40 mm',
      'Its narrowest strip is 10 mm wide; grades K–2 need 12 mm',
    ]);
    // The body's wall folds stand one 100 mm / 10 = 10 mm face apart; K–2 need 15 mm between folds.
    expect(sheet.find((n) => n.pieceId === 'body')!.words).toContain(
      'Two of its folds are 10 mm apart; grades K–2 need 15 mm',
    );
    expect(sheet.map((n) => n.number)).toEqual([1, 2, 3]);
    for (const note of sheet) {
      const placement = layout.sheets[0]!.placements.find((p) => p.pieceId === note.pieceId)!;
      const piece = layout.pieces.find((p) => p.id === note.pieceId)!;
      const outline = piece.outlineMm.map((p) => placementApply(placement, p));
      expect(note.at).toHaveLength(1);
      const mm: SheetVec2Mm = [note.at[0]!.x * LETTER_MM[0], note.at[0]!.y * LETTER_MM[1]];
      expect(inside(mm, outline), `${note.label} mark on its piece`).toBe(true);
    }
  });

  test('names the shallowest tab by its number and its depth measured on the tab', async () => {
    const layout = await layoutOf('wren-3u', 20, '6-8');
    const note = kitSheetNotes(layout)
      .sheets.flat()
      .find((n) => n.pieceId === 'panel-px')!;
    const piece = layout.pieces.find((p) => p.id === 'panel-px')!;
    // Depth by hand: each tab's farthest corner from the fold it hinges on, the shallowest tab kept.
    const depths = piece.tabs.map((t) => {
      const fold = piece.folds.find((f) => f.tabNumber === t.number)!;
      const [a, b] = [fold.fromMm, fold.toMm];
      const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
      const far = Math.max(
        ...t.polygonMm.map((p) => Math.abs((b[0] - a[0]) * (p[1] - a[1]) - (b[1] - a[1]) * (p[0] - a[0])) / len),
      );
      return { number: t.number, far };
    });
    const shallowest = depths.reduce((a, b) => (b.far < a.far ? b : a));
    expect(note.words).toContain(
      `Tab ${shallowest.number} is ${shallowest.far.toFixed(1)} mm deep; grades 6–8 need 5.0 mm`,
    );
  });

  test('the Skein at 1:20 for grades 6–8: no shortfall, the rods noted on their cut gauge', async () => {
    const layout = await layoutOf('skein-probe', 20, '6-8');
    const notes = kitSheetNotes(layout);
    expect(notes.shortPieces).toBe(0);
    const all = notes.sheets.flat();
    expect(all.every((n) => n.kind === 'substitute')).toBe(true);
    // 6 m / 20 = 300 mm long, 0.1 m / 20 = 5 mm thick: thinner than a pencil, a 300 mm skewer is long enough.
    const top = all.find((n) => n.pieceId === 'axial-top')!;
    expect(top.words).toEqual([
      'A bamboo skewer cut to 300 mm (the paper tube would be 5.0 mm thick, thinner than a pencil)',
    ]);
    const sheetIndex = notes.sheets.findIndex((s) => s.includes(top));
    const gauges = layout.sheets[sheetIndex]!.gauges!.filter((g) => g.partId === 'axial-top');
    expect(gauges.length).toBeGreaterThan(0);
    const mm = [top.at[0]!.x * LETTER_MM[0], top.at[0]!.y * LETTER_MM[1]];
    // On the first part's bar: between its ends and within the 12 mm the gauge takes.
    expect(mm[0]).toBeGreaterThan(gauges[0]!.xMm);
    expect(mm[0]).toBeLessThan(gauges[0]!.xMm + gauges[0]!.toMm - gauges[0]!.fromMm);
    expect(mm[1]).toBeGreaterThan(gauges[0]!.yMm);
    expect(mm[1]).toBeLessThan(gauges[0]!.yMm + 12);
  });

  test('the Skein at 1:20 for grades K–2: the 30 mm dish printed flat, short of 40 mm, on one note', async () => {
    const notes = kitSheetNotes(await layoutOf('skein-probe', 20, 'K-2'));
    const dish = notes.sheets.flat().find((n) => n.pieceId === 'dish')!;
    // 0.6 m / 20 = 30 mm: under the 60 mm cone K–2 can roll, and under their 40 mm piece.
    expect(dish.kind).toBe('shortfall');
    expect(dish.words).toEqual([
      'The piece is 30 mm across; grades K–2 need 40 mm',
      'The flat disc on the sheet, 30 mm across (a cone that small is too fine for grades K–2 to roll)',
    ]);
  });

  test('puts the mark of a tiled piece on the part its tile shows', async () => {
    const layout = await layoutOf('wren-3u', 10, 'K-2');
    const body = layout.pieces.find((p) => p.id === 'body')!;
    const pose = { xMm: 100, yMm: 100, rotationRad: 0, mirrored: false };
    const outline = body.outlineMm.map((p) => placementApply(pose, p));
    const xs = outline.map((p) => p[0]);
    const ys = outline.map((p) => p[1]);
    // A tile showing only the right-hand third of the piece's box.
    const x0 = Math.min(...xs) + (2 / 3) * (Math.max(...xs) - Math.min(...xs));
    const windowMm = { xMm: x0, yMm: Math.min(...ys), widthMm: Math.max(...xs) - x0, heightMm: Math.max(...ys) };
    const tile = { row: 0, col: 2, rows: 1, cols: 3, windowMm, overlapMm: 10 };
    const spot = pieceSpotMm({ pieceId: 'body', ...pose, tile }, body);
    expect(spot[0]).toBeGreaterThanOrEqual(x0);
    expect(inside(spot, outline)).toBe(true);
    // Untiled, the mark goes elsewhere on the piece: left of that third.
    const whole = pieceSpotMm({ pieceId: 'body', ...pose }, body);
    expect(inside(whole, outline)).toBe(true);
    expect(whole[0]).toBeLessThan(x0);
  });
});
