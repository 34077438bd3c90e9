import binomialTest from '@stdlib/stats-binomial-test';
import { describe, expect, it } from 'vitest';
import {
  DEPLOYMENT_MAX_TRIALS,
  DeploymentInputSchema,
  deploymentAnalyse,
  type DeploymentInput,
} from '../../../src/lib/analysis/deployment';
import { Z_95 } from '../../../src/lib/analysis/binomial-interval';
import { SavedResultSchema } from '../../../src/lib/analysis/saved-result';
import { deploymentSavedResult } from '../../../src/lib/analysis/saved-result-tools';

type Outcome = 'full' | 'partial' | 'none';
const trialsOf = (pattern: string) =>
  [...pattern].map((c, i) => ({
    outcome: (c === 'F' ? 'full' : c === 'P' ? 'partial' : 'none') as Outcome,
    timeS: 1 + (i % 3) * 0.5,
    finalLengthCm: c === 'F' ? 30 : c === 'P' ? 18 : 2,
  }));
const parse = (v: unknown) => DeploymentInputSchema.safeParse(v);
const issues = (v: unknown) => {
  const r = parse(v);
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
};

describe('deploymentAnalyse', () => {
  it('says "17 of 20 deployed fully: 85 %, … between 64 % and 95 %" for 17 of 20', () => {
    // Wilson 1927 score interval for 17/20 at 95 %: 0.6396–0.9476 (closed form, computed by hand).
    const input = DeploymentInputSchema.parse({
      designs: [{ label: 'Spring boom', trials: trialsOf('FFFFFFPFFFFFFNFFFFPF') }],
    });
    const r = deploymentAnalyse(input);
    const d = r.designs[0]!;
    expect(d.fullyDeployed).toBe(17);
    expect(d.partlyDeployed).toBe(2);
    expect(d.notDeployed).toBe(1);
    expect(d.summary).toBe(
      '17 of 20 deployed fully: 85 %, and with this many trials the true rate is likely between 64 % and 95 %.',
    );
    // The exact interval, read from @stdlib's exact binomial test.
    const ref = binomialTest(17, 20).ci as [number, number];
    expect(d.clopperPearson.lower).toBeCloseTo(ref[0], 9);
    expect(d.clopperPearson.upper).toBeCloseTo(ref[1], 9);
    // Textbook n = z²p(1 − p)/E² at p = 0.85, E = 0.10: 48.98 → 49 trials, so 29 more.
    expect(d.trialsForTarget).toBe(49);
    expect(d.moreTrialsForTarget).toBe(29);
  });

  it('tracks the running rate and the Wilson interval trial by trial', () => {
    const r = deploymentAnalyse(DeploymentInputSchema.parse({ designs: [{ label: 'A', trials: trialsOf('FNFF') }] }));
    const d = r.designs[0]!;
    expect(d.runningRatePct).toEqual([
      [1, 100],
      [2, 50],
      [3, (100 * 2) / 3],
      [4, 75],
    ]);
    // After trial 1 (1 of 1): Wilson lower bound is n/(n + z²) = 1/(1 + z²).
    expect(d.runningWilsonPct[0]![1]).toBeCloseTo(100 / (1 + Z_95 * Z_95), 10);
    expect(d.runningWilsonPct[0]![2]).toBe(100);
  });

  it('plans the sample size at the plausible rate nearest ½ when every trial succeeded or failed', () => {
    // 20 of 20: the observed rate 1 would ask for no trials; the Wilson lower bound 20/(20 + z²) is used.
    const all = deploymentAnalyse(
      DeploymentInputSchema.parse({ designs: [{ label: 'A', counts: { trials: 20, fullyDeployed: 20 } }] }),
    );
    const p = 20 / (20 + Z_95 * Z_95);
    expect(all.designs[0]!.planningRate).toBeCloseTo(p, 14);
    expect(all.designs[0]!.trialsForTarget).toBe(Math.ceil((Z_95 * Z_95 * p * (1 - p)) / 0.01));
    expect(all.designs[0]!.wilson.upper).toBe(1);
    const none = deploymentAnalyse(
      DeploymentInputSchema.parse({ designs: [{ label: 'A', counts: { trials: 20, fullyDeployed: 0 } }] }),
    );
    expect(none.designs[0]!.wilson.lower).toBe(0);
    expect(none.designs[0]!.clopperPearson.lower).toBe(0);
    expect(none.designs[0]!.trialsForTarget).toBe(all.designs[0]!.trialsForTarget);
  });

  it('compares two designs with Newcombe’s interval and says whether they can be told apart', () => {
    // Newcombe 1998b, Table II (a): 56/70 − 48/80 → 0.0524 to 0.3339, which excludes 0.
    const r = deploymentAnalyse(
      DeploymentInputSchema.parse({
        designs: [
          { label: 'Spring boom', counts: { trials: 70, fullyDeployed: 56 } },
          { label: 'Rubber-band boom', counts: { trials: 80, fullyDeployed: 48 } },
        ],
      }),
    );
    expect(Math.abs(r.comparison!.lower - 0.0524)).toBeLessThan(0.5e-4);
    expect(Math.abs(r.comparison!.upper - 0.3339)).toBeLessThan(0.5e-4);
    expect(r.comparison!.summary).toMatch(/Spring boom is likely the more reliable design/);
    // Newcombe 1998b (e): 0/10 − 0/20 → −0.1611 to 0.2775 includes 0.
    const same = deploymentAnalyse(
      DeploymentInputSchema.parse({
        designs: [
          { label: 'A', counts: { trials: 10, fullyDeployed: 0 } },
          { label: 'B', counts: { trials: 20, fullyDeployed: 0 } },
        ],
      }),
    );
    expect(same.comparison!.summary).toMatch(/cannot yet tell the two designs apart/);
    expect(same.comparison!.summary).toMatch(/between −16 and \+28 points/);
  });

  it('gives the spread of deploy times (full deployments only) and of final lengths', () => {
    const r = deploymentAnalyse(DeploymentInputSchema.parse({ designs: [{ label: 'A', trials: trialsOf('FFNP') }] }));
    expect(r.designs[0]!.deployTimeS).toEqual({ count: 2, min: 1, median: 1.25, max: 1.5 });
    expect(r.designs[0]!.finalLengthCm).toEqual({ count: 4, min: 2, median: 24, max: 30 });
  });

  it('builds a saved result within the saved bounds for the largest input', () => {
    const big: DeploymentInput = DeploymentInputSchema.parse({
      designs: ['A', 'B'].map((label, k) => ({
        label,
        trials: trialsOf(
          Array.from({ length: DEPLOYMENT_MAX_TRIALS }, (_, i) => ((i * 7 + k) % 10 < 8 ? 'F' : 'N')).join(''),
        ),
      })),
    });
    const saved = deploymentSavedResult(deploymentAnalyse(big));
    expect(SavedResultSchema.safeParse(saved).success).toBe(true);
    expect(saved.plot.series).toHaveLength(6);
  });
});

describe('DeploymentInputSchema', () => {
  it('refuses fewer than 2 trials, saying how many it got', () => {
    expect(issues({ designs: [{ label: 'A', trials: trialsOf('F') }] })).toEqual([
      'designs.0.trials: A has 1 trial; a rate needs at least 2',
    ]);
    expect(issues({ designs: [{ label: 'A', counts: { trials: 1, fullyDeployed: 1 } }] })[0]).toMatch(/at least 2/);
  });

  it('refuses more successes than trials, and full plus partial above the trials', () => {
    expect(issues({ designs: [{ label: 'A', counts: { trials: 15, fullyDeployed: 17 } }] })).toEqual([
      'designs.0.counts.fullyDeployed: 17 full deployments is more than the 15 trials run',
    ]);
    expect(
      issues({ designs: [{ label: 'A', counts: { trials: 15, fullyDeployed: 10, partlyDeployed: 6 } }] })[0],
    ).toMatch(/add up to more than the 15 trials/);
  });

  it('refuses NaN, an unknown outcome, both forms at once, three designs and two designs of one name', () => {
    expect(
      issues({ designs: [{ label: 'A', trials: [{ outcome: 'full', timeS: Number.NaN }, { outcome: 'full' }] }] })
        .length,
    ).toBe(1);
    expect(issues({ designs: [{ label: 'A', trials: [{ outcome: 'maybe' }, { outcome: 'full' }] }] })[0]).toMatch(
      /"full", "partial" or "none"/,
    );
    expect(
      issues({ designs: [{ label: 'A', trials: trialsOf('FF'), counts: { trials: 2, fullyDeployed: 2 } }] })[0],
    ).toMatch(/either/);
    const c = { trials: 5, fullyDeployed: 2 };
    expect(issues({ designs: ['A', 'B', 'C'].map((label) => ({ label, counts: c })) })[0]).toMatch(/at most 2/);
    expect(issues({ designs: ['A', 'A'].map((label) => ({ label, counts: c })) })[0]).toMatch(/different names/);
  });
});
