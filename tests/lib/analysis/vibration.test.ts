import { describe, expect, it } from 'vitest';
import { InputError, PayloadTooLargeError } from '../../../src/lib/errors';
import { STANDARD_GRAVITY_M_PER_S2, accelerationUnitFromHeader } from '../../../src/lib/analysis/acceleration-units';
import { VIBRATION_MIN_SAMPLES, VibrationInputSchema, vibrationAnalyse } from '../../../src/lib/analysis/vibration';
import { vibrationInputFromCsv } from '../../../src/lib/analysis/vibration-csv';
import { seededRandom } from './seeded-random';

const FS = 100;

function record(n: number, f0 = 12.5, ampG = 0.5, unit: 'g' | 'm/s2' = 'g') {
  const k = unit === 'g' ? 1 : STANDARD_GRAVITY_M_PER_S2;
  const timeS = Array.from({ length: n }, (_, i) => i / FS);
  return {
    timeS,
    x: timeS.map((t) => k * ampG * Math.sin(2 * Math.PI * f0 * t)),
    y: timeS.map(() => 0),
    z: timeS.map(() => k * 1),
  };
}

function csvOf(r: ReturnType<typeof record>, header = 'time_s,x_g,y_g,z_g'): string {
  return [header, ...r.timeS.map((t, i) => `${t},${r.x[i]},${r.y[i]},${r.z[i]}`)].join('\n');
}

describe('vibrationAnalyse', () => {
  it('gives a sine of amplitude A an RMS of A/√2, a peak of A and a crest factor of √2', () => {
    // Any physics text: RMS of A·sin(ωt) over whole cycles is A/√2. 1 % allows the sampled peak.
    const r = vibrationAnalyse(VibrationInputSchema.parse({ ...record(4000), units: 'g' }));
    expect(r.axes.x.rmsG).toBeCloseTo(0.5 / Math.SQRT2, 3);
    expect(r.axes.x.peakG).toBeCloseTo(0.5, 3);
    expect(r.axes.x.crestFactor!).toBeCloseTo(Math.SQRT2, 2);
    expect(r.axes.z.meanG).toBeCloseTo(1, 12);
    expect(r.axes.z.crestFactor).toBeNull();
    expect(r.sampleRateHz).toBeCloseTo(FS, 9);
  });

  it('finds the sine frequency as the dominant one', () => {
    const r = vibrationAnalyse(VibrationInputSchema.parse({ ...record(6000, 17.3), units: 'g' }));
    expect(Math.abs(r.dominant[0]!.frequencyHz - 17.3)).toBeLessThanOrEqual(r.psd.resolutionHz / 2);
  });

  it('puts the whole mean square of a sine into the band holding it (Parseval)', () => {
    // Welch 1967: the PSD integrates to the variance; 2 % for window and edge losses.
    const r = vibrationAnalyse(
      VibrationInputSchema.parse({ ...record(8000, 12.5), units: 'g', bands: [{ lowHz: 10, highHz: 15 }] }),
    );
    expect(r.bands[0]!.grmsX / r.axes.x.rmsG).toBeGreaterThan(0.98);
    expect(r.bands[0]!.grmsX / r.axes.x.rmsG).toBeLessThan(1.02);
  });

  it('detects m/s² from gravity in the readings and reports g', () => {
    const r = vibrationAnalyse(VibrationInputSchema.parse(record(2000, 12.5, 0.5, 'm/s2')));
    expect(r.units).toEqual({ input: 'm/s2', source: 'gravity' });
    expect(r.axes.x.peakG).toBeCloseTo(0.5, 3);
  });

  it('detects g from gravity in the readings', () => {
    expect(vibrationAnalyse(VibrationInputSchema.parse(record(2000))).units).toEqual({ input: 'g', source: 'gravity' });
  });

  it('assumes m/s² with a warning when the readings carry no gravity', () => {
    const rnd = seededRandom(1);
    const base = record(2000);
    const r = vibrationAnalyse(
      VibrationInputSchema.parse({ ...base, x: base.x.map(() => 3 * rnd.normal()), z: base.z.map(() => 0) }),
    );
    expect(r.units.source).toBe('assumed');
    expect(r.warnings.length).toBeGreaterThan(0);
  });

  it('refuses a record too short for the PSD, saying how long would work', () => {
    expect(() => vibrationAnalyse(VibrationInputSchema.parse(record(VIBRATION_MIN_SAMPLES - 1)))).toThrow(
      /at least 256/,
    );
  });

  it('refuses uneven sampling beyond the tolerance', () => {
    const r = record(1000);
    r.timeS = r.timeS.map((t, i) => (i > 500 ? t + 0.005 * (i % 2) : t));
    expect(() => vibrationAnalyse(VibrationInputSchema.parse(r))).toThrow(/unevenly sampled/);
  });

  it('accepts timing jitter inside the tolerance', () => {
    const r = record(1000);
    r.timeS = r.timeS.map((t, i) => t + 0.0005 * (i % 2));
    expect(vibrationAnalyse(VibrationInputSchema.parse(r)).sampleRateHz).toBeCloseTo(FS, 0);
  });

  it('refuses time going backwards, naming the row', () => {
    const r = record(1000);
    r.timeS[300] = 0.5;
    expect(() => vibrationAnalyse(VibrationInputSchema.parse(r))).toThrow(/backwards.*row 301/);
  });

  it('refuses a segment length longer than the record', () => {
    expect(() => vibrationAnalyse(VibrationInputSchema.parse({ ...record(1000), segmentLength: 2048 }))).toThrow(
      InputError,
    );
  });
});

describe('VibrationInputSchema', () => {
  it('refuses NaN and columns of different lengths', () => {
    const r = record(300);
    expect(VibrationInputSchema.safeParse({ ...r, x: [...r.x.slice(1), NaN] }).success).toBe(false);
    expect(VibrationInputSchema.safeParse({ ...r, y: r.y.slice(1) }).success).toBe(false);
  });
});

describe('vibrationInputFromCsv', () => {
  it('reads units from the header and ms time from the time header', () => {
    const r = record(1000, 12.5, 0.5, 'm/s2');
    const csv = [
      'time (ms),ax (m/s^2),ay (m/s^2),az (m/s^2)',
      ...r.timeS.map((t, i) => `${t * 1000},${r.x[i]},${r.y[i]},${r.z[i]}`),
    ].join('\r\n');
    const { input, unitSource } = vibrationInputFromCsv(csv);
    expect(input.units).toBe('m/s2');
    expect(unitSource).toBe('header');
    expect(vibrationAnalyse(input, unitSource).sampleRateHz).toBeCloseTo(FS, 6);
  });

  it('reads a CSV without header', () => {
    const csv = csvOf(record(500)).split('\n').slice(1).join('\n');
    expect(vibrationInputFromCsv(csv).input.timeS).toHaveLength(500);
  });

  it('refuses text in a number column, naming row and column', () => {
    const lines = csvOf(record(500)).split('\n');
    lines[10] = '0.09,abc,0,1';
    expect(() => vibrationInputFromCsv(lines.join('\n'))).toThrow(/Row 11, column "x_g".*"abc" is not a number/);
  });

  it('refuses NaN cells', () => {
    const lines = csvOf(record(500)).split('\n');
    lines[4] = '0.03,NaN,0,1';
    expect(() => vibrationInputFromCsv(lines.join('\n'))).toThrow(/not a finite number/);
  });

  it('explains decimal commas', () => {
    expect(() => vibrationInputFromCsv('t;x;y;z\n0;1,5;0;1\n')).toThrow(/decimal point/);
  });

  it('refuses a single row as too short', () => {
    const { input } = vibrationInputFromCsv('time,x,y,z\n0,0,0,1\n');
    expect(input.timeS).toHaveLength(1);
    expect(() => vibrationAnalyse(input)).toThrow(/1 reading\(s\).*at least 256/);
  });

  it('refuses a header-only file and too few columns', () => {
    expect(() => vibrationInputFromCsv('time,x,y,z\n')).toThrow(/no data rows/);
    expect(() => vibrationInputFromCsv('time,x\n0,1\n')).toThrow(/needs 4/);
  });

  it('refuses more rows than the limit with a 413 error', () => {
    const big = 'time,x,y,z\n' + '0,0,0,1\n'.repeat(400_001);
    expect(() => vibrationInputFromCsv(big)).toThrow(PayloadTooLargeError);
  });
});

describe('accelerationUnitFromHeader', () => {
  it('recognises common unit tokens', () => {
    expect(accelerationUnitFromHeader('x (m/s²)')).toBe('m/s2');
    expect(accelerationUnitFromHeader('accel_x_ms2')).toBe('m/s2');
    expect(accelerationUnitFromHeader('x [g]')).toBe('g');
    expect(accelerationUnitFromHeader('ax_g')).toBe('g');
    expect(accelerationUnitFromHeader('x')).toBeNull();
    expect(accelerationUnitFromHeader('gx')).toBeNull();
  });
});
