/** The sheet furniture: footer, check square, legend, cut list, and the QR code or, for an unsaved kit, a note in its place. */
import type { LabelMeasure } from './label-placement';
import {
  sheetFurnitureCheckSquareText,
  sheetFurnitureFooterText,
  sheetFurnitureLayout,
} from '../layout/sheet-furniture';
import type { KitLayout, LaidOutSheet, RectMm } from '../layout/types';
import { TEXT_COLOR } from './line-styles';
import { qrRects } from './qr';
import { type SheetScene, sceneText as text } from './scene-types';
import { sceneCutList } from './scene-cut-list';
import { sceneLegend } from './scene-legend';

const FOOTER_SIZE_MM = 2.8;

export function sceneFurniture(scene: SheetScene, kit: KitLayout, sheet: LaidOutSheet, measure: LabelMeasure) {
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
export const QR_PREVIEW_NOTE = [
  'QR code goes here',
  'It prints in this square once you save the kit; it opens the kit page.',
] as const;
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
