import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { assemblySteps } from '../../../src/lib/preview/assembly-steps';
import { FOLD_WORDS, foldWordsLine } from '../../../src/lib/render/fold-words';
import { instructionsPages } from '../../../src/lib/render/instructions-page';
import { sheetScene } from '../../../src/lib/render/sheet-scene';
import { textWidthMm } from '../../../src/lib/render/text-width';
import { demoKit } from './demo-kits';

const ROOT = join(import.meta.dirname, '../../..');
const source = (path: string) => readFileSync(join(ROOT, path), 'utf8');

/** Every sentence of a text that speaks of mountain or valley folds, with its direction words. */
function foldSentences(text: string): string[] {
  return text
    .split(/(?<=[.:·])\s+|\n/)
    .filter((s) => /mountain|valley/i.test(s) && /toward|towards|away|ridge|crease|back|up\b/i.test(s))
    .map((s) => s.trim());
}

/** The direction a sentence gives each fold kind: "away" or "toward" (from "… mountain … away …"). */
function directions(sentence: string): Map<string, string> {
  const out = new Map<string, string>();
  for (const m of sentence.matchAll(/(mountain|valley)[^.,:;]*?[:\s]+[^.;]*?\b(away|towards?)\b/gi))
    out.set(m[1]!.toLowerCase(), m[2]!.toLowerCase().startsWith('toward') ? 'toward' : 'away');
  return out;
}

describe('fold words', () => {
  // Issue 10: one fold vocabulary in the sheet legend, the instructions, the handout and the preview. Each
  // place's fold wording is collected and must give a mountain fold "away" and a valley fold "toward" (the
  // printed side facing the reader: origami's usual meaning), in the words of FOLD_WORDS.
  const kit = demoKit('skein-probe', 20, 'letter')!;
  const places: Record<string, string> = {
    'sheet legend': sheetScene(kit, kit.sheets[0]!)
      .texts.map((t) => t.text)
      .join('\n'),
    'instructions page': instructionsPages(kit, kit.sheetSize, textWidthMm)
      .flatMap((p) => p.texts.map((t) => t.text))
      .join(' '),
    'preview steps': assemblySteps(kit.pieces)
      .map((s) => s.description)
      .join('\n'),
    'preview step list': source('src/components/preview/AssemblyStepList.tsx'),
    handout: source('src/pages/kits/[id]/handout.astro'),
  };

  test.each(Object.keys(places))('the %s says mountain folds away and valley folds toward you', (where) => {
    const text = places[where]!;
    const literal = foldSentences(text);
    const usesModule = /FOLD_WORDS|foldWordsLine/.test(text);
    // Source files must take the words from the module, rendered texts must contain them.
    if (where === 'handout' || where === 'preview step list') {
      expect(usesModule).toBe(true);
      expect(literal).toEqual([]);
      return;
    }
    expect(literal.length).toBeGreaterThan(0);
    for (const sentence of literal) {
      const d = directions(sentence);
      if (d.has('mountain')) expect(d.get('mountain'), sentence).toBe('away');
      if (d.has('valley')) expect(d.get('valley'), sentence).toBe('toward');
    }
    const joined = text.replace(/\s+/g, ' ');
    expect(
      joined.includes(foldWordsLine('mountain')) || joined.includes(FOLD_WORDS.short),
      `${where} uses the fold words`,
    ).toBe(true);
  });
});
