import { describe, expect, test } from 'vitest';
import { cutListRows } from '../../../src/lib/layout/cut-list';
import { sheetPack } from '../../../src/lib/layout/sheet-packer';
import { SHEET_SIZES } from '../../../src/lib/layout/sheet-sizes';
import { rectPiece } from '../../fixtures/pieces/pieces';

describe('cutListRows', () => {
  test('lists each part once with its size, the number of copies and the panels it is on', () => {
    const pieces = [rectPiece('deck', 1000, 600), rectPiece('fin', 300, 200), rectPiece('mast', 3000, 150)];
    const sheets = sheetPack(pieces, { sheetSize: SHEET_SIZES['panel-1220x2440'], units: 'metric', copies: 3 });
    const rows = cutListRows(pieces, sheets);
    expect(rows.map((r) => r.part).sort()).toEqual(['Panel deck', 'Panel fin', 'Panel mast']);
    for (const row of rows) {
      expect(row.quantity).toBe(3);
      const id = row.part.replace('Panel ', '');
      const onSheets = sheets.filter((s) => s.placements.some((p) => p.pieceId === id)).map((s) => s.number);
      expect(row.sheets).toEqual(onSheets);
    }
    const deck = rows.find((r) => r.part === 'Panel deck')!;
    expect([deck.widthMm, deck.heightMm].map((v) => Math.round(v)).sort((a, b) => a - b)).toEqual([600, 1000]);
  });

  test('gives no rows for no sheets', () => {
    expect(cutListRows([rectPiece('a', 10, 10)], [])).toEqual([]);
  });
});
