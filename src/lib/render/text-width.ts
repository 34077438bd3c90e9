/**
 * Text widths from the advance widths of the shipped KitwrightSans subset (the table scripts/font-widths.ts
 * reads from the TTFs' cmap and hmtx tables), so sheets lay out labels with the font they name. Kerning is
 * left out, as in jspdf's own string widths; the SVG renderer adds a margin for it and for viewer fonts.
 */
import { TEXT_WIDTH_BOLD, TEXT_WIDTH_REGULAR } from './text-width-table';
import type { TextWidthFont } from './text-width-table';

interface TextWidthLookup {
  /** Advance per code point as a fraction of the em. */
  em: Map<number, number>;
  /** The font's OS/2 mean advance as a fraction of the em, used for characters the subset lacks. */
  averageEm: number;
}

const lookups = new Map<TextWidthFont, TextWidthLookup>();

function textWidthLookup(font: TextWidthFont): TextWidthLookup {
  let lookup = lookups.get(font);
  if (!lookup) {
    lookup = {
      em: new Map(font.advances.map(([c, a]) => [c, a / font.unitsPerEm])),
      averageEm: font.averageAdvance / font.unitsPerEm,
    };
    lookups.set(font, lookup);
  }
  return lookup;
}

/** Width of a string in em (sum of advances), KitwrightSans regular or bold; unknown characters count the font's mean advance, "" is 0. */
export function textWidthEm(text: string, bold: boolean): number {
  const { em, averageEm } = textWidthLookup(bold ? TEXT_WIDTH_BOLD : TEXT_WIDTH_REGULAR);
  let sum = 0;
  for (const ch of text) sum += em.get(ch.codePointAt(0)!) ?? averageEm;
  return sum;
}

/** Width in mm of a string set in KitwrightSans at a size (em) in mm, bold or not. */
export function textWidthMm(text: string, sizeMm: number, bold: boolean): number {
  return textWidthEm(text, bold) * sizeMm;
}
