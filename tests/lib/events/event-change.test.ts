/** Which changes to an event its registrants are told about (the rule is ours: src/lib/events/event-change.ts). */
import { describe, expect, it } from 'vitest';
import { eventChangeNotice, type EventScheduleFacts } from '../../../src/lib/events/event-change';

const NOW = new Date('2027-04-01T12:00:00Z');
const PUBLISHED: EventScheduleFacts = {
  state: 'published',
  startsAt: new Date('2027-04-14T19:30:00Z'),
  endsAt: new Date('2027-04-14T22:00:00Z'),
  venue: 'Back field',
};

describe('eventChangeNotice', () => {
  it('tells registrants of a published event that it is cancelled', () => {
    expect(eventChangeNotice(PUBLISHED, { ...PUBLISHED, state: 'cancelled' }, NOW)).toBe('cancelled');
  });

  it('calls a new start, a new end, a dropped end or another place a move', () => {
    const later = new Date('2027-04-15T19:30:00Z');
    expect(eventChangeNotice(PUBLISHED, { ...PUBLISHED, startsAt: later }, NOW)).toBe('moved');
    expect(eventChangeNotice(PUBLISHED, { ...PUBLISHED, endsAt: later }, NOW)).toBe('moved');
    expect(eventChangeNotice(PUBLISHED, { ...PUBLISHED, endsAt: null }, NOW)).toBe('moved');
    expect(eventChangeNotice(PUBLISHED, { ...PUBLISHED, venue: 'Gym' }, NOW)).toBe('moved');
  });

  it('says cancelled when a change both moves and cancels', () => {
    expect(eventChangeNotice(PUBLISHED, { ...PUBLISHED, venue: 'Gym', state: 'cancelled' }, NOW)).toBe('cancelled');
  });

  it('tells nothing for the same instants and place, or spaces around the venue only', () => {
    const same = { ...PUBLISHED, startsAt: new Date(PUBLISHED.startsAt), venue: ' Back field ' };
    expect(eventChangeNotice(PUBLISHED, same, NOW)).toBeNull();
  });

  it('tells nothing about a draft, an event already cancelled or one that has started', () => {
    const draft = { ...PUBLISHED, state: 'draft' as const };
    expect(eventChangeNotice(draft, { ...draft, state: 'cancelled' }, NOW)).toBeNull();
    expect(eventChangeNotice(draft, { ...PUBLISHED, venue: 'Gym' }, NOW)).toBeNull();
    const cancelled = { ...PUBLISHED, state: 'cancelled' as const };
    expect(eventChangeNotice(cancelled, { ...cancelled, venue: 'Gym' }, NOW)).toBeNull();
    const started = new Date('2027-04-14T20:00:00Z');
    expect(eventChangeNotice(PUBLISHED, { ...PUBLISHED, state: 'cancelled' }, started)).toBeNull();
  });

  it('tells nothing when a published event goes back to draft', () => {
    expect(eventChangeNotice(PUBLISHED, { ...PUBLISHED, state: 'draft', venue: 'Gym' }, NOW)).toBeNull();
  });
});
