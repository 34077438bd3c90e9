import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/lib/errors';
import {
  MagneticInputSchema,
  dipoleFieldAxialT,
  dipoleFieldEquatorialT,
  dipoleMomentFromAxialField,
  magneticFieldFit,
} from '../../../src/lib/analysis/magnetic';
import { seededRandom } from './seeded-random';

// Griffiths, Introduction to Electrodynamics, §5.4.3: on-axis dipole field B = (μ0/4π)·2m/r³.
const MOMENT = 0.8; // A·m², a small fridge-magnet-sized moment (invented test input)
const distancesCm = [3, 4, 5, 6, 8, 10, 12, 15, 20];
const dipoleUT = (cm: number) => dipoleFieldAxialT(MOMENT, cm / 100) * 1e6;

describe('magneticFieldFit', () => {
  it('gives an exponent of −3 for synthetic dipole readings', () => {
    const r = magneticFieldFit(
      MagneticInputSchema.parse({ readings: distancesCm.map((d) => ({ distanceCm: d, fieldUT: dipoleUT(d) })) }),
    );
    expect(r.exponent).toBeCloseTo(-3, 10);
    expect(r.rSquared).toBeCloseTo(1, 12);
  });

  it('puts the threshold where the dipole formula reaches it', () => {
    // Solving (μ0/4π)·2m/r³ = 0.5 µT for r gives the reference distance.
    const r = magneticFieldFit(
      MagneticInputSchema.parse({ readings: distancesCm.map((d) => ({ distanceCm: d, fieldUT: dipoleUT(d) })) }),
    );
    const expected = Math.cbrt((1e-7 * 2 * MOMENT) / 0.5e-6) * 100;
    expect(r.thresholdDistanceCm!).toBeCloseTo(expected, 6);
    expect(r.warnings.join(' ')).toMatch(/extrapolates/);
  });

  it('recovers −3 within its stated uncertainty from noisy readings over a background', () => {
    // 9 readings leave 7 degrees of freedom, so z = (n + 3)/σ follows Student's t with 7 dof: |t| < 5.41 in
    // 99.9 % of cases and |t| < 1 in about 65 % (t-table, e.g. NIST/SEMATECH e-Handbook §1.3.6.7.2).
    const trials = 60;
    let within1 = 0;
    for (let seed = 1; seed <= trials; seed++) {
      const rnd = seededRandom(seed);
      const readings = distancesCm.map((d) => ({
        distanceCm: d,
        fieldUT: 48 + dipoleUT(d) * (1 + 0.03 * rnd.normal()),
      }));
      const r = magneticFieldFit(MagneticInputSchema.parse({ readings, backgroundUT: 48 }));
      const z = Math.abs(r.exponent + 3) / r.exponentStdError!;
      expect(z).toBeLessThan(5.41);
      if (z < 1) within1++;
      const [lo, hi] = r.thresholdDistanceRangeCm!;
      expect(lo).toBeLessThan(r.thresholdDistanceCm!);
      expect(hi).toBeGreaterThan(r.thresholdDistanceCm!);
    }
    expect(within1 / trials).toBeGreaterThan(0.45);
    expect(within1 / trials).toBeLessThan(0.85);
  });

  it('refuses fewer than 3 readings above the background and a single distance', () => {
    expect(() =>
      magneticFieldFit(
        MagneticInputSchema.parse({
          readings: [
            { distanceCm: 2, fieldUT: 100 },
            { distanceCm: 4, fieldUT: 60 },
          ],
        }),
      ),
    ).toThrow(InputError);
    const same = [1, 2, 3].map((f) => ({ distanceCm: 5, fieldUT: 100 * f }));
    expect(() => magneticFieldFit(MagneticInputSchema.parse({ readings: same }))).toThrow(/same distance/);
  });
});

describe('dipoleFieldAxialT', () => {
  it('gives 200 µT at 10 cm on the axis of a 1 A·m² dipole', () => {
    // Griffiths §5.4.3 with μ0/4π = 1.00000000055e-7 (CODATA 2018 μ0): 1e-7 × 2 × 1 / 0.1³ = 2e-4 T.
    expect(dipoleFieldAxialT(1, 0.1)).toBeCloseTo(2e-4, 12);
    expect(dipoleFieldEquatorialT(1, 0.1)).toBeCloseTo(1e-4, 12);
    expect(dipoleMomentFromAxialField(dipoleFieldAxialT(0.37, 0.25), 0.25)).toBeCloseTo(0.37, 12);
  });
});
