import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/lib/errors';
import {
  PsdProfileInputSchema,
  psdProfileGrms,
  psdSegmentArea,
  psdSlopeExponent,
} from '../../../src/lib/analysis/psd-profile';

// GSFC-STD-7000A (GEVS), Table 2.4-3, generalized random vibration test levels, components 22.7 kg or less.
const GEVS_QUAL = [
  { frequencyHz: 20, psdG2PerHz: 0.026 },
  { frequencyHz: 50, psdG2PerHz: 0.16 },
  { frequencyHz: 800, psdG2PerHz: 0.16 },
  { frequencyHz: 2000, psdG2PerHz: 0.026 },
];
const GEVS_ACCEPT = [
  { frequencyHz: 20, psdG2PerHz: 0.013 },
  { frequencyHz: 50, psdG2PerHz: 0.08 },
  { frequencyHz: 800, psdG2PerHz: 0.08 },
  { frequencyHz: 2000, psdG2PerHz: 0.013 },
];

describe('psdProfileGrms', () => {
  it('gives the GEVS qualification level of 14.1 Grms from its breakpoints', () => {
    // GSFC-STD-7000A Table 2.4-3: qualification overall 14.1 Grms. Integration: breakpoints joined as
    // log-log segments (gives 14.14); ±0.05 covers the table's rounding to one decimal.
    expect(Math.abs(psdProfileGrms({ points: GEVS_QUAL }).grms - 14.1)).toBeLessThanOrEqual(0.05);
  });

  it('gives the GEVS acceptance level of 10.0 Grms from its breakpoints', () => {
    // GSFC-STD-7000A Table 2.4-3: acceptance overall 10.0 Grms (log-log segments give 9.995).
    expect(Math.abs(psdProfileGrms({ points: GEVS_ACCEPT }).grms - 10.0)).toBeLessThanOrEqual(0.05);
  });

  it('gives 14.1 Grms for the qualification profile stated with exact ±6 dB/oct slopes', () => {
    // Same table in its own words: 20–50 Hz +6 dB/oct, 50–800 Hz 0.16 g²/Hz, 800–2000 Hz −6 dB/oct; the
    // end levels derived from the plateau through exact ±6 dB/oct slopes (gives 14.12).
    const r = psdProfileGrms(
      PsdProfileInputSchema.parse({
        points: [
          { frequencyHz: 20 },
          { frequencyHz: 50, slopeDbPerOctave: 6, psdG2PerHz: 0.16 },
          { frequencyHz: 800, psdG2PerHz: 0.16 },
          { frequencyHz: 2000, slopeDbPerOctave: -6 },
        ],
      }),
    ).grms;
    expect(Math.abs(r - 14.1)).toBeLessThanOrEqual(0.05);
  });

  it('derives a level forward from a slope', () => {
    const r = psdProfileGrms(
      PsdProfileInputSchema.parse({
        points: [
          { frequencyHz: 20, psdG2PerHz: 0.026 },
          { frequencyHz: 40, slopeDbPerOctave: 6 },
        ],
      }),
    );
    expect(r.breakpoints[1]!.psdG2PerHz).toBeCloseTo(0.026 * 2 ** psdSlopeExponent(6), 12);
    expect(r.segments[0]!.slopeDbPerOctave).toBeCloseTo(6, 9);
  });

  it('refuses a point whose level cannot be derived', () => {
    expect(() => psdProfileGrms({ points: [{ frequencyHz: 20 }, { frequencyHz: 50, psdG2PerHz: 0.1 }] })).toThrow(
      InputError,
    );
  });

  it('refuses frequencies that do not increase', () => {
    expect(() => psdProfileGrms({ points: [GEVS_QUAL[1]!, GEVS_QUAL[0]!] })).toThrow(InputError);
  });

  it('refuses a first point given only as a slope', () => {
    expect(() =>
      psdProfileGrms({ points: [{ frequencyHz: 20, slopeDbPerOctave: 3, psdG2PerHz: 0.1 }, GEVS_QUAL[1]!] }),
    ).toThrow(InputError);
  });
});

describe('psdSegmentArea', () => {
  it('matches the trapezoid rule on a fine log grid for rising, flat and falling segments', () => {
    // Reference: numerical quadrature of P1·(f/f1)ⁿ on 200 000 log-spaced steps, independent of the closed form.
    for (const [f1, p1, f2, p2] of [
      [20, 0.026, 50, 0.16],
      [50, 0.16, 800, 0.16],
      [800, 0.16, 2000, 0.026],
      [10, 1, 100, 0.1],
    ] as const) {
      const n = Math.log(p2 / p1) / Math.log(f2 / f1);
      let area = 0;
      const steps = 200_000;
      for (let i = 0; i < steps; i++) {
        const a = f1 * (f2 / f1) ** (i / steps);
        const b = f1 * (f2 / f1) ** ((i + 1) / steps);
        area += ((p1 * (a / f1) ** n + p1 * (b / f1) ** n) / 2) * (b - a);
      }
      expect(psdSegmentArea(f1, p1, f2, p2) / area).toBeCloseTo(1, 7);
    }
  });

  it('uses P1·f1·ln(f2/f1) for a −10 dB/decade (n = −1) segment', () => {
    expect(psdSegmentArea(10, 1, 100, 0.1)).toBeCloseTo(10 * Math.log(10), 9);
  });
});

describe('psdSlopeExponent', () => {
  it('turns 6 dB/oct into n = 6/(10·log10 2)', () => {
    // 10·log10(2) = 3.0103 dB per doubling of a power quantity.
    expect(psdSlopeExponent(6)).toBeCloseTo(1.99316, 5);
    expect(psdSlopeExponent(-3)).toBeCloseTo(-0.99658, 5);
  });
});
