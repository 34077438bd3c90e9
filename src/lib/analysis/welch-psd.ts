/**
 * Power spectral density by Welch's method (P. D. Welch, IEEE Trans. Audio Electroacoustics AU-15(2),
 * 1967): half-overlapping segments, each with its mean removed and a periodic Hann window applied,
 * averaged periodograms, one-sided. Transforms by fft.js (radix-4 real FFT).
 */
import FFT from 'fft.js';

/** Shortest segment the PSD uses, samples. */
export const WELCH_MIN_SEGMENT_LENGTH = 64;
/** Longest segment the PSD uses, samples. */
export const WELCH_MAX_SEGMENT_LENGTH = 16_384;
/** Segment length chosen when none is asked for: the longest up to this that still gives enough segments. */
export const WELCH_DEFAULT_MAX_SEGMENT_LENGTH = 4_096;
/** Fewest half-overlapping segments to average; 7 segments of 64 samples need 256 samples. */
export const WELCH_MIN_SEGMENTS = 7;

export interface WelchPsd {
  /** Bin centre frequencies 0 … fs/2, Hz. */
  frequencyHz: Float64Array;
  /** One-sided PSD in (input unit)²/Hz at each bin. */
  psd: Float64Array;
  /** Bin spacing fs/N, Hz. */
  resolutionHz: number;
  segmentLength: number;
  segmentCount: number;
}

/** Number of half-overlapping segments of `segmentLength` in `sampleCount` samples (the tail is dropped). */
export function welchSegmentCount(sampleCount: number, segmentLength: number): number {
  const hop = segmentLength / 2;
  return sampleCount < segmentLength ? 0 : Math.floor((sampleCount - segmentLength) / hop) + 1;
}

/**
 * The longest power-of-two segment ≤ WELCH_DEFAULT_MAX_SEGMENT_LENGTH that leaves at least
 * WELCH_MIN_SEGMENTS segments; null when even WELCH_MIN_SEGMENT_LENGTH does not.
 */
export function welchDefaultSegmentLength(sampleCount: number): number | null {
  for (let n = WELCH_DEFAULT_MAX_SEGMENT_LENGTH; n >= WELCH_MIN_SEGMENT_LENGTH; n /= 2) {
    if (welchSegmentCount(sampleCount, n) >= WELCH_MIN_SEGMENTS) return n;
  }
  return null;
}

/**
 * The periodic Hann window w[n] = 0.5 − 0.5·cos(2πn/N), n = 0 … N − 1 (Harris, Proc. IEEE 66(1), 1978):
 * its equivalent noise bandwidth N·Σw²/(Σw)² is exactly 1.5 bins, unlike the symmetric form.
 */
export function hannPeriodic(length: number): Float64Array {
  const w = new Float64Array(length);
  for (let i = 0; i < length; i++) w[i] = 0.5 - 0.5 * Math.cos((2 * Math.PI * i) / length);
  return w;
}

const fftCache = new Map<number, { fft: FFT; out: number[]; window: Float64Array; frame: Float64Array }>();

function fftFor(length: number) {
  let entry = fftCache.get(length);
  if (!entry) {
    const fft = new FFT(length);
    entry = {
      fft,
      out: fft.createComplexArray() as number[],
      window: hannPeriodic(length),
      frame: new Float64Array(length),
    };
    fftCache.set(length, entry);
  }
  return entry;
}

/**
 * One-sided Welch PSD of a real signal sampled at `sampleRateHz`, in (signal unit)²/Hz, with segments of
 * `segmentLength` samples (a power of two, 64 … 16 384) overlapping by half. Its sum times resolutionHz
 * equals the signal's variance (Parseval) up to windowing and edge-bin losses. Throws RangeError for a
 * segment length that is not a power of two in range or longer than the signal (callers check first).
 */
export function welchPsd(signal: ArrayLike<number>, sampleRateHz: number, segmentLength: number): WelchPsd {
  const n = segmentLength;
  if (!Number.isInteger(Math.log2(n)) || n < WELCH_MIN_SEGMENT_LENGTH || n > WELCH_MAX_SEGMENT_LENGTH) {
    throw new RangeError(
      `welchPsd: segment length ${n} is not a power of two in ${WELCH_MIN_SEGMENT_LENGTH}…${WELCH_MAX_SEGMENT_LENGTH}`,
    );
  }
  const segments = welchSegmentCount(signal.length, n);
  if (segments < 1) throw new RangeError(`welchPsd: ${signal.length} samples are fewer than one segment of ${n}`);
  const { fft, out, window, frame } = fftFor(n);
  const bins = n / 2 + 1;
  const acc = new Float64Array(bins);
  const hop = n / 2;
  for (let s = 0; s < segments; s++) {
    const start = s * hop;
    let mean = 0;
    for (let i = 0; i < n; i++) mean += signal[start + i]!;
    mean /= n;
    for (let i = 0; i < n; i++) frame[i] = (signal[start + i]! - mean) * window[i]!;
    fft.realTransform(out, frame);
    for (let k = 0; k < bins; k++) {
      const re = out[2 * k]!;
      const im = out[2 * k + 1]!;
      acc[k]! += re * re + im * im;
    }
  }
  // Periodic Hann: Σw² = 3N/8 exactly. One-sided scaling doubles every bin but DC and Nyquist.
  const windowPower = (3 * n) / 8;
  const scale = 1 / (sampleRateHz * windowPower * segments);
  const psd = new Float64Array(bins);
  const frequencyHz = new Float64Array(bins);
  const resolutionHz = sampleRateHz / n;
  for (let k = 0; k < bins; k++) {
    psd[k] = acc[k]! * scale * (k === 0 || k === bins - 1 ? 1 : 2);
    frequencyHz[k] = k * resolutionHz;
  }
  return { frequencyHz, psd, resolutionHz, segmentLength: n, segmentCount: segments };
}

/** Integral of a PSD over [lowHz, highHz) by the rectangle rule on its bins, in (unit)²; 0 for an empty band. */
export function psdBandPower(psd: WelchPsd, lowHz: number, highHz: number): number {
  let sum = 0;
  for (let k = 0; k < psd.psd.length; k++) {
    const f = psd.frequencyHz[k]!;
    if (f >= lowHz && f < highHz) sum += psd.psd[k]!;
  }
  return sum * psd.resolutionHz;
}
