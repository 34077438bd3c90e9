/** Every demo model laid out at the scales and paper sizes the label tests sweep (test-only helper). */
import { modelPatterns } from '../../../src/lib/geometry/model-patterns';
import { sheetPackKit } from '../../../src/lib/layout/sheet-packer';
import { SHEET_SIZES } from '../../../src/lib/layout/sheet-sizes';
import type { KitLayout } from '../../../src/lib/layout/types';
import { InputError } from '../../../src/lib/errors';
import { DEMO_IDS, demoModel } from '../geometry/fixtures';

/** The scales issue 10 names for the label sweep. */
export const SWEEP_SCALES = [10, 20, 25, 50] as const;
export const SWEEP_PAPER_IDS = Object.values(SHEET_SIZES)
  .filter((s) => s.kind === 'paper')
  .map((s) => s.id);

/** One demo kit as the renderers get it; null when the packer refuses it (more than MAX_SHEETS sheets). */
export function demoKit(id: string, scaleDenominator: number, sheetSizeId: string): KitLayout | null {
  const patterns = modelPatterns(demoModel(id), { scaleDenominator, paperGsm: 160 });
  const { threads, substitutes } = patterns;
  const sheetSize = SHEET_SIZES[sheetSizeId as keyof typeof SHEET_SIZES];
  const units = sheetSize.id === 'letter' || sheetSize.id === 'legal' || sheetSize.id === 'tabloid' ? 'us' : 'metric';
  try {
    const { pieces, sheets } = sheetPackKit(patterns.pieces, {
      sheetSize,
      units,
      copies: 1,
      substitutes,
      paperGsm: 160,
    });
    return {
      title: id,
      scaleDenominator,
      sheetSize,
      units,
      pieces,
      sheets,
      threads,
      substitutes,
      gradeBand: '6-8',
      cutList: [],
      qrUrl: 'https://kitwright.example/k/demo',
      engineVersion: 'test',
    };
  } catch (error) {
    if (error instanceof InputError) return null;
    throw error;
  }
}

/** Every (model, scale, paper) case of the sweep as [name, id, scale, paper]. */
export const SWEEP_CASES: [string, string, number, string][] = DEMO_IDS.flatMap((id) =>
  SWEEP_SCALES.flatMap((n) =>
    SWEEP_PAPER_IDS.map((p) => [`${id} 1:${n} ${p}`, id, n, p] as [string, string, number, string]),
  ),
);

/**
 * Known open defects, reported, which the sweeps expect to fail so they notice a fix: cases whose parts are
 * smaller than their marks (the thermal puck 10 mm across at 1:50 on A5), where marks go beside the piece
 * with leader lines and one finds no clear spot (such scales are below every
 * grade band's buildability minimums).
 */
export const SWEEP_CLEARANCE_TOO_SMALL = new Set(['thermal-puck 1:50 a5']);
export const SWEEP_MARKS_TOO_SMALL = new Set(['thermal-puck 1:50 a5']);
