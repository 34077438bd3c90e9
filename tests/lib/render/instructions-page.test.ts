import { describe, expect, test } from 'vitest';
import { assemblySteps, assemblyStepPieceState, type AssemblyRod } from '../../../src/lib/preview/assembly-steps';
import type { KitLayout } from '../../../src/lib/layout/types';
import { kitMaterialLines } from '../../../src/lib/kit/kit-materials';
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
const rodsOf = (kit: KitLayout) => kit.substitutes.filter((s): s is AssemblyRod => s.kind === 'boom-stock');

describe('instructionsPages', () => {
  test.each(DEMO_IDS)('puts every step of %s on the pages once, in order', (id) => {
    const kit = demoKit(id, 20, 'letter')!;
    const pages = instructionsPages(kit, kit.sheetSize, textWidthMm);
    const steps = assemblySteps(kit.pieces, rodsOf(kit));
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
      const steps = assemblySteps(kit.pieces, rodsOf(kit));
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

describe('the first instructions page', () => {
  // Issue 10: the kit's materials list and the cautions on the first instructions page, and a step for each
  // rod that replaces a boom; read back from the PDF by pdf.js (a PDF library other than the writer).
  test('lists the materials and cautions of the Skein at 1:20 and has a step for each skewer', async () => {
    const base = demoKit('skein-probe', 20, 'letter')!;
    const lines = kitMaterialLines({
      threads: base.threads,
      substitutes: base.substitutes,
      gradeBand: '6-8',
      units: 'us',
    });
    const kit = { ...base, ...lines, instructionsAt: 'first' as const };
    const first = (await pdfPageTexts(pdfKit(kit, fonts)))[0]!.replace(/\s+/g, ' ');
    expect(first).toMatch(/You need .*Scissors, a glue stick and a ruler/);
    expect(first).toMatch(/Be careful .*scissors/i);
    expect(first).toContain("Follow your school's safety rules and local codes.");
    // The Skein's 35 m wire booms at 1:20 are 1.75 m of thread each; its 6 m axial booms 300 mm skewers.
    expect(first).toMatch(/Wire boom \+X: thread, cut/);
    expect(first).toMatch(/Axial boom, top: a bamboo skewer cut to 300 mm/);
    expect(first.indexOf('You need')).toBeLessThan(first.indexOf('Step 1'));
    const steps = assemblySteps(kit.pieces, rodsOf(kit));
    const rodSteps = steps.filter((s) => s.pieceIds.length === 0);
    expect(rodSteps.map((s) => s.pieceLabels[0])).toEqual(['Axial boom, top', 'Axial boom, bottom']);
    for (const s of rodSteps) expect(s.action).toMatch(/Cut a bamboo skewer to 300 mm/);
  });
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
