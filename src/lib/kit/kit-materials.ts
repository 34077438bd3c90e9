/**
 * The kit's materials list beyond paper and glue: thread for every wire boom (always, with its length) and
 * what replaces each part too fine for paper (part-substitutes.ts), with the usual caution where a
 * substitute can hurt someone. One list for the kit page, the handout and the preview.
 */
import { HAZARD_CAUTIONS, SAFETY_GENERAL_NOTE } from '../activities/safety';
import type { BuildGradeBand } from '../geometry/buildability';
import { partSubstituteCaution, partSubstituteWords, type PartSubstitute } from '../geometry/part-substitutes';
import type { WireBoomThread } from '../geometry/types';
import { lengthLabel, type UnitSystem } from '../layout/units';

export interface KitMaterial {
  text: string;
  /** The usual caution for this material, or null. */
  caution: string | null;
}

/** The lines of the materials list, wire booms first, then substitutes in the model's order. */
export function kitMaterials(kit: {
  threads: readonly WireBoomThread[];
  substitutes: readonly PartSubstitute[];
  gradeBand: BuildGradeBand;
  units: UnitSystem;
}): KitMaterial[] {
  const threads = kit.threads.map((t) => ({
    text: `${t.label}: thread, cut ${lengthLabel(t.threadLengthMm, kit.units)} (${lengthLabel(t.deployedLengthMm, kit.units)} laid out plus the knots)`,
    caution: null,
  }));
  const substitutes = kit.substitutes.map((s) => ({
    text: partSubstituteWords(s, kit.gradeBand),
    caution: partSubstituteCaution(s),
  }));
  return [...threads, ...substitutes];
}

/** What every paper kit needs before anything on the materials list (common practice, no source). */
export const KIT_MATERIALS_BASIC =
  'Scissors, a glue stick and a ruler; the printed sheets on card of the weight chosen.';

/**
 * The kit's materials and cautions as the PDF's first instructions page prints them: the basics, then the
 * materials list; the scissors caution (every paper kit is cut out), each material's caution once, and the
 * note that the school's rules come first.
 */
export function kitMaterialLines(kit: Parameters<typeof kitMaterials>[0]): { materials: string[]; cautions: string[] } {
  const list = kitMaterials(kit);
  const cautions = [
    HAZARD_CAUTIONS.scissors.caution,
    ...new Set(list.flatMap((m) => (m.caution ? [m.caution] : []))),
    SAFETY_GENERAL_NOTE,
  ];
  return { materials: [KIT_MATERIALS_BASIC, ...list.map((m) => m.text)], cautions };
}
