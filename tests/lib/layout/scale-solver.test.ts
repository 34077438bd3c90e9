import { describe, expect, test } from 'vitest';
import { solveKitScale, solvePaperScale, pieceAcrossMm } from '../../../src/lib/layout/scale-solver';
import { VENUES, venueCustom } from '../../../src/lib/layout/venues';
import { SHEET_MARGIN_MM, SHEET_SIZES } from '../../../src/lib/layout/sheet-sizes';
import { InputError } from '../../../src/lib/errors';
import { modelPatterns } from '../../../src/lib/geometry/model-patterns';
import { pointsBounds } from '../../../src/lib/geometry/vec';
import { demoModel } from '../geometry/fixtures';

// ASME Y14.1: Letter 8.5 × 11 in; printable area inside the 10 mm margin.
const letter = [8.5 * 25.4 - 2 * SHEET_MARGIN_MM, 11 * 25.4 - 2 * SHEET_MARGIN_MM] as const;

describe('solvePaperScale', () => {
  test('puts the Skein probe at 1:50 on US Letter, the body net deciding', () => {
    const m = demoModel('skein-probe');
    const r = solvePaperScale(m, { sheetId: 'letter', paperGsm: 160 });
    expect(r.scaleDenominator).toBe(50);
    expect(r.tiledPieceIds).toEqual([]);
    // By hand (CRC: side of a regular hexagon with apothem 1.2 m is 2·1.2·tan 30° = 1.3856 m): at 1:25 the
    // six-wall strip alone is 6 · 1385.6 / 25 = 332.6 mm, longer than Letter's printable 259.4 mm.
    expect((6 * 2 * 1200 * Math.tan(Math.PI / 6)) / 25).toBeGreaterThan(letter[1]);
    expect(solvePaperScale(m, { sheetId: 'letter', paperGsm: 160, scaleDenominator: 25 }).tiledPieceIds).toContain(
      'body',
    );
  });

  test('fits every piece of the chosen scale inside the printable area, turned if need be', () => {
    for (const id of ['skein-probe', 'wren-3u', 'thermal-puck']) {
      for (const sheetId of ['a4', 'letter', 'a3'] as const) {
        const r = solvePaperScale(demoModel(id), { sheetId, paperGsm: 160, ratios: 'any' });
        const [pw, ph] = [
          SHEET_SIZES[sheetId].widthMm - 2 * SHEET_MARGIN_MM,
          SHEET_SIZES[sheetId].heightMm - 2 * SHEET_MARGIN_MM,
        ];
        const fits = (n: number) =>
          modelPatterns(demoModel(id), { scaleDenominator: n, paperGsm: 160 }).pieces.every((p) => {
            const b = pointsBounds(p.outlineMm);
            const [w, h] = [b.maxX - b.minX, b.maxY - b.minY];
            return (w <= pw && h <= ph) || (h <= pw && w <= ph);
          });
        expect(fits(r.scaleDenominator), `${id} on ${sheetId}`).toBe(true);
        if (r.scaleDenominator > 1)
          expect(fits(r.scaleDenominator - 1), `${id} on ${sheetId} one step larger`).toBe(false);
      }
    }
  });

  test('refuses a scale that makes a piece smaller than 5 mm and says which ratio works', () => {
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
      /^At 1:500 the .* is \d+(\.\d)? mm across; 1:\d+ is the smallest ratio that keeps every piece above 5 mm/,
    );
    // The ratio it names works, and every piece there is at least 5 mm across.
    const named = Number(/; 1:(\d+)/.exec(message)![1]);
    const r = solvePaperScale(m, { sheetId: 'letter', paperGsm: 160, scaleDenominator: named });
    expect(r.scaleDenominator).toBe(named);
    for (const p of modelPatterns(m, { scaleDenominator: named, paperGsm: 160 }).pieces)
      expect(pieceAcrossMm(p)).toBeGreaterThanOrEqual(5);
  });

  test('lists the pieces to tile at a requested large scale', () => {
    const r = solvePaperScale(demoModel('thermal-puck'), { sheetId: 'a4', paperGsm: 160, scaleDenominator: 1 });
    expect(r.tiledPieceIds).toEqual(['body']);
    expect(r.explanation).toMatch(/split across sheets/);
  });
});

describe('solveKitScale', () => {
  test('finds one scale for paper and football field, and offers a bigger separate boom layout', () => {
    const r = solveKitScale(demoModel('skein-probe'), { sheetId: 'letter', paperGsm: 160 }, VENUES['football-field']);
    expect(r.scaleDenominator).toBe(50);
    expect(r.alternatives[0]!.label).toMatch(/Separate boom layout at 1:2 \(not the kit's scale\)/);
  });

  test('explains why no one scale does both when the venue is too small', () => {
    const r = solveKitScale(
      demoModel('skein-probe'),
      { sheetId: 'letter', paperGsm: 160 },
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
