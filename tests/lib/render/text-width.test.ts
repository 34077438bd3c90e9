import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { jsPDF } from 'jspdf';
import { describe, expect, test } from 'vitest';
import { TEXT_WIDTH_REGULAR } from '../../../src/lib/render/text-width-table';
import { textWidthEm, textWidthMm } from '../../../src/lib/render/text-width';

const fontFile = (name: string) =>
  readFileSync(fileURLToPath(new URL(`../../../assets/fonts/${name}`, import.meta.url))).toString('base64');

describe('textWidthEm', () => {
  // Reference: jspdf's own TTF parser measuring the same shipped font (getStringUnitWidth, in em).
  const doc = new jsPDF({ unit: 'mm' });
  doc.addFileToVFS('r.ttf', fontFile('KitwrightSans-Regular.ttf'));
  doc.addFont('r.ttf', 'Ref', 'normal');
  doc.addFileToVFS('b.ttf', fontFile('KitwrightSans-Bold.ttf'));
  doc.addFont('b.ttf', 'Ref', 'bold');

  test.each(['Wire boom +X anchor', 'Tab 7 glues under the edge marked 7', 'AV To Wa', '50 mm × 2 in ±0.5 °', 'é→✓'])(
    'matches jspdf’s width of "%s" in KitwrightSans regular and bold within 1 %',
    (text) => {
      for (const bold of [false, true]) {
        doc.setFont('Ref', bold ? 'bold' : 'normal');
        const ref = doc.getStringUnitWidth(text);
        // 1 %: the brief's tolerance; both sum hmtx advances, so any gap means a wrong glyph lookup.
        expect(Math.abs(textWidthEm(text, bold) / ref - 1)).toBeLessThan(0.01);
      }
    },
  );

  test('counts a character the subset lacks as the font’s OS/2 mean advance', () => {
    const mean = TEXT_WIDTH_REGULAR.averageAdvance / TEXT_WIDTH_REGULAR.unitsPerEm;
    expect(textWidthEm('a字', false) - textWidthEm('a', false)).toBeCloseTo(mean, 12);
    expect(textWidthEm('', true)).toBe(0);
  });

  test('scales with the size in mm', () => {
    expect(textWidthMm('Body', 3.5, true)).toBeCloseTo(3.5 * textWidthEm('Body', true), 12);
  });
});
