import { describe, expect, it } from 'vitest';
import {
  bucketLabel,
  bucketStarts,
  periodPrevious,
  quarterLabel,
  quarterOf,
  quarterPeriod,
  quartersEnding,
  schoolYearOf,
} from '../../../src/lib/reach/period';

// Calendar quarters are the usual three-month quarters starting January, April, July and October; school years
// run July–June. // common practice, no source
describe('quarterPeriod', () => {
  it('gives each calendar quarter its three months, half-open', () => {
    expect(quarterPeriod('2026-Q1')).toEqual({ from: '2026-01-01', to: '2026-04-01' });
    expect(quarterPeriod('2026-Q4')).toEqual({ from: '2026-10-01', to: '2027-01-01' });
    expect(quarterPeriod('2026-Q5')).toBeNull();
  });

  it('finds the quarter of a date at both ends of the quarter', () => {
    expect(quarterOf('2026-07-01')).toBe('2026-Q3');
    expect(quarterOf('2026-09-30')).toBe('2026-Q3');
    expect(quarterOf('2026-10-01')).toBe('2026-Q4');
  });
});

describe('quartersEnding', () => {
  it('spans eight whole quarters back from the one given, across year boundaries', () => {
    expect(quartersEnding('2026-Q3', 8)).toEqual({ from: '2024-10-01', to: '2026-10-01' });
    expect(quartersEnding('2026-Q1', 1)).toEqual(quarterPeriod('2026-Q1'));
    expect(quartersEnding('2026-Q9', 8)).toBeNull();
  });
});

describe('periodPrevious', () => {
  it('gives a quarter the quarter before, across a year boundary, whatever the lengths in days', () => {
    expect(periodPrevious({ from: '2026-01-01', to: '2026-04-01' })).toEqual({ from: '2025-10-01', to: '2026-01-01' });
  });

  it('gives a period of days the same number of days before (2024 is a leap year: 29 February exists)', () => {
    expect(periodPrevious({ from: '2024-03-01', to: '2024-03-11' })).toEqual({ from: '2024-02-20', to: '2024-03-01' });
    expect(periodPrevious({ from: '2024-03-05', to: '2024-03-10' })).toEqual({ from: '2024-02-29', to: '2024-03-05' });
  });
});

describe('school years', () => {
  it('puts July in the new school year and June in the old one', () => {
    expect(schoolYearOf('2026-07-01')).toBe(2026);
    expect(schoolYearOf('2027-06-30')).toBe(2026);
    expect(quarterLabel('2026-Q3')).toBe('2026 Q3 · SY 2026–27 Q1');
    expect(quarterLabel('2027-Q2')).toBe('2027 Q2 · SY 2026–27 Q4');
  });
});

describe('bucketStarts', () => {
  it('lists every bucket overlapping the period, including a first bucket that starts before it', () => {
    const period = { from: '2026-05-15', to: '2026-11-01' };
    expect(bucketStarts('month', period)).toHaveLength(6); // May to October
    expect(bucketStarts('quarter', period)).toEqual(['2026-04-01', '2026-07-01', '2026-10-01']);
    expect(bucketStarts('school_year', period)).toEqual(['2025-07-01', '2026-07-01']);
    expect(bucketStarts('year', period)).toEqual(['2026-01-01']);
    expect(bucketLabel('school_year', '2025-07-01')).toBe('SY 2025–26');
  });
});
