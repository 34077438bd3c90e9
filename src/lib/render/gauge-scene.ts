/**
 * The cut-to-length gauges of a sheet as scene primitives: two caption lines, then a bar as long as the
 * part of the rod it shows, ticked every 10 mm (longer every 50 mm) and closed by a tall end tick where the
 * rod starts (part 1) and where it is cut (the last part).
 */
import { CUT_GAUGE_HEIGHT_MM, CUT_GAUGE_TEXT_MM, cutGaugeCaption } from '../layout/cut-gauge';
import type { LaidOutSheet, SheetVec2Mm } from '../layout/types';
import { TEXT_COLOR } from './line-styles';
import type { SceneStroke, SceneText } from './scene-types';

const TICK_MM = 1.6;
const TICK_LONG_MM = 2.6;
const END_TICK_MM = 4;

/** Texts and strokes of every gauge on the sheet. */
export function gaugeScene(sheet: LaidOutSheet): { texts: SceneText[]; strokes: SceneStroke[] } {
  const texts: SceneText[] = [];
  const strokes: SceneStroke[] = [];
  const line = (points: SheetVec2Mm[], widthMm: number) =>
    strokes.push({ points, widthMm, color: TEXT_COLOR, dashMm: [], group: 'labels' });
  for (const g of sheet.gauges ?? []) {
    const [x, top] = [g.xMm, g.yMm];
    const barY = top + CUT_GAUGE_HEIGHT_MM - END_TICK_MM / 2;
    cutGaugeCaption(g).forEach((value, i) =>
      texts.push({
        text: value,
        atMm: [x, top + CUT_GAUGE_TEXT_MM * (0.9 + 1.25 * i)],
        angleRad: 0,
        sizeMm: CUT_GAUGE_TEXT_MM,
        bold: i === 0,
        anchor: 'start',
        group: 'labels',
      }),
    );
    const length = g.toMm - g.fromMm;
    line(
      [
        [x, barY],
        [x + length, barY],
      ],
      0.5,
    );
    for (let t = Math.ceil(g.fromMm / 10) * 10; t <= g.toMm + 1e-9; t += 10) {
      const h = t % 50 === 0 ? TICK_LONG_MM : TICK_MM;
      line(
        [
          [x + t - g.fromMm, barY],
          [x + t - g.fromMm, barY - h],
        ],
        0.25,
      );
    }
    const ends = [...(g.part === 1 ? [0] : []), ...(g.part === g.parts ? [length] : [])];
    for (const e of ends)
      line(
        [
          [x + e, barY + END_TICK_MM / 2],
          [x + e, barY - END_TICK_MM / 2],
        ],
        0.5,
      );
  }
  return { texts, strokes };
}
