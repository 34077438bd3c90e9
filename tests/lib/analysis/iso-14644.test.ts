import { describe, expect, it } from 'vitest';
import {
  iso14644Limit,
  iso14644MinSampleVolumeL,
  iso14644SamplingLocations,
} from '../../../src/lib/analysis/iso-14644';

describe('iso14644Limit', () => {
  // ISO 14644-1:2015, Table 1 (maximum concentration limits, particles/m³ of size ≥ D), cell by cell.
  it.each([
    [1, 0.1, 10],
    [2, 0.1, 100],
    [2, 0.2, 24],
    [2, 0.3, 10],
    [3, 0.2, 237],
    [3, 0.3, 102],
    [3, 0.5, 35],
    [4, 0.1, 10_000],
    [4, 0.5, 352],
    [4, 1, 83],
    [5, 0.1, 100_000],
    [5, 0.2, 23_700],
    [5, 0.3, 10_200],
    [5, 0.5, 3_520],
    [5, 1, 832],
    [6, 0.5, 35_200],
    [6, 1, 8_320],
    [6, 5, 293],
    [7, 0.5, 352_000],
    [7, 1, 83_200],
    [7, 5, 2_930],
    [8, 0.5, 3_520_000],
    [8, 1, 832_000],
    [8, 5, 29_300],
    [9, 0.5, 35_200_000],
    [9, 5, 293_000],
  ])('gives Class %i at %f µm the Table 1 value %i', (n, d, expected) => {
    expect(iso14644Limit(n, d)).toBe(expected);
  });

  it('leaves the cells blank that the 2015 table leaves blank', () => {
    // ISO 14644-1:2015 Table 1: no value for Class 5 at 5 µm (1999 had 29), Class 1 at 0.2 µm, Class 7–9 below 0.5 µm.
    expect(iso14644Limit(5, 5)).toBeNull();
    expect(iso14644Limit(1, 0.2)).toBeNull();
    expect(iso14644Limit(7, 0.3)).toBeNull();
    expect(iso14644Limit(9, 0.1)).toBeNull();
  });
});

describe('iso14644SamplingLocations', () => {
  it('looks up ISO 14644-1:2015 Table A.1 by area', () => {
    // Table A.1 rows (from memory, see iso-14644.ts): ≤2 → 1, ≤10 → 5, ≤24 → 6, ≤52 → 10, ≤1000 → 27.
    expect(iso14644SamplingLocations(1)).toBe(1);
    expect(iso14644SamplingLocations(2)).toBe(1);
    expect(iso14644SamplingLocations(2.1)).toBe(2);
    expect(iso14644SamplingLocations(10)).toBe(5);
    expect(iso14644SamplingLocations(20)).toBe(6);
    expect(iso14644SamplingLocations(52)).toBe(10);
    expect(iso14644SamplingLocations(53)).toBe(11);
    expect(iso14644SamplingLocations(1000)).toBe(27);
  });

  it('uses NL = 27 × A/1000 rounded up above 1000 m²', () => {
    // ISO 14644-1:2015, Annex A, eq. A.1 (from memory).
    expect(iso14644SamplingLocations(1001)).toBe(28);
    expect(iso14644SamplingLocations(2500)).toBe(68);
  });

  it('is not the 1999 edition’s √area rule', () => {
    // 1999 edition: NL = √A, e.g. 7.2 → 8 for 52 m²; 2015 Table A.1 gives 10.
    expect(iso14644SamplingLocations(52)).not.toBe(Math.ceil(Math.sqrt(52)));
  });
});

describe('iso14644MinSampleVolumeL', () => {
  it('asks for 20 particles at the limit and at least 2 litres', () => {
    // ISO 14644-1:2015 A.4.4 (from memory): Vs = 20/Cn,m × 1000 L; Class 5 at 0.5 µm: 20/3520 × 1000 = 5.68 L.
    expect(iso14644MinSampleVolumeL(5, 0.5)).toBeCloseTo(5.682, 3);
    expect(iso14644MinSampleVolumeL(8, 0.5)).toBe(2);
    expect(iso14644MinSampleVolumeL(5, 5)).toBeNull();
  });
});
