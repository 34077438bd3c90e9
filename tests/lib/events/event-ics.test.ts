/**
 * The .ics file parsed back with ical.js (Mozilla's iCalendar parser, from the registry), for a venue in
 * America/Chicago on both sides of the 2026 spring daylight-saving change. US daylight time starts on the second
 * Sunday of March (15 U.S.C. § 260a, as amended by the Energy Policy Act of 2005): 8 March 2026, so 9:00 local
 * is 15:00 UTC on Friday 6 March (CST, UTC−6) and 14:00 UTC on Monday 9 March (CDT, UTC−5).
 */
import ICAL from 'ical.js';
import { describe, expect, it } from 'vitest';
import { eventIcs } from '../../../src/lib/events/event-ics';
import { eventLocalToUtc, eventUtcToLocal } from '../../../src/lib/events/event-time';

const NEW = { revision: 0, cancelled: false };

function parsed(local: string, zone: string, change: { revision: number; cancelled: boolean } = NEW) {
  const text = eventIcs({
    id: 'e1',
    title: 'Boom layout, part 2',
    description: 'Bring string; we stake out the field.',
    venue: 'Field, Fennel Valley',
    startsAt: eventLocalToUtc(local, zone),
    endsAt: eventLocalToUtc(local.replace(/T09/, 'T11'), zone),
    url: 'https://kitwright.example/events/e1',
    ...change,
  });
  const vevent = new ICAL.Component(ICAL.parse(text)).getFirstSubcomponent('vevent')!;
  return new ICAL.Event(vevent);
}

describe('event calendar file', () => {
  it('starts at 15:00 UTC for 9:00 in Chicago before the change (CST)', () => {
    const ev = parsed('2026-03-06T09:00', 'America/Chicago');
    expect(ev.startDate.toJSDate().toISOString()).toBe('2026-03-06T15:00:00.000Z');
    expect(ev.startDate.zone.tzid).toBe('UTC');
    expect(ev.endDate.toJSDate().toISOString()).toBe('2026-03-06T17:00:00.000Z');
    expect(ev.summary).toBe('Boom layout, part 2');
    expect(ev.location).toBe('Field, Fennel Valley');
    expect(ev.uid).toBe('e1@kitwright');
  });

  it('starts at 14:00 UTC for 9:00 in Chicago after the change (CDT)', () => {
    const ev = parsed('2026-03-09T09:00', 'America/Chicago');
    expect(ev.startDate.toJSDate().toISOString()).toBe('2026-03-09T14:00:00.000Z');
  });

  it('keeps the UID and raises SEQUENCE for a moved event, and marks a cancelled one (RFC 5545, 3.8.7.4, 3.8.1.11)', () => {
    const first = parsed('2026-03-06T09:00', 'America/Chicago');
    const moved = parsed('2026-03-09T09:00', 'America/Chicago', { revision: 1, cancelled: false });
    const cancelled = parsed('2026-03-09T09:00', 'America/Chicago', { revision: 2, cancelled: true });
    expect([first.sequence, moved.sequence, cancelled.sequence]).toEqual([0, 1, 2]);
    expect(new Set([first.uid, moved.uid, cancelled.uid])).toEqual(new Set(['e1@kitwright']));
    expect(first.component.getFirstPropertyValue('status')).toBe('CONFIRMED');
    expect(cancelled.component.getFirstPropertyValue('status')).toBe('CANCELLED');
  });

  it('shows the local wall-clock time back from the UTC instant', () => {
    expect(eventUtcToLocal(new Date('2026-03-09T14:00:00Z'), 'America/Chicago')).toBe('2026-03-09T09:00');
    // Europe/Madrid in summer is UTC+2 (EU summer time, Directive 2000/84/EC): 29 June 2026 10:00 → 08:00 UTC.
    expect(eventLocalToUtc('2026-06-29T10:00', 'Europe/Madrid').toISOString()).toBe('2026-06-29T08:00:00.000Z');
  });
});
