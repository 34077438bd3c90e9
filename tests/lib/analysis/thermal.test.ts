import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/lib/errors';
import { ThermalInputSchema, thermalAnalyse } from '../../../src/lib/analysis/thermal';
import { thermalInputFromCsv } from '../../../src/lib/analysis/thermal-csv';

// Incropera et al., ch. 5: T(t) = T∞ + (T0 − T∞)·e^(−t/τ); its slope at t = 0 is (T∞ − T0)/τ.
const timeS = Array.from({ length: 61 }, (_, i) => i * 30);
const lamp = timeS.map((t) => 45 - 25 * Math.exp(-t / 600));
const cooler = timeS.map((t) => 5 + 15 * Math.exp(-t / 400));

describe('thermalAnalyse', () => {
  it('tells heating from cooling and fits each run', () => {
    const r = thermalAnalyse(
      ThermalInputSchema.parse({
        runs: [
          { label: 'lamp', timeS, temperatureC: lamp },
          { label: 'cooler', timeS, temperatureC: cooler },
        ],
      }),
    );
    expect(r.runs.map((x) => x.direction)).toEqual(['heating', 'cooling']);
    expect(r.runs[0]!.fit!.timeConstantS).toBeCloseTo(600, 3);
    expect(r.runs[1]!.fit!.finalTemperature).toBeCloseTo(5, 5);
    expect(r.runs[1]!.fit!.timeConstantMin).toBeCloseTo(400 / 60, 5);
  });

  it('gives an initial rate equal to the law’s slope at the middle of the first 20 %', () => {
    // dT/dt = (T∞ − T0)/τ·e^(−t/τ); a straight-line fit over 0–360 s matches the slope at 180 s to
    // second order in the curvature (360 s / 600 s): 3 % tolerance.
    const r = thermalAnalyse({ runs: [{ label: 'lamp', timeS, temperatureC: lamp }] });
    expect(r.runs[0]!.initialRateCPerMin / ((25 / 600) * Math.exp(-180 / 600) * 60)).toBeCloseTo(1, 1);
    expect(Math.abs(r.runs[0]!.initialRateCPerMin / ((25 / 600) * Math.exp(-180 / 600) * 60) - 1)).toBeLessThan(0.03);
    expect(r.runs[0]!.averageRateCPerMin).toBeCloseTo(((lamp[60]! - lamp[0]!) / 1800) * 60, 9);
  });

  it('refuses a single reading and time going backwards', () => {
    expect(() => thermalAnalyse({ runs: [{ label: 'a', timeS: [0], temperatureC: [20] }] })).toThrow(InputError);
    expect(() => thermalAnalyse({ runs: [{ label: 'a', timeS: [0, 60, 30], temperatureC: [20, 21, 22] }] })).toThrow(
      /backwards/,
    );
  });
});

describe('ThermalInputSchema', () => {
  it('refuses NaN, text and mismatched lengths', () => {
    expect(
      ThermalInputSchema.safeParse({ runs: [{ label: 'a', timeS: [0, 1], temperatureC: [1, NaN] }] }).success,
    ).toBe(false);
    expect(
      ThermalInputSchema.safeParse({ runs: [{ label: 'a', timeS: [0, 1], temperatureC: [1, 'x'] }] }).success,
    ).toBe(false);
    expect(ThermalInputSchema.safeParse({ runs: [{ label: 'a', timeS: [0, 1], temperatureC: [1] }] }).success).toBe(
      false,
    );
  });
});

describe('thermalInputFromCsv', () => {
  it('reads minutes from the header and one run per column', () => {
    const input = thermalInputFromCsv('time (min),bare,blanket\n0,20,20\n1,24,21.5\n2,27,22.8\n');
    expect(input.runs.map((r) => r.label)).toEqual(['bare', 'blanket']);
    expect(input.runs[0]!.timeS).toEqual([0, 60, 120]);
  });

  it('refuses text in a number column', () => {
    expect(() => thermalInputFromCsv('t,T\n0,20\n1,warm\n')).toThrow(/Row 3, column "T".*not a number/);
  });
});
