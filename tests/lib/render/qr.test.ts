import QRCode from 'qrcode';
import { describe, expect, test } from 'vitest';
import { QR_QUIET_ZONE_MODULES, qrRects, qrRuns } from '../../../src/lib/render/qr';

describe('qrRuns', () => {
  const url = 'https://kitwright.example/kits/abc123';

  test('covers exactly the dark modules of the qrcode package matrix', () => {
    const { modules } = QRCode.create(url, { errorCorrectionLevel: 'M' });
    const { size, runs } = qrRuns(url);
    expect(size).toBe(modules.size);
    const drawn = new Set<number>();
    for (const r of runs) for (let c = r.col; c < r.col + r.length; c++) drawn.add(r.row * size + c);
    let dark = 0;
    for (let i = 0; i < size * size; i++) if (modules.data[i]) dark++;
    expect(drawn.size).toBe(dark);
    for (const i of drawn) expect(modules.data[i]).toBeTruthy();
  });

  test('draws the 7 × 7 finder pattern rings in three corners (ISO/IEC 18004:2015 §6.3.3)', () => {
    const { size, runs } = qrRuns(url);
    const dark = (row: number, col: number) =>
      runs.some((r) => r.row === row && col >= r.col && col < r.col + r.length);
    for (const [r0, c0] of [
      [0, 0],
      [0, size - 7],
      [size - 7, 0],
    ]) {
      for (let i = 0; i < 7; i++) {
        expect(dark(r0!, c0! + i)).toBe(true);
        expect(dark(r0! + 6, c0! + i)).toBe(true);
      }
      expect(dark(r0! + 1, c0! + 1)).toBe(false);
      expect(dark(r0! + 3, c0! + 3)).toBe(true);
    }
  });
});

describe('qrRects', () => {
  test('keeps a quiet zone of four modules inside the box and draws squares of equal module size', () => {
    const box = { xMm: 10, yMm: 20, widthMm: 30, heightMm: 30 };
    const rects = qrRects('https://kitwright.example/k/1', box);
    const module = rects[0]!.heightMm;
    expect(Math.min(...rects.map((r) => r.xMm))).toBeCloseTo(box.xMm + QR_QUIET_ZONE_MODULES * module, 9);
    expect(Math.max(...rects.map((r) => r.xMm + r.widthMm))).toBeCloseTo(
      box.xMm + box.widthMm - QR_QUIET_ZONE_MODULES * module,
      9,
    );
    expect(rects.every((r) => Math.abs(r.heightMm - module) < 1e-12)).toBe(true);
  });
});
