/**
 * The kit's instructions pages: the fold words, what to have ready (the kit's materials list) and the
 * cautions, then every assembly step in order (rods that replace booms last), each with its number, a
 * small drawing (step-drawing.ts) and what to do in words, in two columns. Page mm, y down; as many pages
 * as the steps need. The steps come from the same module as the 3D preview's and the pieces' step badges.
 */
import type { KitLayout, RectMm } from '../layout/types';
import { assemblyRods, assemblySteps, type AssemblyStep } from '../preview/assembly-steps';
import { FOLD_WORDS, foldWordsLine } from './fold-words';
import type { LabelMeasure } from './label-placement';
import { sceneWrapWords } from './scene-footer';
import type { SceneText } from './scene-types';
import { stepDrawing, type StepDrawingShape } from './step-drawing';

export interface InstructionsPage {
  texts: SceneText[];
  shapes: StepDrawingShape[];
  /** The step numbers on this page, in order. */
  stepNumbers: number[];
}

/** Heading of the first instructions page. */
export const INSTRUCTIONS_TITLE = 'How to build it';
const MARGIN_MM = 12;
const CELL_HEIGHT_MM = 58;
const DRAWING_MM = { widthMm: 44, heightMm: 44 } as const;
const BODY_MM = 3;
const LEADING_EM = 1.3;

const text = (value: string, atMm: [number, number], sizeMm: number, bold = false): SceneText => ({
  text: value,
  atMm,
  angleRad: 0,
  sizeMm,
  bold,
  anchor: 'start',
  group: 'furniture',
});

/** Heading of the materials list on the first instructions page. */
export const INSTRUCTIONS_MATERIALS_TITLE = 'You need';
/** Heading of the cautions on the first instructions page. */
export const INSTRUCTIONS_CAUTIONS_TITLE = 'Be careful';

/** The steps the instructions print, rods last: what the 3D preview walks too (FoldPreview). */
export function instructionsSteps(kit: Pick<KitLayout, 'pieces' | 'substitutes'>): AssemblyStep[] {
  return assemblySteps(kit.pieces, assemblyRods(kit.substitutes));
}

/** The instructions pages of a kit on pages of `page` size, text measured by `measure`. */
export function instructionsPages(
  kit: Pick<KitLayout, 'title' | 'pieces' | 'substitutes' | 'materials' | 'cautions'>,
  page: { widthMm: number; heightMm: number },
  measure: LabelMeasure,
): InstructionsPage[] {
  const { title, pieces } = kit;
  const steps = instructionsSteps(kit);
  const pages: InstructionsPage[] = [];
  const columnMm = (page.widthMm - 2 * MARGIN_MM) / 2;
  let current: InstructionsPage | null = null;
  let y = 0;
  let column = 0;
  const newPage = () => {
    current = { texts: [], shapes: [], stepNumbers: [] };
    pages.push(current);
    y = MARGIN_MM + 4;
    column = 0;
    if (pages.length === 1) {
      current.texts.push(text(`${INSTRUCTIONS_TITLE}: ${title}`, [MARGIN_MM, y], 6, true));
      y += 8;
      for (const line of [
        `${FOLD_WORDS.holding} Cut along the solid lines.`,
        `${foldWordsLine('mountain')}. ${foldWordsLine('valley')}.`,
        'Each tab and the edge it glues to carry the same number; an underlined number is read with the line below it.',
        'Each piece is printed with its step number. The orange tabs in a drawing are the ones to glue in that step.',
      ]) {
        for (const l of sceneWrapWords(line, page.widthMm - 2 * MARGIN_MM, BODY_MM, measure)) {
          current.texts.push(text(l, [MARGIN_MM, y], BODY_MM));
          y += BODY_MM * LEADING_EM;
        }
      }
      for (const [heading, lines] of [
        [INSTRUCTIONS_MATERIALS_TITLE, kit.materials ?? []],
        [INSTRUCTIONS_CAUTIONS_TITLE, kit.cautions ?? []],
      ] as const) {
        if (lines.length === 0) continue;
        y += 2;
        current.texts.push(text(heading, [MARGIN_MM, y], BODY_MM * 1.2, true));
        y += BODY_MM * 1.2 * LEADING_EM;
        for (const line of lines) {
          sceneWrapWords(`• ${line}`, page.widthMm - 2 * MARGIN_MM - 3, BODY_MM, measure).forEach((l, i) => {
            current!.texts.push(text(l, [MARGIN_MM + (i > 0 ? 3 : 0), y], BODY_MM));
            y += BODY_MM * LEADING_EM;
          });
        }
      }
      y += 3;
    }
  };
  newPage();
  for (const step of steps) {
    if (y + CELL_HEIGHT_MM > page.heightMm - MARGIN_MM) {
      if (column === 0) {
        column = 1;
        y = pages.length === 1 ? pageTopAfterHeader(current!) : MARGIN_MM + 4;
      } else newPage();
    }
    const p = current! as InstructionsPage;
    const x = MARGIN_MM + column * columnMm;
    const box: RectMm = { xMm: x, yMm: y + 7, ...DRAWING_MM };
    p.texts.push(text(`Step ${step.number}`, [x, y + 2], 4.2, true));
    p.shapes.push(...stepDrawing(pieces, step, box).shapes);
    const words = sceneWrapWords(
      `${step.pieceLabels.join(', ')}. ${step.action}`,
      columnMm - DRAWING_MM.widthMm - 6,
      BODY_MM,
      measure,
    );
    let ty = y + 9;
    for (const l of words) {
      p.texts.push(text(l, [x + DRAWING_MM.widthMm + 3, ty], BODY_MM));
      ty += BODY_MM * LEADING_EM;
    }
    p.stepNumbers.push(step.number);
    y += Math.max(CELL_HEIGHT_MM, ty - y + 4);
  }
  return pages;
}

/** Where the second column starts on a page: below the header texts of the first page. */
function pageTopAfterHeader(page: InstructionsPage): number {
  const stepTop = page.texts.find((t) => t.text.startsWith('Step '));
  return stepTop ? stepTop.atMm[1] - 2 : MARGIN_MM + 4;
}
