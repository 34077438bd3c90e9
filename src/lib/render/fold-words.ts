/**
 * The one fold vocabulary of a kit: the sheet legend, the instructions page, the handout and the 3D preview
 * all say it with these words. Printed side facing the reader: a mountain fold sends the paper on both sides
 * of the line away, so the line rises as a ridge; a valley fold brings them toward the reader, so the line
 * sinks into a valley (origami's usual meaning of the two names).
 */
export const FOLD_WORDS = {
  mountain: { name: 'Mountain fold', action: 'fold away from you, a ridge' },
  valley: { name: 'Valley fold', action: 'fold toward you, a valley' },
  /** Both in one short clause, for step texts. */
  short: 'mountain folds away from you, valley folds toward you',
  /** How to hold the sheet while reading the fold lines. */
  holding: 'Hold each piece printed side up.',
} as const;

/** A fold kind's legend line, "Mountain fold: fold away from you, a ridge". */
export function foldWordsLine(kind: 'mountain' | 'valley'): string {
  return `${FOLD_WORDS[kind].name}: ${FOLD_WORDS[kind].action}`;
}
