import { describe, expect, test } from 'vitest';
import { assemblySteps, assemblyStepPieceState } from '../../../src/lib/preview/assembly-steps';
import { instructionsPages } from '../../../src/lib/render/instructions-page';
import { pdfKit } from '../../../src/lib/render/pdf-kit';
import { pieceTabsFold } from '../../../src/lib/preview/tab-fold';
import { stepDrawing, STEP_DRAWING_COLOURS } from '../../../src/lib/render/step-drawing';
import { textWidthMm } from '../../../src/lib/render/text-width';
import { fixtureFonts } from '../../fixtures/pieces/kit-layout';
import { pdfPageTexts } from '../../fixtures/pdf-text';
import { demoKit } from './demo-kits';
import { DEMO_IDS } from '../geometry/fixtures';

const fonts = fixtureFonts();
const BOX = { xMm: 0, yMm: 0, widthMm: 44, heightMm: 44 };

describe('instructionsPages', () => {
  test.each(DEMO_IDS)('puts every step of %s on the pages once, in order', (id) => {
    const kit = demoKit(id, 20, 'letter')!;
    const pages = instructionsPages(kit.title, kit.pieces, kit.sheetSize, textWidthMm);
    const steps = assemblySteps(kit.pieces);
    expect(pages.flatMap((p) => p.stepNumbers)).toEqual(steps.map((s) => s.number));
  });

  test.each([
    ['last', 'after'],
    ['first', 'before'],
  ] as const)(
    'prints the instructions %s, %s the sheets, with the steps in order (read back by pdf.js)',
    async (at, _side) => {
      const kit = { ...demoKit('skein-probe', 20, 'letter')!, instructionsAt: at };
      const texts = await pdfPageTexts(pdfKit(kit, fonts));
      const steps = assemblySteps(kit.pieces);
      const instructionPages = texts.filter(
        (t) => /^How to build it|\nStep 1\n|^Step \d+\n/m.test(t) && !/Sheet \d+ of/.test(t),
      );
      expect(instructionPages.length).toBeGreaterThan(0);
      expect(texts.length).toBe(kit.sheets.length + instructionPages.length);
      const where = texts.indexOf(instructionPages[0]!);
      expect(where).toBe(at === 'first' ? 0 : kit.sheets.length);
      expect(texts[where]).toMatch(/How to build it: skein-probe/);
      const numbers = instructionPages
        .join('\n')
        .split('\n')
        .map((l) => /^Step (\d+)$/.exec(l.trim()))
        .filter((m) => m !== null)
        .map((m) => Number(m[1]));
      expect(numbers).toEqual(steps.map((s) => s.number));
    },
  );
});

describe('stepDrawing', () => {
  test.each(DEMO_IDS)('draws for each step of %s the parts the 3D preview shows at that step', (id) => {
    const kit = demoKit(id, 20, 'letter')!;
    for (const step of assemblySteps(kit.pieces)) {
      const drawing = stepDrawing(kit.pieces, step, BOX);
      // The preview colours a piece by assemblyStepPieceState; every piece not "later" is on screen.
      const onScreen = kit.pieces.filter((p) => assemblyStepPieceState(step, p.id) !== 'later').map((p) => p.id);
      expect(new Set(drawing.pieceIds)).toEqual(new Set(onScreen));
      // The glued tabs are highlighted: one shape per tab of the step that the preview folds too.
      const foldable = kit.pieces
        .filter((p) => onScreen.includes(p.id))
        .flatMap((p) => pieceTabsFold(p, 1))
        .filter((t) => step.tabNumbers.includes(t.number));
      expect(drawing.shapes.filter((s) => s.fill === STEP_DRAWING_COLOURS.tab)).toHaveLength(foldable.length);
      for (const s of drawing.shapes)
        for (const [x, y] of s.points) {
          expect(x).toBeGreaterThanOrEqual(BOX.xMm - 1e-6);
          expect(y).toBeLessThanOrEqual(BOX.yMm + BOX.heightMm + 1e-6);
        }
    }
  });
});
