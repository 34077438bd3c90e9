import { describe, expect, test } from 'vitest';
import {
  stakeOutFeet,
  stakeOutInverse,
  stakeOutPlan,
  stakeOutQuadrant,
  ROPE_KNOT_ALLOWANCE_MM,
} from '../../../src/lib/events/stake-out';
import { VENUES, venueCustom } from '../../../src/lib/layout/venues';
import { demoModel } from '../geometry/fixtures';

const skein = demoModel('skein-probe');
const deg = Math.PI / 180;

describe('stakeOutFeet', () => {
  // NIST SP 811 (2008), Appendix B: 1 ft = 0.3048 m exactly (international foot, not the US survey foot).
  test('converts with the international foot of exactly 0.3048 m', () => {
    expect(stakeOutFeet(0.3048)).toBe(1);
    expect(stakeOutFeet(30.48)).toBeCloseTo(100, 12);
    expect(stakeOutFeet(100)).toBeCloseTo(328.083989501, 8);
    // The US survey foot (1200/3937 m) would give 328.0833 ft for 100 m: the check tells them apart.
    expect(Math.abs(stakeOutFeet(100) - (100 * 3937) / 1200)).toBeGreaterThan(5e-4);
  });
});

describe('stakeOutInverse', () => {
  // Plane-surveying inverse: distance √(Δx² + Δy²), azimuth from north clockwise = atan2(departure, latitude)
  // (e.g. Ghilani & Wolf, Elementary Surveying, ch. 10 on coordinate geometry; from memory).
  test('gives a 3-4-5 triangle its 5 m and an azimuth of 180° − atan(4/3)', () => {
    const { distanceM, bearingDeg } = stakeOutInverse([10, 10], [14, 7]);
    expect(distanceM).toBeCloseTo(5, 12);
    expect(bearingDeg).toBeCloseTo(180 - Math.atan(4 / 3) / deg, 10);
    expect(stakeOutQuadrant(bearingDeg)).toBe('S 53°08′ E');
  });

  test('reads the four quadrants and due directions', () => {
    expect(stakeOutInverse([0, 0], [0, 2]).bearingDeg).toBe(0);
    expect(stakeOutInverse([0, 0], [2, 0]).bearingDeg).toBe(90);
    expect(stakeOutInverse([0, 0], [-1, -1]).bearingDeg).toBeCloseTo(225, 12);
    expect(stakeOutQuadrant(315)).toBe('N 45°00′ W');
    expect(stakeOutQuadrant(30.5)).toBe('N 30°30′ E');
    expect(stakeOutQuadrant(270)).toBe('W');
    expect(stakeOutInverse([1, 1], [1, 1])).toEqual({ distanceM: 0, bearingDeg: 0 });
  });
});

describe('stakeOutPlan', () => {
  const venue = venueCustom({ lengthM: 120, widthM: 100 });
  const plan = stakeOutPlan(skein, venue, 1);
  const tip = (label: string) => plan.points.find((p) => p.label === label)!;

  // The Skein probe (content/models/skein-probe.json): hexagon 2.4 m across the flats, so the apothem is 1.2 m;
  // radial booms of 35 m leave the middle of a side along its normal, so their tips lie 1.2 + 35 = 36.2 m from
  // the centre.
  test('puts each radial boom tip at the half-width plus the boom length from the centre stake (within 1 mm)', () => {
    expect(Math.abs(tip('Wire boom +X').distanceM - 36.2)).toBeLessThan(0.001);
    expect(Math.abs(tip('Wire boom −X').distanceM - 36.2)).toBeLessThan(0.001);
  });

  // Law of cosines (any trigonometry text): the +Y boom's foot is 0.6 m along side 1 from its middle, so
  // |foot| = √(1.2² + 0.6²) at atan(0.6/1.2) from the side's normal; the boom leaves at 30° from that normal.
  test('puts the offset, tilted booms where the law of cosines says', () => {
    const foot = Math.hypot(1.2, 0.6);
    const theta = 30 * deg - Math.atan(0.5);
    const expected = Math.sqrt(foot ** 2 + 35 ** 2 + 2 * foot * 35 * Math.cos(theta));
    for (const label of ['Wire boom +Y', 'Wire boom −Y'])
      expect(Math.abs(tip(label).distanceM - expected)).toBeLessThan(0.001);
  });

  test('gives the booms bearings 90° apart, as the model places them', () => {
    const line = (label: string) => {
      const b = plan.booms.find((x) => x.label === label)!;
      return stakeOutInverse(b.footM, b.tipM).bearingDeg;
    };
    const turn = (a: number, b: number) => (((b - a) % 360) + 360) % 360;
    expect(turn(line('Wire boom +X'), line('Wire boom +Y'))).toBeCloseTo(270, 9);
    expect(turn(line('Wire boom +X'), line('Wire boom −X'))).toBeCloseTo(180, 9);
    expect(turn(line('Wire boom +Y'), line('Wire boom −Y'))).toBeCloseTo(180, 9);
    expect(tip('Wire boom +X').bearingDeg).toBeCloseTo(180, 9);
  });

  // Latitude = d·cos(Az), departure = d·sin(Az) (Ghilani & Wolf, as above): distance and bearing rebuild the offsets.
  test('gives baseline offsets that agree with each distance and bearing', () => {
    for (const p of plan.points) {
      expect(plan.centreM[0] + p.distanceM * Math.sin(p.bearingDeg * deg)).toBeCloseTo(p.xM, 9);
      expect(plan.centreM[1] + p.distanceM * Math.cos(p.bearingDeg * deg)).toBeCloseTo(p.yM, 9);
    }
  });

  // CRC Standard Mathematical Tables: a regular hexagon's circumradius is the apothem / cos(30°).
  test('stakes six body corners on the circumradius and leaves the axial booms standing', () => {
    const corners = plan.points.filter((p) => p.kind === 'body-corner');
    expect(corners).toHaveLength(6);
    for (const c of corners) expect(c.distanceM).toBeCloseTo(1.2 / Math.cos(30 * deg), 9);
    expect(plan.upright.sort()).toEqual(['Axial boom, bottom', 'Axial boom, top']);
  });

  test('cuts each wire boom its length at scale plus the stated knot allowance', () => {
    for (const b of plan.booms) {
      expect(b.material).toBe('rope');
      expect(b.cutLengthM).toBeCloseTo(35 + ROPE_KNOT_ALLOWANCE_MM / 1000, 12);
    }
    const half = stakeOutPlan(skein, venue, 10);
    expect(half.booms[0]!.lengthM).toBeCloseTo(3.5, 12);
    expect(Math.abs(half.points[0]!.distanceM - 3.62)).toBeLessThan(0.001);
  });

  // NFHS football rules, rule 1: 360 × 160 ft; 160 ft = 48.77 m leaves 43.9 m inside a 5 % border, less than
  // the probe's 72.4 m: it fits only from 1:2.
  test('says a life-size probe does not fit the football field and that 1:2 does', () => {
    const field = stakeOutPlan(skein, VENUES['football-field'], 1);
    expect(field.fits).toBe(false);
    expect(field.venueScale.scaleDenominator).toBe(2);
    expect(stakeOutPlan(skein, VENUES['football-field'], 2).fits).toBe(true);
  });

  test('centres the layout on the venue', () => {
    const xs = plan.points.map((p) => p.xM);
    expect((Math.min(...xs) + Math.max(...xs)) / 2).toBeCloseTo(60, 6);
  });
});
