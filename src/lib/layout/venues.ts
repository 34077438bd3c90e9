/**
 * Venues for laying a model out at scale, and the largest scale at which a model's deployed span fits one
 * with a margin. Sizes in mm; presets from published court and field dimensions where there are any.
 */
import { z } from 'zod';
import type { Model } from '../geometry/model-schema';
import type { WireBoomThread } from '../geometry/types';
import { modelSpan } from '../geometry/model-span';
import { wireBoomThread } from '../geometry/wire-boom';
import { feetToMm, lengthLabel, type UnitSystem } from './units';
import { scaleUsualAtLeast } from './scale-ratios';

export interface Venue {
  id: string;
  /** Lower-case words that read after "the" ("fits the classroom (9 × 7 m)"). */
  label: string;
  lengthMm: number;
  widthMm: number;
  /** Where the size comes from. */
  source: string;
}

export const VENUES = {
  // Common practice, no source: a typical classroom floor, with desks pushed back.
  classroom: {
    id: 'classroom',
    label: 'classroom (9 × 7 m)',
    lengthMm: 9000,
    widthMm: 7000,
    source: 'common practice, no source',
  },
  'gym-fiba': {
    id: 'gym-fiba',
    label: 'gym with a FIBA basketball court (28 × 15 m)',
    lengthMm: 28000,
    widthMm: 15000,
    source: 'FIBA Official Basketball Rules, art. 2',
  },
  'gym-nfhs': {
    id: 'gym-nfhs',
    label: 'gym with a high-school basketball court (84 × 50 ft)',
    lengthMm: feetToMm(84),
    widthMm: feetToMm(50),
    source: 'NFHS basketball rules, rule 1',
  },
  'football-field': {
    id: 'football-field',
    label: 'football field with end zones (360 × 160 ft)',
    lengthMm: feetToMm(360),
    widthMm: feetToMm(160),
    source: 'NFHS football rules, rule 1',
  },
} as const satisfies Record<string, Venue>;
export type VenueId = keyof typeof VENUES;

/** Clear border kept on every side of a layout, as a fraction of each venue dimension (common practice, no source). */
export const VENUE_MARGIN_FRACTION = 0.05;

export const CustomVenueSchema = z.object({
  lengthM: z
    .number({ invalid_type_error: 'the venue length must be a number of metres, e.g. 9' })
    .finite('the venue length must be a finite number of metres')
    .positive('the venue length must be more than 0 m')
    .max(10_000, 'the venue length must be at most 10 km'),
  widthM: z
    .number({ invalid_type_error: 'the venue width must be a number of metres, e.g. 7' })
    .finite('the venue width must be a finite number of metres')
    .positive('the venue width must be more than 0 m')
    .max(10_000, 'the venue width must be at most 10 km'),
});

/** A custom venue from a parsed length and width in metres. */
export function venueCustom({ lengthM, widthM }: z.infer<typeof CustomVenueSchema>): Venue {
  return {
    id: 'custom',
    label: `space of ${lengthM} × ${widthM} m`,
    lengthMm: lengthM * 1000,
    widthMm: widthM * 1000,
    source: 'entered by the teacher',
  };
}

export interface VenueScale {
  /** Largest 1:N (any whole N) at which the span fits inside the margin. */
  scaleDenominator: number;
  /** Largest of the usual ratios at which it fits (may be smaller than scaleDenominator's scale). */
  usualScaleDenominator: number;
  /** Footprint laid out at scaleDenominator, mm. */
  laidOutMm: [number, number];
  threads: WireBoomThread[];
  explanation: string;
}

/** The venue scale of a parsed model: span, scale, thread lengths and a plain-words explanation. */
export function solveVenueScale(model: Model, venue: Venue, units: UnitSystem = 'metric'): VenueScale {
  const [a, b] = modelSpan(model).footprintMm;
  const [L, W] = [Math.max(venue.lengthMm, venue.widthMm), Math.min(venue.lengthMm, venue.widthMm)].map(
    (d) => d * (1 - 2 * VENUE_MARGIN_FRACTION),
  ) as [number, number];
  // Longer side of the footprint along the longer side of the venue is never worse for a rectangle in a rectangle.
  const exact = Math.max(a / L, b / W, 1);
  const scaleDenominator = Math.ceil(exact - 1e-9);
  const usualScaleDenominator = scaleUsualAtLeast(scaleDenominator) ?? scaleDenominator;
  const threads = model.appendages.flatMap((p) =>
    p.kind === 'wire-boom' ? [wireBoomThread(p.id, p.label, p.lengthM, scaleDenominator)] : [],
  );
  const laidOutMm: [number, number] = [a / scaleDenominator, b / scaleDenominator];
  const fitsLifeSize = scaleDenominator === 1;
  const explanation =
    `${model.name} spans ${lengthLabel(a, units)} × ${lengthLabel(b, units)} with everything deployed. ` +
    (fitsLifeSize
      ? `It fits the ${venue.label} at full size (1:1), with a ${VENUE_MARGIN_FRACTION * 100} % border on every side.`
      : `The largest scale that fits the ${venue.label} with a ${VENUE_MARGIN_FRACTION * 100} % border on every side is 1:${scaleDenominator}, ` +
        `where it lays out ${lengthLabel(laidOutMm[0], units)} × ${lengthLabel(laidOutMm[1], units)}` +
        (usualScaleDenominator !== scaleDenominator
          ? `; the nearest usual ratio is 1:${usualScaleDenominator}.`
          : '.')) +
    (threads.length > 0
      ? ` Cut each wire boom's thread to ${lengthLabel(threads[0]!.threadLengthMm, units)} (its length at scale plus the tie-off allowance).`
      : '');
  return { scaleDenominator, usualScaleDenominator, laidOutMm, threads, explanation };
}
