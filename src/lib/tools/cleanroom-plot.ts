/**
 * The clean-room tool's plot, as ISO 14644-1 draws its classes: concentration against particle size on
 * log-log axes, the worst location's means as points and the class limit as the line Cn = 10^N·(0.1/D)^2.08.
 */
import type { CleanroomResult } from '../analysis/cleanroom';
import { iso14644LimitExact } from '../analysis/iso-14644';
import type { SavedPlot } from '../analysis/saved-result';

/** Log-log plot of a clean-room result; the limit line spans the sizes measured (µm, particles/m³). */
export function cleanroomPlot(r: CleanroomResult): SavedPlot {
  const measured = r.perSize
    .filter((s) => s.maxLocationMeanPerM3 > 0)
    .map((s): [number, number] => [s.sizeUm, s.maxLocationMeanPerM3]);
  const lo = Math.min(...r.sizesUm);
  const hi = Math.max(...r.sizesUm);
  const steps = lo === hi ? 1 : 24;
  const line = (n: number) =>
    Array.from({ length: steps + 1 }, (_, i): [number, number] => {
      const d = lo * (hi / lo) ** (i / steps);
      return [d, iso14644LimitExact(n, d)];
    });
  return {
    kind: 'loglog',
    title: r.isoClass === null ? 'Above the ISO Class 9 limits' : `Meets ISO Class ${r.isoClass}`,
    xLabel: 'Particle size (µm)',
    yLabel: 'Particles per m³ (≥ size)',
    series: [
      { label: 'worst location', points: measured },
      ...(r.isoClass === null ? [] : [{ label: `ISO Class ${r.isoClass} limit`, points: line(r.isoClass) }]),
    ],
  };
}
