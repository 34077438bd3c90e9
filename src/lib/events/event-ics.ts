/**
 * The .ics calendar file of an event (RFC 5545, written by the `ics` package): start and end as UTC instants
 * (DTSTART:20261225T153000Z), so every calendar shows the right local time wherever the reader is. The UID stays
 * the event's, so a later file (a higher SEQUENCE) replaces the earlier one in a calendar.
 */
import { createEvent } from 'ics';

export interface EventIcsInput {
  id: string;
  title: string;
  description: string;
  venue: string;
  startsAt: Date;
  endsAt: Date | null;
  url: string;
  /** The file's SEQUENCE (RFC 5545, 3.8.7.4): raised on each move or cancellation; 0 for the first. */
  revision: number;
  /** A cancelled event: STATUS:CANCELLED (RFC 5545, 3.8.1.11), so a calendar that has it marks it cancelled. */
  cancelled: boolean;
}

/** Length given to an event without an end time (common practice, no source). */
export const EVENT_DEFAULT_DURATION_HOURS = 2;

export function eventIcs(event: EventIcsInput): string {
  const { error, value } = createEvent({
    uid: `${event.id}@kitwright`,
    productId: 'kitwright/events',
    title: event.title,
    description: event.description || undefined,
    location: event.venue || undefined,
    url: event.url,
    start: event.startsAt.getTime(),
    startInputType: 'utc',
    startOutputType: 'utc',
    ...(event.endsAt
      ? { end: event.endsAt.getTime(), endInputType: 'utc' as const, endOutputType: 'utc' as const }
      : { duration: { hours: EVENT_DEFAULT_DURATION_HOURS } }),
    sequence: event.revision,
    status: event.cancelled ? 'CANCELLED' : 'CONFIRMED',
  });
  if (error || !value) throw error ?? new Error('the calendar file could not be written');
  return value;
}
