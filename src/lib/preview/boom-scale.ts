/**
 * The deployed span of a model at kit scale set beside a standing person and a classroom floor, so students
 * see how far the booms reach. Lengths in mm at kit scale; the person and the room are real sizes.
 */
import type { Model } from '../geometry/model-schema';
import { modelSpan } from '../geometry/model-span';
import { wireBoomThread } from '../geometry/wire-boom';
import { VENUES, VENUE_MARGIN_FRACTION } from '../layout/venues';
import { lengthLabel, type UnitSystem } from '../layout/units';

/** Height of the person drawn for size, mm (common practice, no source: a round adult height). */
export const PERSON_HEIGHT_MM = 1700;

export interface BoomScale {
  scaleDenominator: number;
  /** Tip-to-tip floor footprint at kit scale, longer side first, mm. */
  footprintMm: [number, number];
  /** Each wire boom's deployed length at kit scale, mm (the thread to cut is longer by the tie-off). */
  booms: { label: string; deployedLengthMm: number }[];
  personHeightMm: number;
  classroom: { label: string; lengthMm: number; widthMm: number };
  /** Whether the footprint fits the classroom with VENUE_MARGIN_FRACTION clear on every side. */
  fitsClassroom: boolean;
  /** The longer footprint side in person heights. */
  personMultiple: number;
  description: string;
}

/** The span of a parsed model at 1:scaleDenominator beside PERSON_HEIGHT_MM and the classroom venue. */
export function boomScale(model: Model, scaleDenominator: number, units: UnitSystem = 'metric'): BoomScale {
  const [a, b] = modelSpan(model).footprintMm.map((d) => d / scaleDenominator) as [number, number];
  const room = VENUES.classroom;
  const [L, W] = [Math.max(room.lengthMm, room.widthMm), Math.min(room.lengthMm, room.widthMm)].map(
    (d) => d * (1 - 2 * VENUE_MARGIN_FRACTION),
  ) as [number, number];
  const fitsClassroom = a <= L && b <= W;
  const booms = model.appendages.flatMap((p) =>
    p.kind === 'wire-boom'
      ? [
          {
            label: p.label,
            deployedLengthMm: wireBoomThread(p.id, p.label, p.lengthM, scaleDenominator).deployedLengthMm,
          },
        ]
      : [],
  );
  const personMultiple = a / PERSON_HEIGHT_MM;
  const what = booms.length > 0 ? 'With its booms out, the model spans' : 'The model spans';
  const times =
    personMultiple >= 0.1
      ? `about ${personMultiple.toFixed(1)} times the height of a ${lengthLabel(PERSON_HEIGHT_MM, units)} person`
      : `far shorter than a ${lengthLabel(PERSON_HEIGHT_MM, units)} person`;
  const description =
    `${what} ${lengthLabel(a, units)} × ${lengthLabel(b, units)} at 1:${scaleDenominator}: ${times}. ` +
    (fitsClassroom
      ? `It fits a ${room.label.toLowerCase()} with room to walk around it.`
      : `It does not fit a ${room.label.toLowerCase()}; lay it out in a gym or outdoors.`);
  return {
    scaleDenominator,
    footprintMm: [a, b],
    booms,
    personHeightMm: PERSON_HEIGHT_MM,
    classroom: { label: room.label, lengthMm: room.lengthMm, widthMm: room.widthMm },
    fitsClassroom,
    personMultiple,
    description,
  };
}
