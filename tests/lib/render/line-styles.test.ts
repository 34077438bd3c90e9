import { describe, expect, test } from 'vitest';
import { LINE_STYLES } from '../../../src/lib/render/line-styles';

/** WCAG 2.1 relative luminance of an sRGB colour (definition in WCAG 2.1, "relative luminance"). */
function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5]
    .map((i) => parseInt(hex.slice(i, i + 2), 16) / 255)
    .map((c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r! + 0.7152 * g! + 0.0722 * b!;
}

describe('LINE_STYLES', () => {
  test('gives each line kind its own dash pattern, so they differ in greyscale', () => {
    const patterns = Object.values(LINE_STYLES).map((s) => s.dashMm.join(','));
    expect(new Set(patterns).size).toBe(3);
    expect(LINE_STYLES.cut.dashMm).toEqual([]);
  });

  test('contrasts every line with white paper by at least 3:1 (WCAG 2.1 SC 1.4.11 non-text contrast)', () => {
    for (const style of Object.values(LINE_STYLES))
      expect((1 + 0.05) / (luminance(style.color) + 0.05)).toBeGreaterThanOrEqual(3);
  });

  test('keeps dashes long enough to print: every on and off length is at least 0.5 mm', () => {
    // common practice, no source: office printers hold detail of about 0.1 mm, so 0.5 mm dashes stay distinct.
    for (const style of Object.values(LINE_STYLES)) for (const d of style.dashMm) expect(d).toBeGreaterThanOrEqual(0.5);
  });
});
