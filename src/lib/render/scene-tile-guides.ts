/** Tile guides of a tiled piece (window, overlap strips, caption) and the registration crosses with their letters. */
import { TILE_CAPTION_MM } from '../layout/tiling';
import type { Placement, RectMm, SheetVec2Mm } from '../layout/types';
import { GLUE_TINT, GUIDE_STYLE, TEXT_COLOR } from './line-styles';
import { type SceneText, type SheetScene, sceneText as text } from './scene-types';
import { SceneLabels } from './scene-labels';
import type { LabelMeasure } from './label-placement';

const NUMBER_SIZE_MM = 2.6;

export const ALIGNMENT_STYLE = { widthMm: 0.25, color: TEXT_COLOR, dashMm: [], group: 'labels' as const };
/** Half the length of a registration cross's arms, mm. */
const ALIGNMENT_ARM_MM = 3;

/** The two strokes of a registration cross centred on a point. */
export function sceneAlignmentCross([x, y]: SheetVec2Mm): SheetVec2Mm[][] {
  const arm = ALIGNMENT_ARM_MM;
  return [
    [
      [x - arm, y],
      [x + arm, y],
    ],
    [
      [x, y - arm],
      [x, y + arm],
    ],
  ];
}

/** A registration cross's letter in the first clear spot round the cross. */
export function sceneAlignmentLetter(labels: SceneLabels, at: SheetVec2Mm, letter: string) {
  // Above right first, then the other quarters, then farther out.
  const homes: [SheetVec2Mm, SceneText['anchor']][] = [0.6, 2.5, 5].flatMap((gap) => {
    const d = ALIGNMENT_ARM_MM + gap;
    return [
      [[at[0] + d, at[1] - d], 'start'],
      [[at[0] + d, at[1] + d], 'start'],
      [[at[0] - d, at[1] - d], 'middle'],
      [[at[0] - d, at[1] + d], 'middle'],
    ] as [SheetVec2Mm, SceneText['anchor']][];
  });
  const candidates = homes.map(([p, anchor]) => text(letter, p, NUMBER_SIZE_MM, 'labels', { bold: true, anchor }));
  if (!labels.tryPlace(candidates)) labels.reserve(candidates[0]!);
}

/** A tile's window outline, its overlap strips shaded, and its caption (measured with `measure`) below it. */
export function sceneTileGuides(scene: SheetScene, placement: Placement, measure: LabelMeasure) {
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
  const [row, col] = [tile.row + 1, tile.col + 1];
  const where = `row ${row} of ${tile.rows}, column ${col} of ${tile.cols}`;
  // The caption stays under its own window, so tiles packed side by side keep theirs apart: the longest form
  // that fits the window's width (the gluing step is on the wider tiles of the same piece too).
  const forms = [`Tile ${where}${step}`, `Tile ${where}`, `Row ${row}, column ${col}`, `Row ${row} col ${col}`];
  const caption = forms.find((f) => measure(f, CAPTION_SIZE_MM, false) <= w.widthMm) ?? forms.at(-1)!;
  scene.texts.push(text(caption, [w.xMm, b + TILE_CAPTION_MM / 2], CAPTION_SIZE_MM, 'furniture', { anchor: 'start' }));
}

/** Text size of a tile's caption, mm. */
const CAPTION_SIZE_MM = 2.2;
