/**
 * Sample data for the deploy test: two invented boom designs, 20 trials each, as a class might record
 * them — a spring-driven boom that deployed fully 17 times and an elastic-driven one that did 13 times.
 */
import type { DeploymentOutcome } from '../analysis/deployment';
import { sampleNoise } from './sample-noise';

/** Outcomes of the sample's trials in order: F full, P partial, N none (invented). */
export const DEPLOYMENT_SAMPLE_DESIGNS = [
  { label: 'Spring boom', pattern: 'FFFFFPFFFFFFNFFFFPFF', timeS: 1.2, lengthCm: 32 },
  { label: 'Elastic boom', pattern: 'FPFNFFPFFNFPFFFPNFFF', timeS: 2.1, lengthCm: 30 },
] as const;

const OUTCOME: Record<string, DeploymentOutcome> = { F: 'full', P: 'partial', N: 'none' };

/** The sample rows: design, outcome word, time (s, one decimal) and final length (cm, one decimal). */
export function deploymentSample(): {
  design: string;
  outcome: DeploymentOutcome;
  timeS: number;
  finalLengthCm: number;
}[] {
  return DEPLOYMENT_SAMPLE_DESIGNS.flatMap((d, k) =>
    [...d.pattern].map((c, i) => {
      const outcome = OUTCOME[c]!;
      const share = outcome === 'full' ? 1 : outcome === 'partial' ? 0.6 : 0.1;
      return {
        design: d.label,
        outcome,
        timeS: Math.round((d.timeS + 0.3 * sampleNoise(i, 40 + k)) * 10) / 10,
        finalLengthCm: Math.round((d.lengthCm * share + 0.5 * sampleNoise(i, 50 + k)) * 10) / 10,
      };
    }),
  );
}
