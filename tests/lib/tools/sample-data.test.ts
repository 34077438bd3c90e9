import { describe, expect, it } from 'vitest';
import { cleanroomClassify } from '../../../src/lib/analysis/cleanroom';
import { MagneticInputSchema, magneticFieldFit } from '../../../src/lib/analysis/magnetic';
import { psdProfileGrms } from '../../../src/lib/analysis/psd-profile';
import { thermalAnalyse } from '../../../src/lib/analysis/thermal';
import { vibrationAnalyse } from '../../../src/lib/analysis/vibration';
import { vibrationInputFromCsv } from '../../../src/lib/analysis/vibration-csv';
import {
  CLEANROOM_SAMPLE_AREA_M2,
  CLEANROOM_SAMPLE_SIZES_UM,
  cleanroomSample,
} from '../../../src/lib/tools/cleanroom-sample';
import { cleanroomCountKey, cleanroomTableRequest } from '../../../src/lib/tools/cleanroom-table';
import { MAGNETIC_SAMPLE_BACKGROUND_UT, magneticSample } from '../../../src/lib/tools/magnetic-sample';
import { magneticTableRequest } from '../../../src/lib/tools/magnetic-table';
import { PSD_PROFILE_SAMPLE, PSD_PROFILE_SAMPLE_GRMS } from '../../../src/lib/tools/psd-profile-sample';
import { psdProfileTableRequest } from '../../../src/lib/tools/psd-profile-table';
import { sampleNoise } from '../../../src/lib/tools/sample-noise';
import { THERMAL_SAMPLE_RUNS, thermalSample } from '../../../src/lib/tools/thermal-sample';
import { thermalRunKey, thermalTableRequest } from '../../../src/lib/tools/thermal-table';
import {
  VIBRATION_SAMPLE_NOISE_G,
  VIBRATION_SAMPLE_TONES,
  vibrationSampleCsv,
} from '../../../src/lib/tools/vibration-sample';

describe('sampleNoise', () => {
  it('repeats for the same index and seed and stays in [−1, 1) with mean near 0', () => {
    const values = Array.from({ length: 10_000 }, (_, i) => sampleNoise(i, 3));
    expect(sampleNoise(5, 3)).toBe(values[5]);
    expect(Math.min(...values)).toBeGreaterThanOrEqual(-1);
    expect(Math.max(...values)).toBeLessThan(1);
    // Uniform on [−1, 1): mean 0, standard error 1/√(3·10 000) ≈ 0.006; 0.03 is five of them.
    expect(Math.abs(values.reduce((s, v) => s + v, 0) / values.length)).toBeLessThan(0.03);
  });
});

describe('vibrationSampleCsv', () => {
  const { input, unitSource } = vibrationInputFromCsv(vibrationSampleCsv());
  const r = vibrationAnalyse(input, unitSource);

  it('reads as g from its header, at 200 Hz', () => {
    expect(r.units).toEqual({ input: 'g', source: 'header' });
    expect(r.sampleRateHz).toBeCloseTo(200, 6);
  });

  it('has the Grms the sines and the noise add up to', () => {
    // A sine of amplitude A has RMS A/√2 and uniform noise on ±a has variance a²/3 (any signals textbook);
    // independent parts add in mean square. 1 % covers the record holding a non-whole number of cycles.
    const meanSquare = (['x', 'y', 'z'] as const).reduce(
      (s, axis) =>
        s +
        VIBRATION_SAMPLE_TONES.reduce((t, tone) => t + tone.amplitudeG[axis] ** 2 / 2, 0) +
        VIBRATION_SAMPLE_NOISE_G ** 2 / 3,
      0,
    );
    expect(Math.abs(r.combined.rmsG / Math.sqrt(meanSquare) - 1)).toBeLessThan(0.01);
  });

  it('puts its two strongest PSD peaks within one bin of 20 Hz and 80 Hz', () => {
    const top = r.dominant
      .slice(0, 2)
      .map((d) => d.frequencyHz)
      .sort((a, b) => a - b);
    expect(Math.abs(top[0]! - 20)).toBeLessThanOrEqual(r.psd.resolutionHz);
    expect(Math.abs(top[1]! - 80)).toBeLessThanOrEqual(r.psd.resolutionHz);
  });
});

describe('thermalSample', () => {
  it('fits back each run’s time constant within three standard errors', () => {
    const s = thermalSample();
    const rows = s.timeS.map((t, i) => ({
      timeS: String(t),
      ...Object.fromEntries(s.runs.map((run, j) => [thermalRunKey(j), String(run.temperatureC[i])])),
    }));
    const req = thermalTableRequest(
      rows,
      s.runs.map((run) => run.label),
    );
    expect(req.errors).toEqual({});
    const result = thermalAnalyse(req.input!);
    result.runs.forEach((run, j) => {
      const fit = run.fit!;
      expect(run.direction).toBe('cooling');
      expect(Math.abs(fit.timeConstantS - THERMAL_SAMPLE_RUNS[j]!.timeConstantS)).toBeLessThan(
        3 * fit.timeConstantStdErrorS,
      );
    });
  });
});

describe('magneticSample', () => {
  it('gives the dipole exponent −3 through the table and the fit', () => {
    const rows = magneticSample().map((r) => ({ distanceCm: String(r.distanceCm), fieldUT: String(r.fieldUT) }));
    const req = magneticTableRequest(rows, { backgroundUT: String(MAGNETIC_SAMPLE_BACKGROUND_UT), thresholdUT: '' });
    expect(req.errors).toEqual({});
    const fit = magneticFieldFit(MagneticInputSchema.parse(req.input));
    // A dipole's far field falls as r⁻³ (Griffiths, Introduction to Electrodynamics, 4th ed., §5.4.3);
    // ±0.05 allows for the ±0.5 µT reading noise at the far readings (≈12 µT net at 20 cm).
    expect(Math.abs(fit.exponent + 3)).toBeLessThan(0.05);
  });
});

describe('cleanroomSample', () => {
  const rows = cleanroomSample().map((s) => ({
    location: s.location,
    volume: String(s.volumeL),
    ...Object.fromEntries(CLEANROOM_SAMPLE_SIZES_UM.map((size, i) => [cleanroomCountKey(size), String(s.counts[i])])),
  }));
  const req = cleanroomTableRequest(rows, {
    floorAreaM2: String(CLEANROOM_SAMPLE_AREA_M2),
    sizesUm: [...CLEANROOM_SAMPLE_SIZES_UM],
    countsAre: 'cumulative',
    volumeUnit: 'L',
  });

  it('groups rows with one label as samples of one location', () => {
    expect(req.input!.locations.map((l) => [l.label, l.samples.length])).toEqual([
      ['centre', 2],
      ['near the door', 2],
      ['back corner', 2],
    ]);
  });

  it('meets ISO Class 7 and not Class 6', () => {
    // ISO 14644-1:2015 Table 1, Class 7: 352 000 / 83 200 / 2 930 per m³ at 0.5 / 1 / 5 µm. The worst
    // location ("near the door") averages 7 200 counts at 0.5 µm in 28.3 L = 254 000 per m³: under Class 7,
    // over Class 6's 35 200.
    const r = cleanroomClassify(req.input!);
    expect(r.isoClass).toBe(7);
    expect(r.perSize[0]!.maxLocationMeanPerM3).toBeCloseTo(((7390 + 7010) / 2 / 28.3) * 1000, 6);
  });
});

describe('PSD_PROFILE_SAMPLE', () => {
  it('gives the 14.1 Grms that GEVS prints for it', () => {
    const rows = PSD_PROFILE_SAMPLE.map((p) => ({
      frequencyHz: String(p.frequencyHz),
      psdG2PerHz: 'psdG2PerHz' in p ? String(p.psdG2PerHz) : '',
      slopeDbPerOctave: 'slopeDbPerOctave' in p ? String(p.slopeDbPerOctave) : '',
    }));
    const req = psdProfileTableRequest(rows);
    // GSFC-STD-7000A Table 2.4-3, qualification: 14.1 Grms; ±0.1 covers its rounding and −6 dB/oct standing
    // for the table's 0.026 g²/Hz end point.
    expect(Math.abs(psdProfileGrms(req.input!).grms - PSD_PROFILE_SAMPLE_GRMS)).toBeLessThan(0.1);
  });
});
