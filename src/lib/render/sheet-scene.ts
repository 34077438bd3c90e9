/**
 * Everything on a sheet except the piece lines, as renderer-neutral primitives in sheet mm (y down): piece
 * labels, tab and edge numbers, alignment marks, tile guides, and the furniture (footer, check square,
 * legend, QR code). The SVG and PDF renderers draw the same scene.
 */
import type { Piece, Vec2Mm } from '../geometry/types';
import { placementApply, placementApplyAngle, placementBounds } from '../layout/placement';
import {
  sheetFurnitureCheckSquareText,
  sheetFurnitureFooterText,
  sheetFurnitureLayout,
  SHEET_CUT_LIST_ROW_MM,
} from '../layout/sheet-furniture';
import { TILE_CAPTION_MM } from '../layout/tiling';
import { MM_PER_INCH } from '../layout/units';
import type { KitLayout, LaidOutSheet, Placement, RectMm } from '../layout/types';
import { GLUE_TINT, GUIDE_STYLE, LINE_STYLES, TEXT_COLOR } from './line-styles';
import { qrRects } from './qr';

export interface SceneText {
  text: string;
  /** Centre of the text's left end (anchor start) or middle (anchor middle), mm. */
  atMm: Vec2Mm;
  /** Baseline direction, radians clockwise from +x on the sheet. */
  angleRad: number;
  sizeMm: number;
  bold: boolean;
  anchor: 'start' | 'middle';
  group: 'labels' | 'furniture';
}
export interface SceneStroke {
  points: Vec2Mm[];
  widthMm: number;
  color: string;
  dashMm: readonly number[];
  group: 'labels' | 'furniture';
}
export interface SceneFill {
  rects: RectMm[];
  color: string;
  group: 'artwork' | 'furniture';
}
export interface SheetScene {
  texts: SceneText[];
  strokes: SceneStroke[];
  fills: SceneFill[];
}

const LABEL_SIZE_MM = 3.5;
const NUMBER_SIZE_MM = 2.6;
const FOOTER_SIZE_MM = 2.8;

/** The scene of one sheet of a kit; pieces missing from `kit.pieces` are skipped. */
export function sheetScene(kit: KitLayout, sheet: LaidOutSheet): SheetScene {
  const scene: SheetScene = { texts: [], strokes: [], fills: [] };
  const byId = new Map(kit.pieces.map((p) => [p.id, p]));
  for (const placement of sheet.placements) {
    const piece = byId.get(placement.pieceId);
    if (piece) scenePieceTexts(scene, piece, placement);
    if (placement.tile) sceneTileGuides(scene, placement);
  }
  for (const mark of sheet.alignmentMarks) {
    const [x, y] = mark.atMm;
    const arm = 3;
    const style = { widthMm: 0.25, color: TEXT_COLOR, dashMm: [], group: 'labels' as const };
    scene.strokes.push(
      {
        ...style,
        points: [
          [x - arm, y],
          [x + arm, y],
        ],
      },
      {
        ...style,
        points: [
          [x, y - arm],
          [x, y + arm],
        ],
      },
    );
    scene.texts.push(
      text(mark.letter, [x + arm + 0.6, y - arm], NUMBER_SIZE_MM, 'labels', { bold: true, anchor: 'start' }),
    );
  }
  sceneFurniture(scene, kit, sheet);
  return scene;
}

function text(
  value: string,
  atMm: Vec2Mm,
  sizeMm: number,
  group: SceneText['group'],
  extra: Partial<SceneText> = {},
): SceneText {
  return { text: value, atMm, angleRad: 0, sizeMm, bold: false, anchor: 'middle', group, ...extra };
}

function inside(p: Vec2Mm, w?: RectMm): boolean {
  return !w || (p[0] >= w.xMm && p[0] <= w.xMm + w.widthMm && p[1] >= w.yMm && p[1] <= w.yMm + w.heightMm);
}

/** Upright text: a baseline pointing left is turned half a turn so numbers never read upside down. */
function upright(angleRad: number): number {
  let a = Math.atan2(Math.sin(angleRad), Math.cos(angleRad));
  if (a > Math.PI / 2 + 1e-9) a -= Math.PI;
  if (a <= -Math.PI / 2 - 1e-9) a += Math.PI;
  return a;
}

function scenePieceTexts(scene: SheetScene, piece: Piece, placement: Placement) {
  const window = placement.tile?.windowMm;
  const box = placementBounds(placement, piece);
  // Average glyph advance of the font is about 0.6 em (from memory: DejaVu Sans Bold); keep the label inside.
  const sizeMm = Math.min(
    LABEL_SIZE_MM,
    Math.min(box.widthMm, box.heightMm) / 5,
    (0.8 * box.widthMm) / (0.6 * piece.label.length),
  );
  const center = placementApply(placement, polygonCentroid(piece.hinge.faces[0]?.polygonMm ?? piece.outlineMm));
  if (sizeMm >= 1.2 && inside(center, window))
    scene.texts.push(text(piece.label, center, sizeMm, 'labels', { bold: true }));
  for (const tab of piece.tabs) {
    const at = placementApply(placement, tab.labelAtMm);
    if (inside(at, window)) scene.texts.push(text(String(tab.number), at, NUMBER_SIZE_MM, 'labels'));
  }
  for (const label of piece.edgeLabels) {
    const at = placementApply(placement, label.atMm);
    const angleRad = upright(placementApplyAngle(placement, label.angleRad));
    if (inside(at, window)) scene.texts.push(text(String(label.number), at, NUMBER_SIZE_MM, 'labels', { angleRad }));
  }
}

function sceneTileGuides(scene: SheetScene, placement: Placement) {
  const tile = placement.tile!;
  const w = tile.windowMm;
  const o = tile.overlapMm;
  const strips: RectMm[] = [];
  if (tile.col + 1 < tile.cols)
    strips.push({ xMm: w.xMm + w.widthMm - o, yMm: w.yMm, widthMm: o, heightMm: w.heightMm });
  if (tile.row + 1 < tile.rows)
    strips.push({ xMm: w.xMm, yMm: w.yMm + w.heightMm - o, widthMm: w.widthMm, heightMm: o });
  if (strips.length) scene.fills.push({ rects: strips, color: GLUE_TINT, group: 'artwork' });
  const r = w.xMm + w.widthMm;
  const b = w.yMm + w.heightMm;
  scene.strokes.push({
    ...GUIDE_STYLE,
    group: 'furniture',
    points: [
      [w.xMm, w.yMm],
      [r, w.yMm],
      [r, b],
      [w.xMm, b],
      [w.xMm, w.yMm],
    ],
  });
  const step = strips.length
    ? ': glue the shaded strip under the next tile, letters on letters'
    : ': lay it over the tiles before it';
  const where = `Tile row ${tile.row + 1} of ${tile.rows}, column ${tile.col + 1} of ${tile.cols}${step}`;
  scene.texts.push(text(where, [w.xMm, b + TILE_CAPTION_MM / 2], 2.2, 'furniture', { anchor: 'start' }));
}

function sceneFurniture(scene: SheetScene, kit: KitLayout, sheet: LaidOutSheet) {
  const first = sheet.number === 1;
  const layout = sheetFurnitureLayout(sheet.printableMm, kit.units, first, kit.cutList.length);
  const { footer, checkSquare: sq } = layout;
  const footerText = sheetFurnitureFooterText(kit, sheet, kit.sheets.length);
  scene.texts.push(
    text(footerText, [footer.xMm, footer.yMm + footer.heightMm / 2], FOOTER_SIZE_MM, 'furniture', { anchor: 'start' }),
  );
  const r = sq.xMm + sq.widthMm;
  const b = sq.yMm + sq.heightMm;
  scene.strokes.push({
    widthMm: 0.25,
    color: TEXT_COLOR,
    dashMm: [],
    group: 'furniture',
    points: [
      [sq.xMm, sq.yMm],
      [r, sq.yMm],
      [r, b],
      [sq.xMm, b],
      [sq.xMm, sq.yMm],
    ],
  });
  const [size, hint] = sheetFurnitureCheckSquareText(kit.units);
  scene.texts.push(
    text(size, [sq.xMm + sq.widthMm / 2, sq.yMm + sq.heightMm / 2 - 2.5], 3, 'furniture', { bold: true }),
  );
  scene.texts.push(text(hint, [sq.xMm + sq.widthMm / 2, sq.yMm + sq.heightMm / 2 + 2.5], 2.3, 'furniture'));
  if (layout.legend) sceneLegend(scene, layout.legend);
  if (layout.cutList) sceneCutList(scene, kit, layout.cutList);
  if (layout.qr) {
    scene.fills.push({ rects: qrRects(kit.qrUrl, layout.qr), color: TEXT_COLOR, group: 'furniture' });
    scene.texts.push(
      text(
        'Kit page',
        [layout.qr.xMm + layout.qr.widthMm / 2, layout.qr.yMm + layout.qr.heightMm + 2],
        2.4,
        'furniture',
      ),
    );
  }
}

/** Column offsets of the cut-list table from its left edge, mm: part, size, quantity, sheets. */
const CUT_LIST_COLUMNS_MM = [0, 72, 122, 138] as const;
export const CUT_LIST_TITLE = 'Cut list';
export const CUT_LIST_HEADER = ['Part', 'Size', 'Qty', 'Sheets'] as const;

/** The cut list as a table: title, header, then one row per part (size in the kit's units). */
function sceneCutList(scene: SheetScene, kit: KitLayout, box: RectMm) {
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

/** The legend rows, also used by tests to check the font covers them. */
export const LEGEND_TITLE = 'How to read this kit';
export const LEGEND_NOTES = ['Tab 7 glues under the edge marked 7', 'Grey tint: glue area · tiles: letter on letter'];

function sceneLegend(scene: SheetScene, box: RectMm) {
  const row = 5.6;
  let y = box.yMm + 2.5;
  scene.texts.push(text(LEGEND_TITLE, [box.xMm, y], 3, 'furniture', { bold: true, anchor: 'start' }));
  for (const style of [LINE_STYLES.cut, LINE_STYLES.mountain, LINE_STYLES.valley]) {
    y += row;
    scene.strokes.push({
      widthMm: style.widthMm,
      color: style.color,
      dashMm: style.dashMm,
      group: 'furniture',
      points: [
        [box.xMm, y],
        [box.xMm + 16, y],
      ],
    });
    scene.texts.push(text(`${style.label}: ${style.action}`, [box.xMm + 19, y], 2.6, 'furniture', { anchor: 'start' }));
  }
  for (const note of LEGEND_NOTES) {
    y += row;
    scene.texts.push(text(note, [box.xMm, y], 2.5, 'furniture', { anchor: 'start' }));
  }
}

/** Area centroid of a polygon (mm); a degenerate polygon gives the mean of its points. */
function polygonCentroid(points: readonly Vec2Mm[]): Vec2Mm {
  let a = 0,
    cx = 0,
    cy = 0;
  for (let i = 0; i < points.length; i++) {
    const [x1, y1] = points[i]!;
    const [x2, y2] = points[(i + 1) % points.length]!;
    const k = x1 * y2 - x2 * y1;
    a += k;
    cx += (x1 + x2) * k;
    cy += (y1 + y2) * k;
  }
  if (Math.abs(a) < 1e-12) {
    const n = Math.max(points.length, 1);
    return [points.reduce((s, p) => s + p[0], 0) / n, points.reduce((s, p) => s + p[1], 0) / n];
  }
  return [cx / (3 * a), cy / (3 * a)];
}
