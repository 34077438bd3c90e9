import { describe, expect, it } from 'vitest';
import { newtonCoolingFit } from '../../../src/lib/analysis/newton-cooling';
import { seededRandom } from './seeded-random';

// Incropera et al., Fundamentals of Heat and Mass Transfer, ch. 5 (lumped capacitance):
// T(t) = T∞ + (T0 − T∞)·e^(−t/τ). Synthetic logs from that formula, plus seeded Gaussian noise.
function log(tau: number, tInf: number, t0: number, n: number, dt: number, noise: number, seed: number) {
  const rnd = seededRandom(seed);
  const timeS = Array.from({ length: n }, (_, i) => 30 + i * dt);
  const temperatureC = timeS.map((t) => tInf + (t0 - tInf) * Math.exp(-(t - 30) / tau) + noise * rnd.normal());
  return { timeS, temperatureC };
}

describe('newtonCoolingFit', () => {
  it('recovers τ, T∞ and T0 exactly from noise-free cooling', () => {
    const { timeS, temperatureC } = log(420, 21, 65, 80, 15, 0, 1);
    const r = newtonCoolingFit(timeS, temperatureC);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.fit.timeConstantS).toBeCloseTo(420, 4);
    expect(r.fit.finalTemperature).toBeCloseTo(21, 6);
    expect(r.fit.initialTemperature).toBeCloseTo(65, 6);
  });

  it('recovers τ within 3 standard uncertainties from noisy logs, heating and cooling', () => {
    // 3σ: with Gaussian noise a correct fit and a correct uncertainty miss by more than 3σ in 0.3 % of cases.
    let within1 = 0;
    const trials = 40;
    for (let seed = 1; seed <= trials; seed++) {
      const heating = seed % 2 === 0;
      const { timeS, temperatureC } = log(300, heating ? 45 : 4, heating ? 20 : 30, 60, 20, 0.3, seed);
      const r = newtonCoolingFit(timeS, temperatureC);
      expect(r.ok).toBe(true);
      if (!r.ok) return;
      const z = Math.abs(r.fit.timeConstantS - 300) / r.fit.timeConstantStdErrorS;
      expect(z).toBeLessThan(3);
      expect(Math.abs(r.fit.finalTemperature - (heating ? 45 : 4)) / r.fit.finalTemperatureStdError).toBeLessThan(3.5);
      if (z < 1) within1++;
    }
    // The stated uncertainty is neither far too large nor far too small: about 68 % fall within 1σ.
    expect(within1 / trials).toBeGreaterThan(0.45);
    expect(within1 / trials).toBeLessThan(0.9);
  });

  it('says the run has not levelled off when it is still a straight line', () => {
    const timeS = Array.from({ length: 30 }, (_, i) => i * 10);
    const r = newtonCoolingFit(
      timeS,
      timeS.map((t) => 20 + 0.05 * t),
    );
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toBe('no-levelling-off');
  });

  it('refuses fewer than 5 readings and a flat run', () => {
    expect(newtonCoolingFit([0, 1, 2, 3], [5, 4, 3, 2.5]).ok).toBe(false);
    const flat = newtonCoolingFit([0, 1, 2, 3, 4, 5], [5, 5, 5, 5, 5, 5]);
    expect(flat.ok || flat.reason).toBe('flat');
  });
});
