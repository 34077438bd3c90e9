import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, test } from 'vitest';
import { cmapGlyphs, tableOffsets } from '../../../scripts/font-widths';
import { LINE_STYLES } from '../../../src/lib/render/line-styles';
import { sheetScene } from '../../../src/lib/render/sheet-scene';
import { fixtureKit } from '../../fixtures/pieces/kit-layout';

/**
 * Code points in a TrueType font's cmap, read by the parser of the OpenType spec (Microsoft OpenType 1.9,
 * "cmap", formats 4 and 12) that scripts/font-widths.ts uses, independent of fontTools.
 */
function cmapCodePoints(bytes: Uint8Array): Set<number> {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const cmap = tableOffsets(view).get('cmap');
  if (cmap === undefined) throw new Error('no cmap');
  return new Set(cmapGlyphs(view, cmap).keys());
}

/** Windows-platform (3, 1) strings of the OpenType 'name' table by name ID (OpenType 1.9, "name"). */
function fontNames(bytes: Uint8Array): Map<number, string> {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  let table = -1;
  for (let i = 0; i < view.getUint16(4); i++) {
    const rec = 12 + 16 * i;
    if (String.fromCharCode(...bytes.subarray(rec, rec + 4)) === 'name') table = view.getUint32(rec + 8);
  }
  const out = new Map<number, string>();
  const count = view.getUint16(table + 2);
  const strings = table + view.getUint16(table + 4);
  for (let i = 0; i < count; i++) {
    const r = table + 6 + 12 * i;
    if (view.getUint16(r) !== 3 || view.getUint16(r + 2) !== 1) continue;
    const length = view.getUint16(r + 8);
    const offset = strings + view.getUint16(r + 10);
    out.set(view.getUint16(r + 6), new TextDecoder('utf-16be').decode(bytes.subarray(offset, offset + length)));
  }
  return out;
}

const font = (name: string) =>
  new Uint8Array(readFileSync(fileURLToPath(new URL(`../../../assets/fonts/${name}`, import.meta.url))));

describe('KitwrightSans subset', () => {
  const regular = cmapCodePoints(font('KitwrightSans-Regular.ttf'));
  const bold = cmapCodePoints(font('KitwrightSans-Bold.ttf'));

  test('maps every character the kit renderer prints on any sheet (metric and US, tiles, legend, QR caption, preview note)', () => {
    const printed = new Set<string>();
    for (const units of ['metric', 'us'] as const) {
      const saved = fixtureKit('letter', units);
      for (const kit of [saved, { ...saved, qrUrl: null }])
        for (const sheet of kit.sheets)
          for (const t of sheetScene(kit, sheet).texts) for (const ch of t.text) printed.add(ch);
    }
    for (const style of Object.values(LINE_STYLES)) for (const ch of style.label + style.action) printed.add(ch);
    const missing = [...printed].filter((ch) => !regular.has(ch.codePointAt(0)!) || !bold.has(ch.codePointAt(0)!));
    expect(missing).toEqual([]);
  });

  test('keeps the promised symbols: arrows, check marks, degree, times, plus-minus, micro, fractions, dashes', () => {
    for (const ch of '→←↑↓✓✗°×±µ²³½¼¾–—•…') {
      expect(regular.has(ch.codePointAt(0)!), ch).toBe(true);
      expect(bold.has(ch.codePointAt(0)!), ch).toBe(true);
    }
    for (let c = 0x20; c < 0x7f; c++) expect(regular.has(c)).toBe(true);
  });

  test('is renamed away from the Bitstream Vera names, as its licence asks (name IDs 1, 4, 6, 16)', () => {
    for (const file of ['KitwrightSans-Regular.ttf', 'KitwrightSans-Bold.ttf']) {
      const names = fontNames(font(file));
      expect(names.get(1)).toBe('KitwrightSans');
      for (const id of [1, 4, 6, 16]) expect(names.get(id) ?? '').not.toMatch(/Vera|Bitstream|DejaVu/);
    }
  });
});
