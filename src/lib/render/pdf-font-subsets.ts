/**
 * The font programs jspdf embeds, kept between documents. At output jspdf writes each Identity-H face as a
 * TrueType subset of the glyphs the document used (its TTFFont's `subset.encode(glyphIds, indexToLocFormat)`),
 * rebuilding every table byte by byte: about a quarter of a kit PDF's time. That program depends only on the
 * font file, the set of glyphs (jspdf walks them in ascending id order; repeats change nothing) and the loca
 * format, so it is memoised per font file and glyph set, and a document using the same glyphs as an earlier
 * one embeds the same bytes without rebuilding them.
 */
import type { jsPDF } from 'jspdf';

/** The part of jspdf's subset object (TTFFont.subset, an internal of jspdf 4) this module replaces. */
interface JspdfSubset {
  encode(glyphIds: readonly number[], indexToLocFormat: number): ArrayLike<number>;
}

/** Font programs kept per font file (at most, by glyph set): a kit server builds kits of a few alphabets. */
const PROGRAMS_PER_FONT = 32;

const programs = new WeakMap<Uint8Array, Map<string, Uint8Array>>();

/**
 * Makes the current font of `doc` (a face registered from `bytes`) reuse font programs built before from the
 * same file for the same glyphs. A jspdf whose font has no subset encoder keeps its own behaviour.
 */
export function pdfFontSubsetsShare(doc: jsPDF, bytes: Uint8Array): void {
  const subset = (doc.getFont().metadata as { subset?: JspdfSubset } | undefined)?.subset;
  if (typeof subset?.encode !== 'function') return;
  const encode = subset.encode.bind(subset);
  let kept = programs.get(bytes);
  if (!kept) programs.set(bytes, (kept = new Map()));
  const cache = kept;
  subset.encode = (glyphIds, indexToLocFormat) => {
    const key = `${indexToLocFormat}:${[...new Set(glyphIds)].sort((a, b) => a - b).join(',')}`;
    let program = cache.get(key);
    if (program) {
      // Most recently used last, so the oldest is the one let go.
      cache.delete(key);
    } else {
      program = Uint8Array.from(encode(glyphIds, indexToLocFormat));
      if (cache.size >= PROGRAMS_PER_FONT) cache.delete(cache.keys().next().value!);
    }
    cache.set(key, program);
    return program;
  };
}
