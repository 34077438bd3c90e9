/** The renderer-neutral primitives of a sheet scene (texts, strokes, fills in sheet mm, y down) and their helpers. */
import type { RectMm, SheetVec2Mm } from '../layout/types';

export interface SceneText {
  text: string;
  /** Centre of the text's left end (anchor start) or middle (anchor middle), mm. */
  atMm: SheetVec2Mm;
  /** Baseline direction, radians clockwise from +x on the sheet. */
  angleRad: number;
  sizeMm: number;
  bold: boolean;
  anchor: 'start' | 'middle';
  group: 'labels' | 'furniture';
  /** Present on a glue mark: its number, which side of the joint it is on, and the piece it is printed on. */
  mark?: SceneMark;
  /** True on a piece's step badge. */
  badge?: boolean;
  /** Present on a mark printed beside its piece: the point on the piece its leader line ends at, mm. */
  calloutMm?: SheetVec2Mm;
}
/** A glue mark's joint and side: the tab, or the edge the tab glues to. */
export interface SceneMark {
  number: number;
  side: 'tab' | 'edge';
  pieceId: string;
}
export interface SceneStroke {
  points: SheetVec2Mm[];
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

export function sceneText(
  value: string,
  atMm: SheetVec2Mm,
  sizeMm: number,
  group: SceneText['group'],
  extra: Partial<SceneText> = {},
): SceneText {
  return { text: value, atMm, angleRad: 0, sizeMm, bold: false, anchor: 'middle', group, ...extra };
}

export function sceneRectContains(p: SheetVec2Mm, w?: RectMm): boolean {
  return !w || (p[0] >= w.xMm && p[0] <= w.xMm + w.widthMm && p[1] >= w.yMm && p[1] <= w.yMm + w.heightMm);
}
