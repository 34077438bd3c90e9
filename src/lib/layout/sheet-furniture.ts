/**
 * Where the sheet furniture sits: the footer line (sheet number, kit title, scale, engine version), the check
 * square that proves a sheet printed at 100 %, and on the first sheet the line-style legend and the QR code.
 * Pieces are packed around these rectangles. Sheet coordinates: mm from the top-left corner, y down.
 */
import { MM_PER_INCH } from './units';
import type { KitLayout, LaidOutSheet, RectMm, SheetSize } from './types';

/** Side of the check square: 50 mm for metric kits, 2 in = 50.8 mm exactly for US kits (NIST SP 811). */
export function sheetFurnitureCheckSquareMm(units: KitLayout['units']): number {
  return units === 'us' ? 2 * MM_PER_INCH : 50;
}

/** Height of the footer text line, mm (common practice, no source). */
export const SHEET_FOOTER_HEIGHT_MM = 6;
/** Gap kept between furniture and pieces, mm (common practice, no source). */
export const SHEET_FURNITURE_GAP_MM = 3;
/** Side of the QR code on the first sheet, mm, quiet zone included (common practice, no source). */
export const SHEET_QR_SIDE_MM = 30;
/** Width of the legend box on the first sheet, mm. */
export const SHEET_LEGEND_WIDTH_MM = 78;

/** Height of one cut-list row (and of its title and header rows), mm (common practice, no source). */
export const SHEET_CUT_LIST_ROW_MM = 5;
/** Width of the cut-list table on the first panel, mm. */
export const SHEET_CUT_LIST_WIDTH_MM = 170;

export interface SheetFurnitureLayout {
  footer: RectMm;
  checkSquare: RectMm;
  legend?: RectMm;
  qr?: RectMm;
  /** The cut list's table on the first sheet of a stock kit: title, header and one row per part. */
  cutList?: RectMm;
  /** Rectangles pieces must stay clear of, gaps included. */
  obstacles: RectMm[];
}

/** The printable rectangle of a sheet: the sheet less `marginMm` on every side. */
export function sheetFurniturePrintable(size: Pick<SheetSize, 'widthMm' | 'heightMm'>, marginMm: number): RectMm {
  return { xMm: marginMm, yMm: marginMm, widthMm: size.widthMm - 2 * marginMm, heightMm: size.heightMm - 2 * marginMm };
}

/**
 * The furniture rectangles of one sheet: the check square in the bottom-right corner of the printable area,
 * the footer to its left along the bottom edge, and on the first sheet the legend and QR code above the footer
 * and, when `cutListRows` > 0 (sheet stock), the cut-list table above the legend.
 */
export function sheetFurnitureLayout(
  printable: RectMm,
  units: KitLayout['units'],
  first: boolean,
  cutListRows = 0,
): SheetFurnitureLayout {
  const side = sheetFurnitureCheckSquareMm(units);
  const gap = SHEET_FURNITURE_GAP_MM;
  const right = printable.xMm + printable.widthMm;
  const bottom = printable.yMm + printable.heightMm;
  const checkSquare = { xMm: right - side, yMm: bottom - side, widthMm: side, heightMm: side };
  const footer = {
    xMm: printable.xMm,
    yMm: bottom - SHEET_FOOTER_HEIGHT_MM,
    widthMm: printable.widthMm - side - gap,
    heightMm: SHEET_FOOTER_HEIGHT_MM,
  };
  const grow = (r: RectMm): RectMm => ({
    xMm: r.xMm - gap,
    yMm: r.yMm - gap,
    widthMm: r.widthMm + 2 * gap,
    heightMm: r.heightMm + 2 * gap,
  });
  const layout: SheetFurnitureLayout = { footer, checkSquare, obstacles: [grow(checkSquare), grow(footer)] };
  if (!first) return layout;
  const blockTop = bottom - side;
  const blockHeight = side - SHEET_FOOTER_HEIGHT_MM - gap;
  const legend = { xMm: printable.xMm, yMm: blockTop, widthMm: SHEET_LEGEND_WIDTH_MM, heightMm: blockHeight };
  const qrSide = Math.min(SHEET_QR_SIDE_MM, blockHeight);
  const qr = { xMm: checkSquare.xMm - gap - qrSide, yMm: blockTop, widthMm: qrSide, heightMm: qrSide };
  layout.legend = legend;
  layout.qr = qr;
  layout.obstacles.push(grow(legend), grow(qr));
  if (cutListRows > 0) {
    const heightMm = SHEET_CUT_LIST_ROW_MM * (cutListRows + 2);
    const widthMm = Math.min(SHEET_CUT_LIST_WIDTH_MM, printable.widthMm);
    layout.cutList = { xMm: printable.xMm, yMm: blockTop - 2 * gap - heightMm, widthMm, heightMm };
    layout.obstacles.push(grow(layout.cutList));
  }
  return layout;
}

/** The footer text of a sheet, e.g. "Sheet 3 of 7 · Skein probe · 1:20 · engine 0.1.0". */
export function sheetFurnitureFooterText(
  kit: Pick<KitLayout, 'title' | 'scaleDenominator' | 'engineVersion'>,
  sheet: Pick<LaidOutSheet, 'number'>,
  sheetCount: number,
): string {
  return `Sheet ${sheet.number} of ${sheetCount} · ${kit.title} · ${sheetFurnitureScaleText(kit.scaleDenominator)} · Kitwright engine ${kit.engineVersion}`;
}

/** The scale as printed, "1:20"; a denominator below 1 (an enlargement) prints as "2:1". */
export function sheetFurnitureScaleText(scaleDenominator: number): string {
  if (scaleDenominator >= 1) return `1:${Number(scaleDenominator.toFixed(3))}`;
  return `${Number((1 / scaleDenominator).toFixed(3))}:1`;
}

/** The label printed inside the check square. */
export function sheetFurnitureCheckSquareText(units: KitLayout['units']): [string, string] {
  return units === 'us' ? ['2 in × 2 in', 'measure: print at 100 %'] : ['50 mm × 50 mm', 'measure: print at 100 %'];
}
