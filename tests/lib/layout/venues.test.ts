import { describe, expect, test } from 'vitest';
import {
  CustomVenueSchema,
  VENUES,
  VENUE_MARGIN_FRACTION,
  solveVenueScale,
  venueCustom,
} from '../../../src/lib/layout/venues';
import { MM_PER_FOOT, feetToMm } from '../../../src/lib/layout/units';
import { THREAD_TIE_OFF_ALLOWANCE_MM } from '../../../src/lib/geometry/wire-boom';
import { demoModel } from '../geometry/fixtures';

describe('VENUES', () => {
  test('uses the published court and field sizes', () => {
    // FIBA Official Basketball Rules, art. 2: 28 × 15 m.
    expect([VENUES['gym-fiba'].lengthMm, VENUES['gym-fiba'].widthMm]).toEqual([28000, 15000]);
    // NFHS basketball rules, rule 1: 84 × 50 ft; NIST SP 811 (2008), App. B: 1 ft = 0.3048 m exactly.
    expect(VENUES['gym-nfhs'].lengthMm).toBeCloseTo(25603.2, 9);
    expect(VENUES['gym-nfhs'].widthMm).toBeCloseTo(15240, 9);
    // NFHS football rules, rule 1: 360 × 160 ft including end zones.
    expect(VENUES['football-field'].lengthMm).toBeCloseTo(109728, 9);
    expect(VENUES['football-field'].widthMm).toBeCloseTo(48768, 9);
  });

  test('uses the exact international foot, not the survey foot', () => {
    // NIST SP 811 (2008), Appendix B: 1 ft = 0.3048 m exactly; the survey foot is 1200/3937 m.
    expect(MM_PER_FOOT).toBe(304.8);
    expect(feetToMm(3937)).not.toBeCloseTo(1_200_000, 3);
  });
});

describe('solveVenueScale', () => {
  // Skein span by hand: ±x booms leave the flats at the 1.2 m apothem: 2·(1.2 + 35) = 72.4 m; the ±y booms
  // leave side 1 and side 4 at 0.6 m from the face centre along the wall (direction 150°, resp. 330°),
  // tilted 30° to point along ±y, so the foot is at y = 1.2·sin 60° + 0.6·sin 150° = 1.3392 m, tip 36.3392 m.
  const spanY = 2 * (1.2 * (Math.sqrt(3) / 2) + 0.6 * 0.5 + 35) * 1000;

  test('finds the largest 1:N that fits the Skein probe on a FIBA court with the margin', () => {
    const r = solveVenueScale(demoModel('skein-probe'), VENUES['gym-fiba']);
    const usable = [28000, 15000].map((d) => d * (1 - 2 * VENUE_MARGIN_FRACTION)) as [number, number];
    const expected = Math.ceil(Math.max(spanY / usable[0], 72400 / usable[1]));
    expect(r.scaleDenominator).toBe(expected);
    expect(r.scaleDenominator).toBe(6);
    expect(r.usualScaleDenominator).toBe(10);
    expect(r.laidOutMm[0]).toBeCloseTo(spanY / 6, 0);
  });

  test('gives each wire boom its length at scale plus the tie-off allowance', () => {
    const r = solveVenueScale(demoModel('skein-probe'), VENUES['football-field']);
    expect(r.scaleDenominator).toBe(2);
    expect(r.threads).toHaveLength(4);
    for (const t of r.threads) {
      expect(t.deployedLengthMm).toBeCloseTo(35000 / 2, 9);
      expect(t.threadLengthMm).toBeCloseTo(17500 + THREAD_TIE_OFF_ALLOWANCE_MM, 9);
    }
    expect(r.explanation).toMatch(/1:2\b/);
  });

  test('lays a small model out at full size when it fits', () => {
    const r = solveVenueScale(demoModel('wren-3u'), VENUES.classroom, 'us');
    expect(r.scaleDenominator).toBe(1);
    expect(r.explanation).toMatch(/full size/);
    expect(r.explanation).toMatch(/in\b/);
  });

  test('takes a custom venue in metres', () => {
    const v = venueCustom({ lengthM: 10, widthM: 4 });
    expect([v.lengthMm, v.widthMm]).toEqual([10000, 4000]);
    expect(solveVenueScale(demoModel('skein-probe'), v).scaleDenominator).toBe(
      Math.ceil(Math.max(spanY / 9000, 72400 / 3600)),
    );
  });
});

describe('CustomVenueSchema', () => {
  test('says what would work for a length that is not a number', () => {
    const result = CustomVenueSchema.safeParse({ lengthM: Number('abc'), widthM: 7 });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.message).toBe('the venue length must be a number of metres, e.g. 9');
  });
});
