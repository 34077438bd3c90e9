/**
 * Everything on a sheet except the piece lines, as renderer-neutral primitives in sheet mm (y down): piece
 * labels, tab and edge numbers, alignment marks, tile guides, and the furniture (footer, check square,
 * legend, and the QR code or, for a kit with no page yet, a note in its place). The SVG and PDF renderers draw the same scene.
 */
import type { Piece, Vec2Mm } from '../geometry/types';
import { placementApply, placementApplyAngle } from '../layout/placement';
import {
  LABEL_BOX_HEIGHT_EM,
  labelBox,
  labelBoxesOverlap,
  labelCandidatePoints,
  labelPointInside,
} from './label-placement';
import type { LabelMeasure } from './label-placement';
import { textWidthMm } from './text-width';
import { polygonArea } from '../geometry/vec';
import { outlineOf } from '../geometry/piece-builder';
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

/**
 * The scene of one sheet of a kit; pieces missing from `kit.pieces` are skipped. Label texts are placed so
 * their boxes (measured by `measure`: the renderer's font metrics, KitwrightSans's advance widths by default)
 * do not overlap.
 */
export function sheetScene(kit: KitLayout, sheet: LaidOutSheet, measure: LabelMeasure = textWidthMm): SheetScene {
  const scene: SheetScene = { texts: [], strokes: [], fills: [] };
  const byId = new Map(kit.pieces.map((p) => [p.id, p]));
  const labels = new SceneLabels(scene, measure);
  // Numbers have fixed homes (their edge or tab); piece names can move, so they are placed last.
  for (const m of sheet.alignmentMarks)
    labels.reserve(
      text(m.letter, [m.atMm[0] + 3.6, m.atMm[1] - 3], NUMBER_SIZE_MM, 'labels', { bold: true, anchor: 'start' }),
    );
  for (const placement of sheet.placements) {
    const piece = byId.get(placement.pieceId);
    if (piece) scenePieceNumbers(labels, piece, placement);
    if (placement.tile) sceneTileGuides(scene, placement);
  }
  for (const placement of sheet.placements) {
    const piece = byId.get(placement.pieceId);
    if (piece) scenePieceName(labels, piece, placement);
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
  }
  sceneFurniture(scene, kit, sheet, measure);
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

/** The label texts of a sheet and their boxes, so each new label can be kept clear of the ones before. */
class SceneLabels {
  readonly boxes: Vec2Mm[][] = [];
  constructor(
    readonly scene: SheetScene,
    readonly measure: LabelMeasure,
  ) {}

  box(t: SceneText): Vec2Mm[] {
    return labelBox(
      t.atMm,
      t.angleRad,
      this.measure(t.text, t.sizeMm, t.bold),
      t.sizeMm * LABEL_BOX_HEIGHT_EM,
      t.anchor,
    );
  }

  free(box: readonly Vec2Mm[]): boolean {
    return !this.boxes.some((b) => labelBoxesOverlap(b, box));
  }

  /** Adds a text at its own place whatever it covers (marks whose place is their meaning). */
  reserve(t: SceneText) {
    this.scene.texts.push(t);
    this.boxes.push(this.box(t));
  }

  /** Adds the first of the candidate texts whose box is free and passes `fits`; false when none is. */
  tryPlace(candidates: Iterable<SceneText>, fits: (box: Vec2Mm[]) => boolean = () => true): boolean {
    for (const t of candidates) {
      const box = this.box(t);
      if (this.free(box) && fits(box)) {
        this.scene.texts.push(t);
        this.boxes.push(box);
        return true;
      }
    }
    return false;
  }
}

/** Sizes tried for a number, mm: full size first, then smaller, before it is nudged further along. */
const NUMBER_SIZES_MM = [NUMBER_SIZE_MM, 2.1, 1.7];
/** Shifts along its baseline tried for a number that would cover another label, mm. */
const NUMBER_SHIFTS_MM = [0, 1.5, -1.5, 3, -3, 4.5, -4.5, 6, -6];

function* numberCandidates(value: string, at: Vec2Mm, angleRad: number): Generator<SceneText> {
  const [c, s] = [Math.cos(angleRad), Math.sin(angleRad)];
  for (const size of NUMBER_SIZES_MM)
    for (const d of NUMBER_SHIFTS_MM) yield text(value, [at[0] + c * d, at[1] + s * d], size, 'labels', { angleRad });
}

function scenePieceNumbers(labels: SceneLabels, piece: Piece, placement: Placement) {
  const window = placement.tile?.windowMm;
  const place = (value: string, at: Vec2Mm, angleRad: number) => {
    if (!inside(at, window)) return;
    if (!labels.tryPlace(numberCandidates(value, at, angleRad), (b) => b.every((p) => inside(p, window))))
      labels.reserve(text(value, at, NUMBER_SIZES_MM[NUMBER_SIZES_MM.length - 1]!, 'labels', { angleRad }));
  };
  for (const tab of piece.tabs) place(String(tab.number), placementApply(placement, tab.labelAtMm), 0);
  for (const label of piece.edgeLabels)
    place(
      String(label.number),
      placementApply(placement, label.atMm),
      upright(placementApplyAngle(placement, label.angleRad)),
    );
}

/** Piece names tried, mm: large first; below the last the name is left off. */
const NAME_SIZES_MM = [LABEL_SIZE_MM, 3, 2.6, 2.2, 1.8, 1.5, 1.2];

/** The name and its shorter forms, dropping leading words but keeping two ("Wire boom +X anchor" → "+X anchor"). */
export function sceneLabelAbbreviations(label: string): string[] {
  const words = label.split(/\s+/).filter(Boolean);
  return words.slice(0, Math.max(1, words.length - 1)).map((_, i) => words.slice(i).join(' '));
}

/**
 * The piece's name inside its largest faces (or anywhere inside its outline), at the point farthest from
 * the edges that leaves it clear of every label already placed; shrunk, then shortened, to fit.
 */
function scenePieceName(labels: SceneLabels, piece: Piece, placement: Placement) {
  const window = sceneNameWindow(placement);
  const spots = sceneNameRegions(piece).map(({ region, points }) => {
    const placed = region.map((p) => placementApply(placement, p));
    return {
      within: sceneInside(placed, window),
      points: points.map((p) => placementApply(placement, p)).filter((p) => inside(p, window)),
    };
  });
  // Down to 1.8 mm the full name comes first at every size, then the shorter forms; below that the largest
  // size that fits wins, whichever form it takes. Upright text first, then reading up the sheet for tall,
  // narrow pieces.
  const names = sceneLabelAbbreviations(piece.label);
  const tries: [string, number][] = [
    ...names.flatMap((n) => NAME_SIZES_MM.filter((s) => s >= 1.8).map((s) => [n, s] as [string, number])),
    ...NAME_SIZES_MM.filter((s) => s < 1.8).flatMap((s) => names.map((n) => [n, s] as [string, number])),
  ];
  for (const [name, size] of tries)
    for (const angleRad of [0, -Math.PI / 2])
      for (const { within, points } of spots) {
        const candidates = points.map((p) => text(name, p, size, 'labels', { bold: true, angleRad }));
        if (labels.tryPlace(candidates, within)) return;
      }
}

const nameRegionCache = new WeakMap<Piece, { region: Vec2Mm[]; points: Vec2Mm[] }[]>();

/**
 * Where a piece's name may go, in its own flat coordinates: its four largest faces, then (last resort for
 * pieces whose faces are all narrow, like a many-sided wall strip) the union of its faces — across folds,
 * never on tabs — each with its candidate points. Placements are rigid motions, so the regions and points
 * are computed once per piece and moved onto each sheet, copy and tile.
 */
function sceneNameRegions(piece: Piece): { region: Vec2Mm[]; points: Vec2Mm[] }[] {
  const cached = nameRegionCache.get(piece);
  if (cached) return cached;
  const faces = piece.hinge.faces
    .map((f) => f.polygonMm)
    .filter((f) => f.length >= 3)
    .sort((a, b) => Math.abs(polygonArea(b)) - Math.abs(polygonArea(a)))
    .slice(0, 4);
  const union = outlineOf(piece.hinge.faces.map((f) => [...f.polygonMm]));
  const regions = [...faces, union].map((region) => ({ region: [...region], points: labelCandidatePoints(region) }));
  nameRegionCache.set(piece, regions);
  return regions;
}

/** Clear paper kept round a piece's name inside its face, mm (common practice, no source). */
const NAME_PADDING_MM = 0.6;

/** A text box (corners p0…p3, p0→p1 along the baseline) grown by padMm on every side. */
function sceneBoxPadded(box: readonly Vec2Mm[], padMm: number): Vec2Mm[] {
  const [p0, p1, p2, p3] = box as [Vec2Mm, Vec2Mm, Vec2Mm, Vec2Mm];
  const unit = (a: Vec2Mm, b: Vec2Mm): Vec2Mm => {
    const l = Math.hypot(b[0] - a[0], b[1] - a[1]) || 1;
    return [((b[0] - a[0]) / l) * padMm, ((b[1] - a[1]) / l) * padMm];
  };
  const u = unit(p0, p1);
  const v = unit(p0, p3);
  return [
    [p0[0] - u[0] - v[0], p0[1] - u[1] - v[1]],
    [p1[0] + u[0] - v[0], p1[1] + u[1] - v[1]],
    [p2[0] + u[0] + v[0], p2[1] + u[1] + v[1]],
    [p3[0] - u[0] + v[0], p3[1] - u[1] + v[1]],
  ];
}

/** Where a piece's name may go: its tile's window less the overlap strips the next tiles cover. */
function sceneNameWindow(placement: Placement): RectMm | undefined {
  const t = placement.tile;
  if (!t) return undefined;
  const right = t.col + 1 < t.cols ? t.overlapMm : 0;
  const below = t.row + 1 < t.rows ? t.overlapMm : 0;
  return { ...t.windowMm, widthMm: t.windowMm.widthMm - right, heightMm: t.windowMm.heightMm - below };
}

/** A test that a text box lies inside a polygon (and the window): corners inside, no edge crossing it. */
function sceneInside(region: readonly Vec2Mm[], window?: RectMm): (box: Vec2Mm[]) => boolean {
  const edges = region.map((a, i) => {
    const b = region[(i + 1) % region.length]!;
    return {
      a,
      b,
      minX: Math.min(a[0], b[0]),
      maxX: Math.max(a[0], b[0]),
      minY: Math.min(a[1], b[1]),
      maxY: Math.max(a[1], b[1]),
    };
  });
  return (tight) => {
    const box = sceneBoxPadded(tight, NAME_PADDING_MM);
    if (!box.every((p) => inside(p, window) && labelPointInside(p, region))) return false;
    const xs = box.map((p) => p[0]);
    const ys = box.map((p) => p[1]);
    const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
    // Only edges whose box meets the text's box can cross it.
    return !edges.some(
      (e) => e.maxX >= x0 && e.minX <= x1 && e.maxY >= y0 && e.minY <= y1 && labelBoxesOverlap(box, [e.a, e.b]),
    );
  };
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

function sceneFurniture(scene: SheetScene, kit: KitLayout, sheet: LaidOutSheet, measure: LabelMeasure) {
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
  if (layout.qr && kit.qrUrl) {
    scene.fills.push({ rects: qrRects(kit.qrUrl, layout.qr), color: TEXT_COLOR, group: 'furniture' });
    scene.texts.push(
      text(
        QR_CAPTION,
        [layout.qr.xMm + layout.qr.widthMm / 2, layout.qr.yMm + layout.qr.heightMm + 2],
        2.4,
        'furniture',
      ),
    );
  } else if (layout.qr) sceneQrPreviewNote(scene, layout.qr, measure);
}

/** Caption under the QR code of a saved kit. */
export const QR_CAPTION = 'Kit page';
/** Printed where the QR code goes while a kit has no page yet: a heading, then a line wrapped to the box. */
export const QR_PREVIEW_NOTE = ['Preview only', 'Save the kit to give it a QR code.'] as const;
const QR_NOTE_HEADING_MM = 2.8;
const QR_NOTE_SIZE_MM = 2.4;
/** Line pitch of the note, in em (common practice, no source: about 1.3 × the size for short captions). */
const QR_NOTE_LEADING_EM = 1.3;

/** The preview note centred in the QR code's square, its second line wrapped at words to the square's width. */
function sceneQrPreviewNote(scene: SheetScene, box: RectMm, measure: LabelMeasure) {
  const [heading, body] = QR_PREVIEW_NOTE;
  const lines = sceneWrapWords(body, box.widthMm, QR_NOTE_SIZE_MM, measure);
  const pitch = QR_NOTE_SIZE_MM * QR_NOTE_LEADING_EM;
  const headingPitch = QR_NOTE_HEADING_MM * QR_NOTE_LEADING_EM;
  const x = box.xMm + box.widthMm / 2;
  let y = box.yMm + (box.heightMm - headingPitch - pitch * lines.length) / 2 + headingPitch / 2;
  scene.texts.push(text(heading, [x, y], QR_NOTE_HEADING_MM, 'furniture', { bold: true }));
  y += (headingPitch + pitch) / 2;
  for (const line of lines) {
    scene.texts.push(text(line, [x, y], QR_NOTE_SIZE_MM, 'furniture'));
    y += pitch;
  }
}

/** Words packed greedily into lines no wider than widthMm (a word longer than that gets a line of its own). */
export function sceneWrapWords(value: string, widthMm: number, sizeMm: number, measure: LabelMeasure): string[] {
  const lines: string[] = [];
  for (const word of value.split(/\s+/).filter(Boolean)) {
    const last = lines[lines.length - 1];
    const joined = last === undefined ? word : `${last} ${word}`;
    if (last !== undefined && measure(joined, sizeMm, false) <= widthMm) lines[lines.length - 1] = joined;
    else lines.push(word);
  }
  return lines;
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
