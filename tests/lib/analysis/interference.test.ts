import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/lib/errors';
import {
  INTERFERENCE_MAX_DEVICES,
  INTERFERENCE_MAX_READINGS_PER_DEVICE,
  InterferenceInputSchema,
  interferenceRank,
} from '../../../src/lib/analysis/interference';
import { dipoleFieldAxialT } from '../../../src/lib/analysis/magnetic';
import { SavedResultSchema } from '../../../src/lib/analysis/saved-result';
import { interferenceSavedResult } from '../../../src/lib/analysis/saved-result-tools';

// Griffiths, Introduction to Electrodynamics, §5.4.3: on-axis dipole field B = (μ0/4π)·2m/r³. A device
// modelled as a dipole of moment m (A·m², invented test inputs) crosses the threshold B* at
// r* = (μ0·2m/(4π·B*))^(1/3), which the test works out by hand from that formula.
const MU0 = 1.25663706212e-6; // CODATA 2018
const dipoleReadings = (momentAm2: number, distancesCm: number[]) =>
  distancesCm.map((d) => ({ distanceCm: d, fieldUT: dipoleFieldAxialT(momentAm2, d / 100) * 1e6 }));
const crossingCm = (momentAm2: number, thresholdUT: number) =>
  100 * ((MU0 * 2 * momentAm2) / (4 * Math.PI * thresholdUT * 1e-6)) ** (1 / 3);
const DISTANCES = [5, 8, 10, 15, 20, 30, 40, 60];

describe('interferenceRank', () => {
  it('ranks dipole-like devices by the distance where their field falls to the threshold', () => {
    const input = InterferenceInputSchema.parse({
      receiver: 'magnetometer',
      thresholdUT: 1,
      devices: [
        { label: 'Desk fan motor', readings: dipoleReadings(0.05, DISTANCES) },
        { label: 'Phone charger', readings: dipoleReadings(0.4, DISTANCES) },
        { label: 'Lamp ballast', readings: dipoleReadings(0.15, DISTANCES) },
      ],
    });
    const r = interferenceRank(input);
    expect(r.ranking.map((d) => d.label)).toEqual(['Phone charger', 'Lamp ballast', 'Desk fan motor']);
    expect(r.ranking.map((d) => d.rank)).toEqual([1, 2, 3]);
    for (const [d, m] of [
      [r.ranking[0]!, 0.4],
      [r.ranking[1]!, 0.15],
      [r.ranking[2]!, 0.05],
    ] as const) {
      // Exact dipole data: the fit's exponent is −3 and its threshold distance is the hand-worked r*.
      expect(d.fit!.exponent).toBeCloseTo(-3, 9);
      expect(d.fit!.thresholdDistanceCm!).toBeCloseTo(crossingCm(m, 1), 6);
      expect(d.keepOutCm!).toBeGreaterThanOrEqual(d.fit!.thresholdDistanceCm! - 1e-9);
    }
    expect(r.summary).toBe(
      `Phone charger needs the most room: keep it at least ${Math.ceil(r.ranking[0]!.keepOutCm!)} cm from the receiver.`,
    );
  });

  it('never gives a keep-out distance closer than a reading still above the threshold', () => {
    // A field that falls slowly near the device and fast beyond: the fit alone would put r* inside 40 cm,
    // but the reading at 40 cm still exceeds the threshold.
    const r = interferenceRank(
      InterferenceInputSchema.parse({
        receiver: 'magnetometer',
        thresholdUT: 2,
        devices: [
          {
            label: 'Motor',
            readings: [
              { distanceCm: 5, fieldUT: 40 },
              { distanceCm: 10, fieldUT: 30 },
              { distanceCm: 20, fieldUT: 20 },
              { distanceCm: 40, fieldUT: 3 },
            ],
          },
        ],
      }),
    );
    expect(r.ranking[0]!.keepOutCm).toBeGreaterThanOrEqual(40);
  });

  it('gives 0 cm for a device whose field never rose above the threshold, ranked last', () => {
    const r = interferenceRank(
      InterferenceInputSchema.parse({
        receiver: 'magnetometer',
        backgroundUT: 48,
        thresholdUT: 0.5,
        devices: [
          { label: 'Wooden ruler', readings: [5, 10, 20].map((d) => ({ distanceCm: d, fieldUT: 48.2 })) },
          {
            label: 'Speaker',
            readings: dipoleReadings(0.3, DISTANCES).map((x) => ({ ...x, fieldUT: x.fieldUT + 48 })),
          },
        ],
      }),
    );
    expect(r.ranking.map((d) => [d.label, d.keepOutCm === 0])).toEqual([
      ['Speaker', false],
      ['Wooden ruler', true],
    ]);
    expect(r.ranking[1]!.warnings[0]).toMatch(/did not disturb/);
  });

  it('ranks AM-radio listening distances by the farthest try', () => {
    const r = interferenceRank(
      InterferenceInputSchema.parse({
        receiver: 'am-radio',
        devices: [
          { label: 'LED lamp', noiseGoneCm: [30, 45, 40] },
          { label: 'Charger', noiseGoneCm: [80, 75] },
        ],
      }),
    );
    expect(r.ranking.map((d) => [d.label, d.keepOutCm])).toEqual([
      ['Charger', 80],
      ['LED lamp', 45],
    ]);
    expect(r.thresholdUT).toBeNull();
  });

  it('names the device and its readings when its falloff cannot be fitted', () => {
    const input = InterferenceInputSchema.parse({
      receiver: 'magnetometer',
      thresholdUT: 1,
      devices: [
        {
          label: 'Kettle base',
          readings: [
            { distanceCm: 5, fieldUT: 9 },
            { distanceCm: 5, fieldUT: 9 },
            { distanceCm: 5, fieldUT: 9 },
          ],
        },
      ],
    });
    try {
      interferenceRank(input);
      expect.unreachable();
    } catch (err) {
      expect(err).toBeInstanceOf(InputError);
      expect((err as InputError).message).toMatch(/^Kettle base: .*same distance/);
      expect((err as InputError).fields).toHaveProperty(['devices.0.readings']);
    }
  });

  it('builds a saved result within the bounds for its largest input', () => {
    const devices = Array.from({ length: INTERFERENCE_MAX_DEVICES }, (_, i) => ({
      label: `Device ${i + 1}`,
      readings: dipoleReadings(
        0.02 * (i + 1),
        Array.from({ length: INTERFERENCE_MAX_READINGS_PER_DEVICE }, (_, k) => 3 + k),
      ),
    }));
    const saved = interferenceSavedResult(
      interferenceRank(InterferenceInputSchema.parse({ receiver: 'magnetometer', devices })),
    );
    expect(SavedResultSchema.safeParse(saved).success).toBe(true);
    expect(saved.plot.series).toHaveLength(INTERFERENCE_MAX_DEVICES);
  });
});

describe('InterferenceInputSchema', () => {
  const issues = (v: unknown) => {
    const r = InterferenceInputSchema.safeParse(v);
    return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
  };
  it('asks for readings with a magnetometer and distances with a radio, and refuses a device listed twice', () => {
    expect(issues({ receiver: 'magnetometer', devices: [{ label: 'A', noiseGoneCm: [3] }] })).toEqual([
      'devices.0.readings: with a magnetometer, give field readings at several distances',
    ]);
    expect(issues({ receiver: 'am-radio', devices: [{ label: 'A' }] })[0]).toMatch(/^devices.0.noiseGoneCm/);
    expect(
      issues({
        receiver: 'am-radio',
        devices: [
          { label: 'A', noiseGoneCm: [3] },
          { label: 'A', noiseGoneCm: [4] },
        ],
      }),
    ).toEqual(['devices.1.label: "A" is listed twice']);
  });
  it('refuses NaN, negative distances and more devices than the cap', () => {
    expect(issues({ receiver: 'am-radio', devices: [{ label: 'A', noiseGoneCm: [Number.NaN] }] })).toHaveLength(1);
    expect(issues({ receiver: 'am-radio', devices: [{ label: 'A', noiseGoneCm: [-3] }] })).toHaveLength(1);
    const many = Array.from({ length: INTERFERENCE_MAX_DEVICES + 1 }, (_, i) => ({ label: `D${i}`, noiseGoneCm: [5] }));
    expect(issues({ receiver: 'am-radio', devices: many })[0]).toMatch(/at most 12/);
  });
});
