import { describe, expect, it } from 'vitest';
import {
  EquilibriumTemperatureInputSchema,
  equilibriumTemperature,
} from '../../../src/lib/analysis/equilibrium-temperature';

describe('equilibriumTemperature', () => {
  it('gives 278.3 K for a black sphere at 1 AU', () => {
    // T = (S/(4σ))^¼ with S = 1360.8 W/m² (Kopp & Lean 2011) and σ = 5.670374419e-8 (CODATA 2018) ≈ 278.3 K;
    // 0.05 K is the quoted digit.
    const r = equilibriumTemperature(EquilibriumTemperatureInputSchema.parse({ absorptivity: 1, emissivity: 1 }));
    expect(Math.abs(r.temperatureK - 278.3)).toBeLessThan(0.05);
  });

  it('scales as 1/√d with distance from the Sun', () => {
    // Follows from S ∝ 1/d² in the same balance: at 4 AU the temperature halves.
    const near = equilibriumTemperature({ absorptivity: 0.6, emissivity: 0.8, areaRatio: 0.25, distanceAu: 1 });
    const far = equilibriumTemperature({ absorptivity: 0.6, emissivity: 0.8, areaRatio: 0.25, distanceAu: 4 });
    expect(far.temperatureK / near.temperatureK).toBeCloseTo(0.5, 12);
  });

  it('refuses an emissivity of 0 or above 1', () => {
    expect(EquilibriumTemperatureInputSchema.safeParse({ absorptivity: 0.5, emissivity: 0 }).success).toBe(false);
    expect(EquilibriumTemperatureInputSchema.safeParse({ absorptivity: 0.5, emissivity: 1.2 }).success).toBe(false);
  });
});
