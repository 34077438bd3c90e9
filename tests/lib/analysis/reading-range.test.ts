import { describe, expect, it } from 'vitest';
import { readingBetween, readingsFinite } from '../../../src/lib/analysis/reading-range';
import { savedResultBuild } from '../../../src/lib/analysis/saved-result';
import { EquilibriumTemperatureInputSchema } from '../../../src/lib/analysis/equilibrium-temperature';
import { MagneticInputSchema } from '../../../src/lib/analysis/magnetic';
import { VibrationInputSchema } from '../../../src/lib/analysis/vibration';
import { InputError } from '../../../src/lib/errors';

const messages = (r: { success: boolean; error?: { issues: { message: string }[] } }) =>
  r.success ? [] : r.error!.issues.map((i) => i.message);

describe('readingBetween', () => {
  it('names the range and unit when a reading is outside it', () => {
    const s = readingBetween(-5, 5, 'g');
    expect(messages(s.safeParse(6))).toEqual(['must be from -5 to 5 g']);
    expect(messages(s.safeParse(Infinity))).toContain('must be a finite number from -5 to 5 g');
    expect(s.safeParse(5).success).toBe(true);
  });
});

describe('readingsFinite', () => {
  it('finds Infinity or NaN anywhere in a nested result', () => {
    expect(readingsFinite({ a: [1, 2, { b: 3 }], c: null, d: 'x' })).toBe(true);
    expect(readingsFinite({ a: [1, 2, { b: Infinity }] })).toBe(false);
    expect(readingsFinite([[0, NaN]])).toBe(false);
  });
});

describe('the overflows of issue 16 are refused at the door', () => {
  // IEEE 754 binary64: the largest finite double is about 1.8e308 and the smallest subnormal 5e-324, so
  // 1/5e-324 and (1e308)² overflow to Infinity.
  it('an emissivity of 5e-324', () => {
    expect(1 / 5e-324).toBe(Infinity);
    expect(messages(EquilibriumTemperatureInputSchema.safeParse({ absorptivity: 1, emissivity: 5e-324 }))).toEqual([
      'must be from 0.01 to 1',
    ]);
  });
  it('a field reading of 1e308', () => {
    const readings = [1, 2, 3].map((d) => ({ distanceCm: d, fieldUT: d === 2 ? 1e308 : 10 }));
    expect(messages(MagneticInputSchema.safeParse({ readings }))).toEqual(['must be from -10000000 to 10000000 µT']);
  });
  it('a vibration sample of ±1e308', () => {
    expect(1e308 ** 2).toBe(Infinity);
    const n = 4;
    const r = VibrationInputSchema.safeParse({
      timeS: [0, 1, 2, 3],
      x: [1e308, -1e308, 0, 0],
      y: Array(n).fill(0),
      z: Array(n).fill(1),
    });
    expect(messages(r)).toEqual([
      'must be from -100000 to 100000 g or m/s²',
      'must be from -100000 to 100000 g or m/s²',
    ]);
  });
});

describe('savedResultBuild', () => {
  it('answers a result that overflowed with an InputError (400), not a ZodError (500)', () => {
    const plot = { kind: 'line' as const, title: 't', xLabel: 'x', yLabel: 'y', series: [] };
    expect(() => savedResultBuild('thermal', 'one run', { peak: Infinity }, plot)).toThrow(InputError);
    expect(() => savedResultBuild('thermal', 'one run', { peak: 1 }, plot)).not.toThrow();
  });
});
