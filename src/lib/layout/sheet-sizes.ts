/**
 * The sheets a kit can be laid out on, portrait (width ≤ height), in millimetres.
 * ISO 216 sizes are the standard's rounded millimetre values; Letter and Tabloid are ASME Y14.1 (ANSI A and
 * B) in exact inches; Legal (8.5 × 14 in) is a US trade size outside Y14.1 (common practice). The stock
 * panel is the usual 4 × 8 ft sheet of plywood or foam board sold as 1220 × 2440 mm (common practice).
 */
import { inchToMm } from './units';
import type { SheetSize } from './types';

export const SHEET_SIZES = {
  a5: { id: 'a5', label: 'A5', widthMm: 148, heightMm: 210, kind: 'paper' },
  a4: { id: 'a4', label: 'A4', widthMm: 210, heightMm: 297, kind: 'paper' },
  a3: { id: 'a3', label: 'A3', widthMm: 297, heightMm: 420, kind: 'paper' },
  letter: { id: 'letter', label: 'US Letter', widthMm: inchToMm(8.5), heightMm: inchToMm(11), kind: 'paper' },
  legal: { id: 'legal', label: 'US Legal', widthMm: inchToMm(8.5), heightMm: inchToMm(14), kind: 'paper' },
  tabloid: { id: 'tabloid', label: 'Tabloid', widthMm: inchToMm(11), heightMm: inchToMm(17), kind: 'paper' },
  'panel-1220x2440': {
    id: 'panel-1220x2440',
    label: 'Panel 1220 × 2440 mm',
    widthMm: 1220,
    heightMm: 2440,
    kind: 'stock',
  },
} as const satisfies Record<string, SheetSize>;

export type SheetSizeId = keyof typeof SHEET_SIZES;
export const SHEET_SIZE_IDS = Object.keys(SHEET_SIZES) as [SheetSizeId, ...SheetSizeId[]];

/**
 * Printable margin on every side, mm. Office printers leave roughly the outer 5 mm of a page blank, so
 * 10 mm leaves room for the sheet furniture; panels keep the same 10 mm clear for the saw or knife
 * (common practice, no source).
 */
export const SHEET_MARGIN_MM = 10;

/** The sheet size for an id. */
export function sheetSize(id: SheetSizeId): SheetSize {
  return SHEET_SIZES[id];
}
