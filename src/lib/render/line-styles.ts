/**
 * Kitwright's own line styles for the three kinds of line on a sheet. Each differs from the others by its
 * dash pattern as well as its colour, so a greyscale or colour-blind reading still tells them apart: cut is
 * solid, a mountain fold is a long dash with a short tick between, a valley fold is an even row of short
 * dashes. Widths and dashes are mm on the sheet.
 */
import type { LineKind } from '../geometry/types';
import { FOLD_WORDS } from './fold-words';

export interface LineStyle {
  /** Name in the legend. */
  label: string;
  /** What to do with it, as the legend says. */
  action: string;
  widthMm: number;
  /** sRGB colour, #rrggbb. */
  color: string;
  /** Dash pattern, mm: alternating on and off lengths; [] is solid. */
  dashMm: number[];
}

export const LINE_STYLES: Record<LineKind, LineStyle> = {
  cut: { label: 'Cut line', action: 'cut along it', widthMm: 0.3, color: '#1b1b1b', dashMm: [] },
  mountain: {
    label: FOLD_WORDS.mountain.name,
    action: FOLD_WORDS.mountain.action,
    widthMm: 0.3,
    color: '#a04a00',
    dashMm: [4.2, 1, 0.8, 1],
  },
  valley: {
    label: FOLD_WORDS.valley.name,
    action: FOLD_WORDS.valley.action,
    widthMm: 0.35,
    color: '#1f5aa6',
    dashMm: [1.4, 1.1],
  },
};

/** Guides that are not cut or folded: tile edges, overlap strips and the check square. */
export const GUIDE_STYLE = { widthMm: 0.2, color: '#6b6b6b', dashMm: [0.6, 0.9] } as const;
/** Colour of printed text. */
export const TEXT_COLOR = '#1b1b1b';
/** Light tint under glue tabs and overlap strips, so glue areas show at a glance. */
export const GLUE_TINT = '#e6e6e6';
