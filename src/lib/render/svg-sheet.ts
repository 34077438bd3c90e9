/**
 * One sheet as an SVG document at true size (width and height in mm, viewBox in mm). Groups with ids:
 * `artwork` (tints), `cut` (stroked paths only, no fills, so a cutting machine can take it alone),
 * `mountain-folds`, `valley-folds`, `labels` and `furniture`. Piece paths are built and placed with
 * svg-path-commander (translate · rotate · scale(±1, −1), the rule of layout/types.ts).
 */
import SVGPathCommander from 'svg-path-commander';
import type { PathArray } from 'svg-path-commander';
import type { PlanePointMm, PlaneSpace } from '../geometry/types';
import type { KitLayout, LaidOutSheet, Placement, SheetVec2Mm } from '../layout/types';
import { GLUE_TINT, LINE_STYLES, TEXT_COLOR } from './line-styles';
import { pieceLines } from './piece-lines';
import type { PiecePointTransform } from './piece-lines';
import { sheetScene } from './sheet-scene';
import type { SceneStroke } from './scene-types';
import { textWidthMm } from './text-width';

/**
 * Font family written into SVG text: KitwrightSans (the subset shipped in assets/fonts, whose advance widths
 * lay the labels out) first, then DejaVu Sans, its source with the same widths. The SVG embeds no font, so a
 * viewer without either falls back to Arial or its own sans-serif, which are narrower than DejaVu Sans.
 */
export const SVG_FONT_FAMILY = 'KitwrightSans, DejaVu Sans, Arial, sans-serif';
/**
 * Extra width allowed per label over KitwrightSans's advances, for the viewer's kerning and rounding of
 * font sizes (common practice, no source).
 */
export const SVG_TEXT_WIDTH_MARGIN = 0.04;
const DIGITS = 3;

/** The SVG document of one sheet of a kit. */
export function svgSheet(kit: KitLayout, sheet: LaidOutSheet): string {
  const byId = new Map(kit.pieces.map((p) => [p.id, p]));
  const groups = {
    artwork: [] as string[],
    cut: [] as string[],
    mountain: [] as string[],
    valley: [] as string[],
    labels: [] as string[],
    furniture: [] as string[],
  };
  sheet.placements.forEach((placement, index) => {
    const piece = byId.get(placement.pieceId);
    if (!piece) return;
    const lines = pieceLines(piece, placement, svgPlacementTransform(placement));
    const clip = placement.tile ? ` clip-path="url(#${svgTileClipId(sheet, index)})"` : '';
    if (lines.tabs.length) groups.artwork.push(`<path d="${svgPathOf(lines.tabs, true)}"${clip}/>`);
    if (lines.cut.length) groups.cut.push(`<path d="${svgPathOf(lines.cut, false)}"/>`);
    if (lines.mountain.length) groups.mountain.push(`<path d="${svgPathOf(lines.mountain, false)}"/>`);
    if (lines.valley.length) groups.valley.push(`<path d="${svgPathOf(lines.valley, false)}"/>`);
  });
  const scene = sheetScene(
    kit,
    sheet,
    (text, sizeMm, bold) => textWidthMm(text, sizeMm, bold) * (1 + SVG_TEXT_WIDTH_MARGIN),
  );
  for (const fill of scene.fills) {
    const d = svgPathOf(
      fill.rects.map((r) => [
        [r.xMm, r.yMm],
        [r.xMm + r.widthMm, r.yMm],
        [r.xMm + r.widthMm, r.yMm + r.heightMm],
        [r.xMm, r.yMm + r.heightMm],
      ]),
      true,
    );
    groups[fill.group].push(`<path d="${d}" fill="${fill.color}"/>`);
  }
  for (const stroke of scene.strokes) groups[stroke.group].push(svgStroke(stroke));
  for (const t of scene.texts) {
    const [x, y] = t.atMm.map(svgNumber);
    const rotate = t.angleRad ? ` transform="rotate(${svgNumber((t.angleRad * 180) / Math.PI)} ${x} ${y})"` : '';
    const weight = t.bold ? ' font-weight="bold"' : '';
    groups[t.group].push(
      `<text x="${x}" y="${y}" font-size="${svgNumber(t.sizeMm)}" text-anchor="${t.anchor}"${weight}${rotate}>${svgEscape(t.text)}</text>`,
    );
  }
  const clips = sheet.placements.flatMap((p, index) => {
    const w = p.tile?.windowMm;
    if (!w) return [];
    return `<clipPath id="${svgTileClipId(sheet, index)}"><rect x="${svgNumber(w.xMm)}" y="${svgNumber(w.yMm)}" width="${svgNumber(w.widthMm)}" height="${svgNumber(w.heightMm)}"/></clipPath>`;
  });
  const stroke = (kind: keyof typeof LINE_STYLES) => {
    const s = LINE_STYLES[kind];
    const dash = s.dashMm.length ? ` stroke-dasharray="${s.dashMm.join(' ')}"` : '';
    return `fill="none" stroke="${s.color}" stroke-width="${s.widthMm}"${dash} stroke-linejoin="round"`;
  };
  const w = svgNumber(sheet.widthMm);
  const h = svgNumber(sheet.heightMm);
  return [
    `<?xml version="1.0" encoding="UTF-8"?>`,
    `<svg xmlns="http://www.w3.org/2000/svg" width="${w}mm" height="${h}mm" viewBox="0 0 ${w} ${h}">`,
    `<title>${svgEscape(`${kit.title}, sheet ${sheet.number} of ${kit.sheets.length}`)}</title>`,
    clips.length ? `<defs>${clips.join('')}</defs>` : '',
    `<g id="artwork" fill="${GLUE_TINT}" stroke="none">${groups.artwork.join('')}</g>`,
    `<g id="cut" ${stroke('cut')}>${groups.cut.join('')}</g>`,
    `<g id="mountain-folds" ${stroke('mountain')}>${groups.mountain.join('')}</g>`,
    `<g id="valley-folds" ${stroke('valley')}>${groups.valley.join('')}</g>`,
    `<g id="labels" fill="${TEXT_COLOR}" font-family="${SVG_FONT_FAMILY}" dominant-baseline="central">${groups.labels.join('')}</g>`,
    `<g id="furniture" fill="${TEXT_COLOR}" font-family="${SVG_FONT_FAMILY}" dominant-baseline="central">${groups.furniture.join('')}</g>`,
    `</svg>`,
  ].join('\n');
}

/**
 * The id of a tiled placement's clip path: unique within the sheet's document because it names the placement
 * by its index (two pieces, or two copies of one, can show the same tile row and column on a sheet).
 */
function svgTileClipId(sheet: LaidOutSheet, placementIndex: number): string {
  return `tile-window-${sheet.number}-${placementIndex + 1}`;
}

/** The point transform of a placement, evaluated by svg-path-commander's transformPath (one call per piece). */
export function svgPlacementTransform(placement: Placement): PiecePointTransform {
  return (polylines) => {
    const path = svgPathArray(polylines, false);
    if (path.length === 0) return polylines.map(() => []);
    const moved = SVGPathCommander.normalizePath(
      SVGPathCommander.transformPath(path, {
        translate: [placement.xMm, placement.yMm],
        rotate: (placement.rotationRad * 180) / Math.PI,
        scale: [placement.mirrored ? -1 : 1, -1],
        origin: [0, 0],
      }),
    );
    const out: SheetVec2Mm[][] = [];
    for (const seg of moved) {
      const point: SheetVec2Mm = [Number(seg[seg.length - 2]), Number(seg[seg.length - 1])];
      if (seg[0] === 'M') out.push([point]);
      else out[out.length - 1]!.push(point);
    }
    return out;
  };
}

/** Path commands of polylines in either plane (flat ones go through transformPath onto the sheet). */
function svgPathArray<S extends PlaneSpace>(
  polylines: readonly (readonly PlanePointMm<S>[])[],
  closed: boolean,
): PathArray {
  const path: (string | number)[][] = [];
  for (const line of polylines) {
    line.forEach(([x, y], i) => path.push([i === 0 ? 'M' : 'L', x, y]));
    if (closed && line.length) path.push(['Z']);
  }
  return path as unknown as PathArray;
}

/** A path string of polylines (closed when asked), rounded to µm, built by svg-path-commander. */
export function svgPathOf(polylines: readonly (readonly SheetVec2Mm[])[], closed: boolean): string {
  return SVGPathCommander.pathToString(svgPathArray(polylines, closed), DIGITS);
}

function svgStroke(s: SceneStroke): string {
  const dash = s.dashMm.length ? ` stroke-dasharray="${s.dashMm.join(' ')}"` : '';
  return `<path d="${svgPathOf([s.points], false)}" fill="none" stroke="${s.color}" stroke-width="${s.widthMm}"${dash}/>`;
}

function svgNumber(value: number): string {
  return String(Number(value.toFixed(DIGITS)));
}

function svgEscape(value: string): string {
  return value.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}
