/** The cut list of a life-size kit as a table on the first sheet. */
import { SHEET_CUT_LIST_ROW_MM } from '../layout/sheet-furniture';
import { MM_PER_INCH } from '../layout/units';
import type { KitLayout, RectMm } from '../layout/types';
import { TEXT_COLOR } from './line-styles';
import { type SheetScene, sceneText as text } from './scene-types';

/** Column offsets of the cut-list table from its left edge, mm: part, size, quantity, sheets. */
const CUT_LIST_COLUMNS_MM = [0, 72, 122, 138] as const;
export const CUT_LIST_TITLE = 'Cut list';
export const CUT_LIST_HEADER = ['Part', 'Size', 'Qty', 'Sheets'] as const;

/** The cut list as a table: title, header, then one row per part (size in the kit's units). */
export function sceneCutList(scene: SheetScene, kit: KitLayout, box: RectMm) {
  const row = SHEET_CUT_LIST_ROW_MM;
  const size = (w: number, h: number) =>
    kit.units === 'us'
      ? `${(w / MM_PER_INCH).toFixed(1)} × ${(h / MM_PER_INCH).toFixed(1)} in`
      : `${Math.round(w)} × ${Math.round(h)} mm`;
  const cells = (y: number, values: readonly string[], bold = false) =>
    values.forEach((v, i) =>
      scene.texts.push(text(v, [box.xMm + CUT_LIST_COLUMNS_MM[i]!, y], 2.8, 'furniture', { anchor: 'start', bold })),
    );
  let y = box.yMm + row / 2;
  scene.texts.push(text(CUT_LIST_TITLE, [box.xMm, y], 3, 'furniture', { bold: true, anchor: 'start' }));
  y += row;
  cells(y, CUT_LIST_HEADER, true);
  scene.strokes.push({
    widthMm: 0.2,
    color: TEXT_COLOR,
    dashMm: [],
    group: 'furniture',
    points: [
      [box.xMm, y + row / 2],
      [box.xMm + box.widthMm, y + row / 2],
    ],
  });
  for (const r of kit.cutList) {
    y += row;
    cells(y, [r.part, size(r.widthMm, r.heightMm), String(r.quantity), r.sheets.join(', ')]);
  }
}
