import { describe, expect, it } from 'vitest';
import {
  hannPeriodic,
  psdBandPower,
  welchDefaultSegmentLength,
  welchPsd,
  welchSegmentCount,
} from '../../../src/lib/analysis/welch-psd';
import { seededRandom } from './seeded-random';

function variance(x: ArrayLike<number>): number {
  let m = 0;
  for (let i = 0; i < x.length; i++) m += x[i]!;
  m /= x.length;
  let s = 0;
  for (let i = 0; i < x.length; i++) s += (x[i]! - m) ** 2;
  return s / x.length;
}

describe('hannPeriodic', () => {
  it('has an equivalent noise bandwidth of exactly 1.5 bins', () => {
    // Harris, "On the use of windows…", Proc. IEEE 66(1), 1978, Table 1: Hann ENBW 1.50 bins (periodic, DFT-even form).
    for (const n of [64, 1000, 4096]) {
      const w = hannPeriodic(n);
      const s1 = w.reduce((a, v) => a + v, 0);
      const s2 = w.reduce((a, v) => a + v * v, 0);
      expect((n * s2) / (s1 * s1)).toBeCloseTo(1.5, 12);
    }
  });
});

describe('welchPsd', () => {
  it('integrates to the variance of white noise within 2 % (Parseval)', () => {
    // Welch, IEEE Trans. Audio Electroacoustics AU-15 (1967): the one-sided PSD integrates to the variance;
    // 2 % allows the windowing and edge-bin losses and the per-segment mean removal.
    const rnd = seededRandom(7);
    const x = Float64Array.from({ length: 100_000 }, () => 0.3 * rnd.normal() + 1);
    const p = welchPsd(x, 100, 1024);
    const area = p.psd.reduce((a, v) => a + v, 0) * p.resolutionHz;
    expect(Math.abs(area / variance(x) - 1)).toBeLessThan(0.02);
  });

  it('integrates to the variance of a multi-tone signal within 2 % (Parseval)', () => {
    const fs = 200;
    const x = Float64Array.from(
      { length: 40_000 },
      (_, i) => Math.sin((2 * Math.PI * 12.3 * i) / fs) + 0.5 * Math.sin((2 * Math.PI * 47.1 * i) / fs + 1),
    );
    const p = welchPsd(x, fs, 512);
    const area = psdBandPower(p, 0, fs);
    expect(Math.abs(area / variance(x) - 1)).toBeLessThan(0.02);
  });

  it('peaks at the frequency of a pure sine', () => {
    // A sine of amplitude A carries A²/2 of mean square at its frequency (any signals text, e.g. Bendat & Piersol,
    // Random Data, ch. 5); its Welch PSD has its maximum in the bin holding that frequency.
    const fs = 100;
    for (const f0 of [7.8125, 13.3, 31.7]) {
      const x = Float64Array.from({ length: 20_000 }, (_, i) => 2 * Math.sin((2 * Math.PI * f0 * i) / fs));
      const p = welchPsd(x, fs, 1024);
      let best = 0;
      for (let k = 1; k < p.psd.length; k++) if (p.psd[k]! > p.psd[best]!) best = k;
      expect(Math.abs(p.frequencyHz[best]! - f0)).toBeLessThanOrEqual(p.resolutionHz / 2);
      expect(psdBandPower(p, f0 - 3 * p.resolutionHz, f0 + 3 * p.resolutionHz)).toBeCloseTo(2, 1);
    }
  });

  it('matches a direct DFT periodogram for a single segment', () => {
    // Reference: the DFT sum X_k = Σ x_n e^(−2πikn/N) evaluated directly, independent of fft.js.
    const n = 64;
    const rnd = seededRandom(3);
    const x = Float64Array.from({ length: n }, () => rnd.normal());
    const p = welchPsd(x, 10, n);
    const mean = x.reduce((a, v) => a + v, 0) / n;
    const w = hannPeriodic(n);
    for (let k = 0; k <= n / 2; k++) {
      let re = 0;
      let im = 0;
      for (let j = 0; j < n; j++) {
        const v = (x[j]! - mean) * w[j]!;
        re += v * Math.cos((2 * Math.PI * k * j) / n);
        im -= v * Math.sin((2 * Math.PI * k * j) / n);
      }
      const expected = ((re * re + im * im) / (10 * ((3 * n) / 8))) * (k === 0 || k === n / 2 ? 1 : 2);
      expect(p.psd[k]).toBeCloseTo(expected, 10);
    }
  });

  it('refuses a segment length that is not a power of two', () => {
    expect(() => welchPsd(new Float64Array(1000), 100, 100)).toThrow(RangeError);
  });
});

describe('welchSegmentCount', () => {
  it('counts half-overlapping segments and drops the tail', () => {
    expect(welchSegmentCount(256, 64)).toBe(7);
    expect(welchSegmentCount(287, 64)).toBe(7);
    expect(welchSegmentCount(288, 64)).toBe(8);
    expect(welchSegmentCount(63, 64)).toBe(0);
  });
});

describe('welchDefaultSegmentLength', () => {
  it('picks the longest power of two leaving at least seven segments, or null', () => {
    expect(welchDefaultSegmentLength(360_000)).toBe(4096);
    expect(welchDefaultSegmentLength(1000)).toBe(128);
    expect(welchDefaultSegmentLength(255)).toBeNull();
  });
});
