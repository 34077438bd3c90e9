import { describe, expect, it } from 'vitest';
import { CleanroomInputSchema, cleanroomClassify } from '../../../src/lib/analysis/cleanroom';
import { MagneticInputSchema, dipoleFieldAxialT, magneticFieldFit } from '../../../src/lib/analysis/magnetic';
import { orbitEclipse } from '../../../src/lib/analysis/orbit-eclipse';
import { psdProfileGrms } from '../../../src/lib/analysis/psd-profile';
import { DeploymentInputSchema, deploymentAnalyse } from '../../../src/lib/analysis/deployment';
import {
  SAVED_RESULT_MAX_POINTS,
  SAVED_SERIES_LABEL_MAX,
  SavedResultSchema,
  seriesDownsample,
  seriesLabel,
} from '../../../src/lib/analysis/saved-result';
import {
  cleanroomSavedResult,
  deploymentSavedResult,
  magneticSavedResult,
  orbitEclipseSavedResult,
  psdProfileSavedResult,
  thermalSavedResult,
  vibrationSavedResult,
} from '../../../src/lib/analysis/saved-result-tools';
import { ThermalInputSchema, thermalAnalyse } from '../../../src/lib/analysis/thermal';
import { VibrationInputSchema, vibrationAnalyse } from '../../../src/lib/analysis/vibration';

describe('seriesDownsample', () => {
  it('keeps at most the limit and keeps the highest peak', () => {
    const pts = Array.from({ length: 50_000 }, (_, i): [number, number] => [
      i,
      Math.sin(i / 100) + (i === 31_337 ? 10 : 0),
    ]);
    const out = seriesDownsample(pts);
    expect(out.length).toBeLessThanOrEqual(SAVED_RESULT_MAX_POINTS);
    expect(out).toContainEqual([31_337, pts[31_337]![1]]);
    expect(out.every((p, i) => i === 0 || p[0] > out[i - 1]![0])).toBe(true);
  });

  it('returns short series unchanged', () => {
    const pts: [number, number][] = [
      [1, 2],
      [3, 4],
    ];
    expect(seriesDownsample(pts)).toBe(pts);
  });
});

describe('vibrationSavedResult', () => {
  it('stores a log-log PSD per axis within the point limit and passes the schema', () => {
    const timeS = Array.from({ length: 200_000 }, (_, i) => i / 1000);
    const x = timeS.map((t) => Math.sin(2 * Math.PI * 40 * t));
    const r = vibrationAnalyse(VibrationInputSchema.parse({ timeS, x, y: x, z: x, units: 'g', segmentLength: 16_384 }));
    const saved = vibrationSavedResult(r);
    expect(saved.plot.kind).toBe('loglog');
    expect(saved.plot.series).toHaveLength(3);
    expect(saved.plot.series[0]!.points.length).toBeLessThanOrEqual(SAVED_RESULT_MAX_POINTS);
    expect(SavedResultSchema.safeParse(JSON.parse(JSON.stringify(saved))).success).toBe(true);
  });
});

describe('SavedResultSchema', () => {
  it('refuses an unknown tool and a series over the point limit', () => {
    const good = psdProfileSavedResult(
      psdProfileGrms({
        points: [
          { frequencyHz: 20, psdG2PerHz: 0.01 },
          { frequencyHz: 2000, psdG2PerHz: 0.01 },
        ],
      }),
    );
    expect(SavedResultSchema.safeParse(good).success).toBe(true);
    expect(SavedResultSchema.safeParse({ ...good, tool: 'other' }).success).toBe(false);
    const long = Array.from({ length: SAVED_RESULT_MAX_POINTS + 1 }, (_, i) => [i, i]);
    expect(
      SavedResultSchema.safeParse({ ...good, plot: { ...good.plot, series: [{ label: 'a', points: long }] } }).success,
    ).toBe(false);
  });
});

describe('tool saved results', () => {
  it('builds a valid saved result for every other tool', () => {
    const timeS = Array.from({ length: 30 }, (_, i) => i * 60);
    const thermalIn = ThermalInputSchema.parse({
      runs: [{ label: 'lamp', timeS, temperatureC: timeS.map((t) => 40 - 20 * Math.exp(-t / 500)) }],
    });
    const readings = [2, 3, 4, 6, 8].map((d) => ({ distanceCm: d, fieldUT: dipoleFieldAxialT(0.5, d / 100) * 1e6 }));
    const room = CleanroomInputSchema.parse({
      floorAreaM2: 2,
      sizesUm: [0.5, 5],
      locations: [{ label: 'A', samples: [{ volume: 2.83, volumeUnit: 'L', counts: [100, 2] }] }],
    });
    const all = [
      thermalSavedResult(thermalIn, thermalAnalyse(thermalIn)),
      magneticSavedResult(readings, magneticFieldFit(MagneticInputSchema.parse({ readings }))),
      cleanroomSavedResult(cleanroomClassify(room)),
      orbitEclipseSavedResult({ altitudeKm: 400 }, orbitEclipse({ altitudeKm: 400 })),
    ];
    for (const s of all) expect(SavedResultSchema.safeParse(JSON.parse(JSON.stringify(s))).success).toBe(true);
    expect(all[0]!.plot.series.map((s) => s.label)).toEqual(['lamp', 'lamp (fit)']);
  });
});

describe('series labels at the length limit', () => {
  const longest = 'w'.repeat(SAVED_SERIES_LABEL_MAX);

  it('keeps a name and suffix that fit, and shortens a longer name so the suffix survives', () => {
    expect(seriesLabel('lamp', ' (fit)')).toBe('lamp (fit)');
    const label = seriesLabel(longest, ': 95 % low');
    expect(label).toHaveLength(SAVED_SERIES_LABEL_MAX);
    expect(label.endsWith('…: 95 % low')).toBe(true);
    // A character outside the BMP (two UTF-16 units, as zod counts) is never split in half.
    const astral = seriesLabel('🚀'.repeat(40), ' (fit)');
    expect(astral.length).toBeLessThanOrEqual(SAVED_SERIES_LABEL_MAX);
    expect(astral).toMatch(/^(🚀)+… \(fit\)$/u);
  });

  it('saves a deployment and a thermal result whose names are as long as the tools accept', () => {
    const deployment = DeploymentInputSchema.parse({
      designs: [{ label: longest, trials: [{ outcome: 'none' }, { outcome: 'partial' }] }],
    });
    const thermal = ThermalInputSchema.parse({
      runs: [{ label: longest, timeS: [0, 60, 120, 180], temperatureC: [40, 30, 25, 22] }],
    });
    const saved = [
      deploymentSavedResult(deploymentAnalyse(deployment)),
      thermalSavedResult(thermal, thermalAnalyse(thermal)),
    ];
    for (const s of saved) {
      expect(SavedResultSchema.safeParse(JSON.parse(JSON.stringify(s))).success).toBe(true);
      // Each line of a plot keeps a label of its own.
      const labels = s.plot.series.map((x) => x.label);
      expect(new Set(labels).size).toBe(labels.length);
    }
  });
});
