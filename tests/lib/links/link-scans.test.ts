/** The scan series checked against luxon's calendar arithmetic (a reference date library from the registry). */
import { DateTime } from 'luxon';
import { describe, expect, it } from 'vitest';
import { linkScanDays, scanDayFromNumber, scanDayNumber } from '../../../src/lib/links/link-scans';

describe('scanDayNumber', () => {
  it('counts days from 1970-01-01 as luxon does, across a leap day', () => {
    for (const day of ['1970-01-01', '2024-02-28', '2024-02-29', '2024-03-01', '2026-12-31']) {
      const reference = DateTime.fromISO(day, { zone: 'utc' }).diff(
        DateTime.fromISO('1970-01-01', { zone: 'utc' }),
        'days',
      ).days;
      expect(scanDayNumber(day), day).toBe(reference);
      expect(scanDayFromNumber(scanDayNumber(day))).toBe(day);
    }
  });
});

describe('linkScanDays', () => {
  it('fills the days without scans with zeros, oldest first, over a month boundary', () => {
    const series = linkScanDays(
      [
        { day: '2026-02-27', count: 4 },
        { day: '2026-03-02', count: 9 },
      ],
      '2026-03-02',
      5,
    );
    const expected = Array.from({ length: 5 }, (_, i) =>
      DateTime.fromISO('2026-02-26', { zone: 'utc' }).plus({ days: i }).toISODate(),
    );
    expect(series.map((s) => s.day)).toEqual(expected);
    expect(series.map((s) => s.count)).toEqual([0, 4, 0, 0, 9]);
  });

  it('leaves out rows outside the window and gives nothing for no days', () => {
    const rows = [
      { day: '2026-01-01', count: 7 },
      { day: '2026-03-01', count: 2 },
    ];
    expect(linkScanDays(rows, '2026-03-01', 3).reduce((n, s) => n + s.count, 0)).toBe(2);
    expect(linkScanDays(rows, '2026-03-01', 0)).toEqual([]);
  });
});
