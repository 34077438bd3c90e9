/**
 * The plain-words scale summary of a kit: how big the body comes out on the chosen sheet, how much thread
 * each wire boom takes, and whether the full span fits the chosen venue, e.g. "body 12 cm across on US Letter
 * at 1:20; each wire boom 1.75 m long (cut 1.85 m of thread); the full span fits the classroom (9 × 7 m)".
 */
import type { Model } from '../geometry/model-schema';
import { modelSpan } from '../geometry/model-span';
import { SMALLSAT_SIZES_M } from '../geometry/body-shape';
import { wireBoomThread } from '../geometry/wire-boom';
import { lengthLabel, type UnitSystem } from '../layout/units';
import { VENUE_MARGIN_FRACTION, type Venue } from '../layout/venues';

export interface KitSummaryInput {
  model: Model;
  scaleDenominator: number;
  /** The sheet's label, e.g. "US Letter". */
  sheetLabel: string;
  venue: Venue;
  units: UnitSystem;
}

export interface KitSummary {
  /** The whole summary as one sentence-like line (clauses joined by semicolons). */
  text: string;
  /** The clauses, for a list. */
  clauses: string[];
  /** Whether the deployed span at this scale fits the venue inside its border. */
  spanFitsVenue: boolean;
  /** Deployed footprint at kit scale, longer side first, mm. */
  spanMm: [number, number];
}

/** The body's size at kit scale in words ("12 cm across", "5 cm × 5 cm × 17 cm"); real metres in, mm out. */
export function kitSummaryBody(model: Model, scaleDenominator: number, units: UnitSystem): string {
  const at = (m: number) => lengthLabel((m * 1000) / scaleDenominator, units);
  const b = model.body;
  if (b.kind === 'prism') return `${at(b.sizeM)} across the ${b.across}, ${at(b.heightM)} tall`;
  if (b.kind === 'cylinder') return `${at(b.diameterM)} across, ${at(b.heightM)} tall`;
  const [w, d, h] = b.smallsat ? SMALLSAT_SIZES_M[b.smallsat] : [b.widthM!, b.depthM!, b.heightM!];
  return `${at(w)} × ${at(d)} × ${at(h)}`;
}

/** The summary of a parsed model at 1:scaleDenominator; a model without wire booms gets no thread clause. */
export function kitSummary({ model, scaleDenominator: n, sheetLabel, venue, units }: KitSummaryInput): KitSummary {
  const clauses = [`body ${kitSummaryBody(model, n, units)} on ${sheetLabel} at 1:${n}`];
  const threads = model.appendages.flatMap((a) =>
    a.kind === 'wire-boom' ? [wireBoomThread(a.id, a.label, a.lengthM, n)] : [],
  );
  const lengths = [...new Set(threads.map((t) => Math.round(t.deployedLengthMm)))];
  if (threads.length > 0 && lengths.length === 1) {
    const t = threads[0]!;
    clauses.push(
      `${threads.length === 1 ? 'the' : 'each'} wire boom ${lengthLabel(t.deployedLengthMm, units)} long (cut ${lengthLabel(t.threadLengthMm, units)} of thread)`,
    );
  } else {
    for (const t of threads) {
      clauses.push(
        `${t.label} ${lengthLabel(t.deployedLengthMm, units)} long (cut ${lengthLabel(t.threadLengthMm, units)} of thread)`,
      );
    }
  }
  const [a, b] = modelSpan(model).footprintMm.map((d) => d / n) as [number, number];
  const keep = 1 - 2 * VENUE_MARGIN_FRACTION;
  const [L, W] = [Math.max(venue.lengthMm, venue.widthMm) * keep, Math.min(venue.lengthMm, venue.widthMm) * keep];
  const spanFitsVenue = a <= L && b <= W;
  const span = `${lengthLabel(a, units)} × ${lengthLabel(b, units)}`;
  clauses.push(
    spanFitsVenue
      ? `the full span (${span}) fits the ${venue.label}`
      : `the full span (${span}) is too big for the ${venue.label}; choose a larger venue or a smaller scale for the floor layout`,
  );
  return { text: clauses.join('; '), clauses, spanFitsVenue, spanMm: [a, b] };
}
