/**
 * Labels of event times at the venue. US daylight time starts on the second Sunday of March (15 U.S.C. § 260a,
 * as amended by the Energy Policy Act of 2005): 8 March 2026, so Chicago is CST (UTC−6) on 6 March and CDT
 * (UTC−5) on 9 March; New Zealand keeps NZDT (UTC+13) until the first Sunday of April (NZ Time Act 1974 and
 * its 2007 order), so 20:00 UTC on 9 March is 9:00 am on 10 March in Auckland.
 */
import { describe, expect, it } from 'vitest';
import { eventSpanLabel, eventWhenLabel } from '../../../src/lib/events/event-time';

describe('eventWhenLabel', () => {
  it('shows the venue’s wall-clock time on each side of the daylight-saving change', () => {
    expect(eventWhenLabel(new Date('2026-03-06T15:00:00Z'), 'America/Chicago')).toBe(
      'Friday 6 March 2026, 9:00 AM CST',
    );
    expect(eventWhenLabel(new Date('2026-03-09T14:00:00Z'), 'America/Chicago')).toBe(
      'Monday 9 March 2026, 9:00 AM CDT',
    );
  });
});

describe('eventSpanLabel', () => {
  it('names the day once when the event starts and ends on the same day at the venue', () => {
    expect(eventSpanLabel(new Date('2026-03-09T14:00:00Z'), new Date('2026-03-09T16:30:00Z'), 'America/Chicago')).toBe(
      'Monday 9 March 2026, 9:00 AM – 11:30 AM CDT',
    );
  });

  it('uses the venue’s date, not the UTC date, to decide what one day is', () => {
    // 20:00 UTC on 9 March to 01:00 UTC on 10 March is one morning in Auckland.
    expect(
      eventSpanLabel(new Date('2026-03-09T20:00:00Z'), new Date('2026-03-10T01:00:00Z'), 'Pacific/Auckland'),
      // The zone's short name comes from the runtime's ICU data: "GMT+13" in Node's English, "NZDT" in others.
    ).toMatch(/^Tuesday 10 March 2026, 9:00 AM – 2:00 PM (GMT\+13|NZDT)$/);
  });

  it('gives both dates in full for an event that runs past midnight, and the start alone without an end', () => {
    const start = new Date('2026-03-06T23:00:00Z');
    expect(eventSpanLabel(start, new Date('2026-03-07T08:00:00Z'), 'America/Chicago')).toBe(
      'Friday 6 March 2026, 5:00 PM CST – Saturday 7 March 2026, 2:00 AM CST',
    );
    expect(eventSpanLabel(start, null, 'America/Chicago')).toBe('Friday 6 March 2026, 5:00 PM CST');
  });
});
