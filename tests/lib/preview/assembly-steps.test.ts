import { describe, expect, test } from 'vitest';
import { DEMO_IDS, demoModel } from '../geometry/fixtures';
import { modelPatterns } from '../../../src/lib/geometry/model-patterns';
import { assemblySteps, tabNumbersLabel } from '../../../src/lib/preview/assembly-steps';

// At 1:10 every Skein boom is still paper (thinner booms become rods with no piece: part-substitutes.ts).
const pieces = (id: string) => modelPatterns(demoModel(id), { scaleDenominator: 10, paperGsm: 160 }).pieces;

describe('assemblySteps', () => {
  test.each(DEMO_IDS)('covers every tab number of the kit exactly once, in ascending order: %s', (id) => {
    const ps = pieces(id);
    const printed = ps.flatMap((p) => p.tabs.map((t) => t.number)).sort((a, b) => a - b);
    const stepped = assemblySteps(ps).flatMap((s) => s.tabNumbers);
    expect(stepped).toEqual(printed);
    expect(new Set(stepped).size).toBe(stepped.length);
  });

  test.each(DEMO_IDS)('names a tab for every numbered edge printed on the sheets: %s', (id) => {
    const ps = pieces(id);
    const stepped = new Set(assemblySteps(ps).flatMap((s) => s.tabNumbers));
    for (const p of ps) for (const e of p.edgeLabels) expect(stepped.has(e.number)).toBe(true);
  });

  test('puts the Skein body pieces first and one step per appendage after them, numbered from 1', () => {
    const ps = pieces('skein-probe');
    const steps = assemblySteps(ps);
    expect(steps.map((s) => s.number)).toEqual([1, 2, 3, 4, 5, 6, 7, 8]);
    expect(steps[0]!.pieceIds).toEqual(ps.filter((p) => p.partKind === 'body').map((p) => p.id));
    expect(steps[1]!.pieceLabels).toEqual(['Wire boom +X anchor']);
  });

  test('describes each step in words with its position and its tab numbers', () => {
    const steps = assemblySteps(pieces('skein-probe'));
    expect(steps[0]!.description).toMatch(/^Step 1 of 8: Body.*Fold along every fold line, then glue tabs \d+–\d+/);
    const anchor = steps[1]!;
    expect(anchor.description).toMatch(
      new RegExp(`^Step 2 of 8: Wire boom \\+X anchor\\. Lay the thread .* glue tab ${anchor.tabNumbers[0]} there\\.$`),
    );
    expect(steps[5]!.description).toMatch(/^Step 6 of 8: Axial boom, top\. Roll it into a tube/);
  });

  test('orders steps by assemblyStep and renumbers gaps', () => {
    const [body, ...rest] = pieces('wren-3u');
    const shuffled = [{ ...rest[1]!, assemblyStep: 9 }, body!, { ...rest[0]!, assemblyStep: 5 }];
    expect(assemblySteps(shuffled).map((s) => [s.number, s.pieceIds[0]])).toEqual([
      [1, 'body'],
      [2, rest[0]!.id],
      [3, rest[1]!.id],
    ]);
  });

  test('returns no steps for no pieces', () => {
    expect(assemblySteps([])).toEqual([]);
  });
});

describe('tabNumbersLabel', () => {
  test('collapses runs of consecutive numbers', () => {
    expect(tabNumbersLabel([5, 1, 2, 3, 8, 9])).toBe('tabs 1–3, 5 and 8 and 9');
    expect(tabNumbersLabel([4])).toBe('tab 4');
    expect(tabNumbersLabel([])).toBe('no tabs');
  });
});
