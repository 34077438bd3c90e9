/**
 * The printed glue marks: the number a tab and the edge it glues to both carry, how large it prints, and
 * whether it needs an underline because it reads as another number upside down (a cut-out piece is often
 * turned, so 6 and 9, 16 and 91, 18 and 81 would be confused).
 */
import { BUILD_GRADE_BAND_DEFAULT, BUILDABILITY_MINIMUMS } from '../geometry/buildability';

/** Each digit as it reads turned half a turn; digits missing here read as no digit (2, 3, 4, 5, 7). */
const DIGIT_TURNED: Readonly<Record<string, string>> = { '0': '0', '1': '1', '6': '9', '8': '8', '9': '6' };

/** The mark read upside down, or null when some digit turned is no digit at all (so it cannot be misread). */
export function glueMarkTurned(text: string): string | null {
  let turned = '';
  for (const ch of text) {
    const t = DIGIT_TURNED[ch];
    if (t === undefined) return null;
    turned = t + turned;
  }
  return turned;
}

/**
 * Whether a mark is underlined: it reads as a different number upside down. The underline shows which way
 * is down, as on numbered balls and bingo cards (common practice, no source).
 */
export function glueMarkUnderlined(text: string): boolean {
  const turned = glueMarkTurned(text);
  return turned !== null && turned !== text;
}

/** Height a glue mark prints at when there is room, mm (common practice, no source: about 10 pt). */
export const GLUE_MARK_SIZE_MM = 3.5;
/**
 * Smallest glue mark when the kit names no grade band, mm: the default band's smallest label from the
 * buildability minimums (grades 6–8).
 */
export const GLUE_MARK_MIN_MM_DEFAULT = BUILDABILITY_MINIMUMS[BUILD_GRADE_BAND_DEFAULT].labelMm;

/** Sizes tried for a mark, largest first, none below minMm (minMm itself last). */
export function glueMarkSizesMm(minMm: number = GLUE_MARK_MIN_MM_DEFAULT): number[] {
  const sizes = [Math.max(GLUE_MARK_SIZE_MM, minMm * 1.2), (GLUE_MARK_SIZE_MM + minMm) / 2].filter((s) => s > minMm);
  return [...sizes, minMm];
}

/** Underline of a mark: below the text's middle line by this many em, as thick as this many em. */
export const GLUE_MARK_UNDERLINE_EM = { offset: 0.42, width: 0.07 } as const;
