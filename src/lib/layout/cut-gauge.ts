/**
 * Cut-to-length gauges: for each boom replaced by a straw, skewer or dowel (part-substitutes.ts), a printed
 * bar as long as the rod must be, ticked every centimetre, to lay the rod on and mark it. A gauge longer
 * than a sheet's free width is printed in numbered parts laid end to end ("part 1 of 2: 0–180 mm").
 */
import { BOOM_STOCK, type PartSubstitute } from '../geometry/part-substitutes';

/** Height a gauge takes on the sheet: two caption lines above and its bar with ticks, mm. */
export const CUT_GAUGE_HEIGHT_MM = 12;
/** Narrowest box a gauge takes, so its caption has room beside a short bar, mm (common practice, no source). */
export const CUT_GAUGE_MIN_WIDTH_MM = 70;
/** Caption text size, mm. */
export const CUT_GAUGE_TEXT_MM = 2.6;

/** One printed part of a gauge, before it is placed. */
export interface CutGaugePart {
  partId: string;
  label: string;
  /** What the rod is cut from, in words (e.g. "a bamboo skewer"). */
  stockWords: string;
  /** The whole length to cut, mm. */
  totalMm: number;
  /** The span of the whole length this part shows, mm from the rod's end. */
  fromMm: number;
  toMm: number;
  part: number;
  parts: number;
}

/** A gauge part placed on a sheet: its bar runs from (xMm, yMm + CUT_GAUGE_HEIGHT_MM) rightwards. */
export interface PlacedCutGauge extends CutGaugePart {
  xMm: number;
  yMm: number;
}

/** The parts of every rod's gauge, each at most maxPartMm long (and split evenly). */
export function cutGaugeParts(substitutes: readonly PartSubstitute[], maxPartMm: number): CutGaugePart[] {
  const out: CutGaugePart[] = [];
  for (const s of substitutes) {
    if (s.kind !== 'boom-stock') continue;
    const parts = Math.max(1, Math.ceil(s.lengthMm / maxPartMm));
    const step = s.lengthMm / parts;
    for (let i = 0; i < parts; i++)
      out.push({
        partId: s.partId,
        label: s.label,
        stockWords: BOOM_STOCK[s.stock].words,
        totalMm: s.lengthMm,
        fromMm: i * step,
        toMm: (i + 1) * step,
        part: i + 1,
        parts,
      });
  }
  return out;
}

/** The two caption lines printed above a gauge part. */
export function cutGaugeCaption(g: CutGaugePart): [string, string] {
  const cut = `Cut ${g.stockWords} to ${Math.round(g.totalMm)} mm`;
  if (g.parts === 1) return [g.label, `${cut}: lay it on this bar, end to end`];
  return [
    `${g.label}, gauge part ${g.part} of ${g.parts}`,
    `${cut}: this part is ${Math.round(g.fromMm)}–${Math.round(g.toMm)} mm`,
  ];
}
