/**
 * Event times: a coordinator types the local date and time at the venue and picks the venue's IANA time zone;
 * the database keeps the UTC instant. luxon does the zone arithmetic (its tz data is the runtime's Intl).
 */
import { DateTime, IANAZone } from 'luxon';

/** Local date-time as typed in a datetime-local field: 2026-03-09T09:00. */
export const LOCAL_DATE_TIME_PATTERN = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/;

/** True when the name is an IANA time zone the runtime knows (America/Chicago, Europe/Madrid, UTC). */
export function timeZoneValid(zone: string): boolean {
  return IANAZone.isValidZone(zone);
}

/**
 * The UTC instant of a local wall-clock time in a zone. In a spring-forward gap (a time that does not exist
 * that day) luxon moves it forward by the gap; in the autumn overlap it takes the earlier of the two instants.
 */
export function eventLocalToUtc(local: string, zone: string): Date {
  const dt = DateTime.fromISO(local, { zone });
  if (!dt.isValid) throw new RangeError(`not a local date and time: ${local} (${zone})`);
  return dt.toJSDate();
}

/** The local wall-clock time of an instant in a zone, as a datetime-local field wants it. */
export function eventUtcToLocal(at: Date, zone: string): string {
  return DateTime.fromJSDate(at, { zone }).toFormat("yyyy-MM-dd'T'HH:mm");
}

/** "Friday 25 December 2026, 9:30 am CST" — the time at the venue, with its zone abbreviation. */
export function eventWhenLabel(at: Date, zone: string): string {
  return DateTime.fromJSDate(at, { zone }).setLocale('en-US').toFormat('cccc d LLLL yyyy, h:mm a ZZZZ');
}

/**
 * The start and end at the venue in one line: "Monday 9 March 2026, 9:00 am – 11:00 am CDT" on one day,
 * both dates in full when the event runs past midnight, the start alone without an end.
 */
export function eventSpanLabel(start: Date, end: Date | null, zone: string): string {
  if (!end) return eventWhenLabel(start, zone);
  const from = DateTime.fromJSDate(start, { zone }).setLocale('en-US');
  const to = DateTime.fromJSDate(end, { zone }).setLocale('en-US');
  if (from.hasSame(to, 'day')) {
    return `${from.toFormat('cccc d LLLL yyyy, h:mm a')} – ${to.toFormat('h:mm a ZZZZ')}`;
  }
  return `${eventWhenLabel(start, zone)} – ${eventWhenLabel(end, zone)}`;
}
