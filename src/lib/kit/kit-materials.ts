/**
 * The kit's materials list beyond paper and glue: thread for every wire boom (always, with its length) and
 * what replaces each part too fine for paper (part-substitutes.ts), with the usual caution where a
 * substitute can hurt someone. One list for the kit page, the handout and the preview.
 */
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
