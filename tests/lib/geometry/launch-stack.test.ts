import { describe, expect, test } from 'vitest';
import { hingeTreeFold } from '../../../src/lib/geometry/hinge-tree';
import { launchStackParts } from '../../../src/lib/geometry/launch-stack';
import { modelPatterns } from '../../../src/lib/geometry/model-patterns';
import { ModelSchema } from '../../../src/lib/geometry/model-schema';
import { demoModel } from './fixtures';

const N = 20;

describe('launch stack model', () => {
  const stack = demoModel('skein-stack');

  test('stacks adapter, then ring and probe in turn, each on the one below (hand calculation)', () => {
    const parts = launchStackParts(stack.body, stack.stack!);
    expect(parts.map((p) => p.id)).toEqual(['adapter', 'ring-1', 'probe-1', 'ring-2', 'probe-2', 'ring-3', 'probe-3']);
    // 0.8 m adapter, 0.2 m rings, 0.9 m probes: tops at 0.8, 1.0, 1.9, 2.1, 3.0, 3.2, 4.1 m.
    const tops = [0.8, 1.0, 1.9, 2.1, 3.0, 3.2, 4.1];
    parts.forEach((p, i) => {
      expect(p.topM).toBeCloseTo(tops[i]!, 12);
      expect(p.bottomM).toBeCloseTo(i === 0 ? 0 : tops[i - 1]!, 12);
    });
  });

  test('builds the parts bottom first, one assembly step each, and folds every part into its own slice', () => {
    const { pieces } = modelPatterns(stack, { scaleDenominator: N, paperGsm: 160 });
    const parts = launchStackParts(stack.body, stack.stack!);
    expect(new Set(pieces.map((p) => p.id)).size).toBe(pieces.length);
    for (const piece of pieces) {
      const i = parts.findIndex((p) => p.id === piece.partId);
      expect(piece.assemblyStep).toBe(i + 1);
      const zs = hingeTreeFold(piece.hinge, 1).flatMap((f) => f.polygonMm.map((p) => p[2]));
      // Folded, a part's faces lie between its base and its top in the stack (mm at 1:20 = m × 50).
      expect(Math.min(...zs)).toBeGreaterThanOrEqual(parts[i]!.bottomM * 50 - 1e-6);
      expect(Math.max(...zs)).toBeLessThanOrEqual(parts[i]!.topM * 50 + 1e-6);
    }
    expect(pieces.filter((p) => p.partId === 'probe-3').length).toBeGreaterThan(0);
  });

  test('refuses appendages on a stack model (the probes ride stowed)', () => {
    const withBoom = ModelSchema.safeParse({
      ...stack,
      appendages: [{ kind: 'wire-boom', id: 'w', label: 'Wire', face: 'side:0', lengthM: 35 }],
    });
    expect(withBoom.success).toBe(false);
    expect(JSON.stringify(withBoom.error)).toMatch(/stowed/);
  });
});
