/**
 * The .ics calendar file of an event (RFC 5545, written by the `ics` package): start and end as UTC instants
 * (DTSTART:20261225T153000Z), so every calendar shows the right local time wherever the reader is.
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
    status: 'CONFIRMED',
  });
  if (error || !value) throw error ?? new Error('the calendar file could not be written');
  return value;
}
