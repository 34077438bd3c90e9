/**
 * What the registrants of an event must be told after a coordinator changes it: that it is cancelled, that it
 * moved (another start, end or place), or nothing (a new description, capacity, kit; a draft or an event that
 * has started). Pure: the change is applied and mailed in src/lib/events/event-change.server.ts.
 */

/** The facts of an event a registrant planned around. */
export interface EventScheduleFacts {
  state: 'draft' | 'published' | 'cancelled';
  startsAt: Date;
  endsAt: Date | null;
  venue: string;
}

export type EventChangeNotice = 'cancelled' | 'moved' | null;

/**
 * The notice a change from `before` to `after` calls for at `now`: only an event that was published and had not
 * started has registrants to tell. Cancelling wins over a move made in the same change.
 */
export function eventChangeNotice(before: EventScheduleFacts, after: EventScheduleFacts, now: Date): EventChangeNotice {
  if (before.state !== 'published' || before.startsAt.getTime() <= now.getTime()) return null;
  if (after.state === 'cancelled') return 'cancelled';
  if (after.state !== 'published') return null;
  const moved =
    before.startsAt.getTime() !== after.startsAt.getTime() ||
    (before.endsAt?.getTime() ?? null) !== (after.endsAt?.getTime() ?? null) ||
    before.venue.trim() !== after.venue.trim();
  return moved ? 'moved' : null;
}
