/**
 * Parts too fine for paper at a kit's scale, and what the class uses instead: a rigid boom thinner than a
 * pencil becomes a drinking straw, a bamboo skewer or a thin dowel cut to the boom's length (with a printed
 * gauge to cut it against); a dish or nozzle whose cone is smaller than the class can roll becomes a flat
 * disc. Wire booms are always thread (wire-boom.ts). Lengths in mm at kit scale.
 */
import { BUILD_GRADE_BAND_WORDS, BUILDABILITY_MINIMUMS, buildabilityMm, ROLL_DIAMETER_MIN_MM } from './buildability';
import type { BuildGradeBand } from './buildability';
import type { Vec3Mm } from './types';

/** Everyday rods a boom can be cut from, thinnest last. From memory: usual sizes sold for crafts and drinks. */
export const BOOM_STOCK = {
  /** A drinking straw: about 6 mm across and 200 mm long (from memory). */
  'drinking-straw': { words: 'a drinking straw', diameterMm: 6, lengthMm: 200 },
  /** A bamboo skewer: about 3 mm across and 300 mm long (from memory). */
  'bamboo-skewer': { words: 'a bamboo skewer', diameterMm: 3, lengthMm: 300 },
  /** A craft dowel: about 6 mm across and 900 mm long (from memory). */
  'wooden-dowel': { words: 'a thin wooden dowel', diameterMm: 6, lengthMm: 900 },
} as const;
export type BoomStock = keyof typeof BOOM_STOCK;

/** What replaces a part on the kit's materials list. */
export type PartSubstitute =
  | {
      kind: 'boom-stock';
      partId: string;
      label: string;
      stock: BoomStock;
      /** Cut to this length, mm at kit scale (the boom's length). */
      lengthMm: number;
      /** The boom's own diameter at kit scale, mm (what the paper tube would have been). */
      diameterMm: number;
      /** Where the rod stands on the assembled model: from its foot on the body to its tip, model mm. */
      fromMm: Vec3Mm;
      toMm: Vec3Mm;
    }
  | {
      kind: 'flat-disc';
      partId: string;
      label: string;
      /** The disc printed on the sheet, mm: the dish's or nozzle's wide end. */
      diameterMm: number;
    };

/**
 * The rod for a boom of diameterMm × lengthMm, or null when a rolled paper tube is thick enough
 * (ROLL_DIAMETER_MIN_MM). A straw when the boom is nearer a straw's width than a skewer's and the straw is
 * long enough; else a skewer when long enough; else a dowel.
 */
export function boomStockFor(diameterMm: number, lengthMm: number): BoomStock | null {
  if (diameterMm >= ROLL_DIAMETER_MIN_MM) return null;
  const straw = BOOM_STOCK['drinking-straw'];
  const skewer = BOOM_STOCK['bamboo-skewer'];
  if (diameterMm >= (straw.diameterMm + skewer.diameterMm) / 2 && lengthMm <= straw.lengthMm) return 'drinking-straw';
  if (lengthMm <= skewer.lengthMm) return 'bamboo-skewer';
  return 'wooden-dowel';
}

/** Whether a cone whose wide end is diameterMm across is too small for the band to roll and glue. */
export function coneTooSmall(diameterMm: number, band: BuildGradeBand): boolean {
  return diameterMm < BUILDABILITY_MINIMUMS[band].coneDiameterMm;
}

/**
 * The line of the materials list for a substitute, e.g. "Axial boom, top: a bamboo skewer cut to 300 mm
 * (the paper tube would be 5.0 mm thick, thinner than a pencil)".
 */
export function partSubstituteWords(s: PartSubstitute, band: BuildGradeBand): string {
  return `${s.label}: ${partSubstituteUse(s, band)}`;
}

/** What stands in for the part and why, without its name (the materials line after the colon). */
export function partSubstituteUse(s: PartSubstitute, band: BuildGradeBand): string {
  if (s.kind === 'boom-stock') {
    const stock = BOOM_STOCK[s.stock];
    return `${stock.words} cut to ${buildabilityMm(s.lengthMm)} (the paper tube would be ${buildabilityMm(s.diameterMm)} thick, thinner than a pencil)`;
  }
  return `the flat disc on the sheet, ${buildabilityMm(s.diameterMm)} across (a cone that small is too fine for ${BUILD_GRADE_BAND_WORDS[band]} to roll)`;
}

/** The usual caution for a substitute that can hurt someone, or null. */
export function partSubstituteCaution(s: PartSubstitute): string | null {
  if (s.kind === 'boom-stock' && s.stock !== 'drinking-straw')
    return 'An adult cuts skewers and dowels (snip off any point first) and hands them out; follow your school’s rules for sharp tools.';
  return null;
}
