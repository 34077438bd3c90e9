import { describe, expect, test } from 'vitest';
import { DEMO_IDS, demoModel } from '../geometry/fixtures';
import { modelPatterns } from '../../../src/lib/geometry/model-patterns';
import {
  ASSEMBLY_STEP_JOINTS_MAX,
  assemblyRods,
  assemblySteps,
  assemblyStepPieceState,
  tabNumbersLabel,
} from '../../../src/lib/preview/assembly-steps';
import { SWEEP_SCALES } from '../render/demo-kits';

// At 1:10 every Skein boom is still paper (thinner booms become rods with no piece: part-substitutes.ts).
const pieces = (id: string, n = 10) => modelPatterns(demoModel(id), { scaleDenominator: n, paperGsm: 160 }).pieces;
const CASES = DEMO_IDS.flatMap((id) => SWEEP_SCALES.map((n) => [id, n] as const));

describe('assemblySteps', () => {
  // Issue 10 item 4: the 3D preview shows each rod glued on at its own step, after every piece.
  test('marks each rod of the Skein at 1:20 later, then current at its step, then built', () => {
    const patterns = modelPatterns(demoModel('skein-probe'), { scaleDenominator: 20, paperGsm: 160 });
    const rods = assemblyRods(patterns.substitutes);
    expect(rods.length).toBeGreaterThan(1);
    const steps = assemblySteps(patterns.pieces, rods);
    const first = steps.length - rods.length;
    rods.forEach((rod, k) => {
      const states = steps.map((s) => assemblyStepPieceState(s, rod.partId));
      const expected = steps.map((_, i) => (i < first + k ? 'later' : i === first + k ? 'current' : 'built'));
      expect(states, rod.partId).toEqual(expected);
      expect(steps[first + k]!.pieceLabels).toEqual([rod.label]);
    });
    // Every piece stays built through the rod steps.
    for (const s of steps.slice(first))
      for (const p of patterns.pieces) expect(assemblyStepPieceState(s, p.id)).toBe('built');
  });

  // Issue 10: one step per at most four joints; the steps cover every joint (tab number) exactly once.
  test.each(CASES)('glues at most four joints per step and every joint of %s at 1:%i exactly once', (id, n) => {
    const ps = pieces(id, n);
    const steps = assemblySteps(ps);
    for (const s of steps) expect(s.tabNumbers.length).toBeLessThanOrEqual(ASSEMBLY_STEP_JOINTS_MAX);
    expect(ASSEMBLY_STEP_JOINTS_MAX).toBe(4);
    const printed = ps.flatMap((p) => p.tabs.map((t) => t.number)).sort((a, b) => a - b);
    const stepped = steps.flatMap((s) => s.tabNumbers).sort((a, b) => a - b);
    expect(stepped).toEqual(printed);
    expect(new Set(stepped).size).toBe(stepped.length);
  });

  test.each(DEMO_IDS)('glues each joint of %s once both its pieces are in place', (id) => {
    const ps = pieces(id);
    for (const s of assemblySteps(ps)) {
      const present = new Set([...s.builtPieceIds, ...s.pieceIds]);
      for (const n of s.tabNumbers) {
        const holders = ps.filter(
          (p) => p.tabs.some((t) => t.number === n) || p.edgeLabels.some((e) => e.number === n),
        );
        for (const h of holders) expect(present.has(h.id), `joint ${n} at step ${s.number}`).toBe(true);
      }
    }
  });

  test('adds the Skein body pieces first, then the appendages, numbered from 1', () => {
    const ps = pieces('skein-probe');
    const steps = assemblySteps(ps);
    expect(steps.map((s) => s.number)).toEqual(steps.map((_, i) => i + 1));
    const order = [...new Set(steps.flatMap((s) => s.pieceIds))];
    const bodies = ps.filter((p) => p.partKind === 'body').map((p) => p.id);
    expect(order.slice(0, bodies.length)).toEqual(bodies);
    expect(order).toHaveLength(ps.length);
  });

  test('describes each step in words with its position, its piece and its tab numbers', () => {
    const steps = assemblySteps(pieces('skein-probe'));
    expect(steps[0]!.description).toMatch(/^Step 1 of \d+: Body wall\. Fold along every fold line .*Glue tab 1/);
    for (const s of steps) {
      expect(s.description).toContain(`Step ${s.number} of ${steps.length}: ${s.pieceLabels[0]}.`);
      expect(s.description.endsWith(s.action)).toBe(true);
    }
    const anchor = steps.find((s) => s.pieceLabels[0] === 'Wire boom +X anchor')!;
    expect(anchor.action).toMatch(new RegExp(`Lay the thread .* glue tab ${anchor.tabNumbers[0]} there\\.$`));
  });

  test('tells built, current and later pieces apart at a step', () => {
    const ps = pieces('wren-3u');
    const steps = assemblySteps(ps);
    const last = steps.at(-1)!;
    expect(assemblyStepPieceState(last, last.pieceIds[0]!)).toBe('current');
    expect(assemblyStepPieceState(steps[0], last.pieceIds[0]!)).toBe('later');
    expect(assemblyStepPieceState(last, steps[0]!.pieceIds[0]!)).toBe('built');
    expect(assemblyStepPieceState(undefined, 'anything')).toBe('built');
  });

  test('orders pieces by assemblyStep whatever order they come in', () => {
    const [body, ...rest] = pieces('wren-3u');
    const shuffled = [{ ...rest[1]!, assemblyStep: 9 }, body!, { ...rest[0]!, assemblyStep: 5 }];
    const order = [...new Set(assemblySteps(shuffled).flatMap((s) => s.pieceIds))];
    expect(order).toEqual(['body', rest[0]!.id, rest[1]!.id]);
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
