/** The legend on the first sheet: how to read the lines, tabs and tiles of a kit. */
import type { RectMm } from '../layout/types';
import { LINE_STYLES } from './line-styles';
import { type SheetScene, sceneText as text } from './scene-types';

/** The legend rows, also used by tests to check the font covers them. */
export const LEGEND_TITLE = 'How to read this kit';
export const LEGEND_NOTES = ['Tab 7 glues under the edge marked 7', 'Grey tint: glue area · tiles: letter on letter'];

export function sceneLegend(scene: SheetScene, box: RectMm) {
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
