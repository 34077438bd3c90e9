/** What an event page says about its places: how many are left, or that new registrations join the waiting list. */

export interface EventPlaces {
  /** Places left; null when the event has no limit. */
  left: number | null;
  /** True when every place is taken, so a new registration goes on the waiting list. */
  full: boolean;
  /** One line for the page ("4 of 20 places left", "Full: 3 on the waiting list"). */
  label: string;
}

/** The places of an event from its capacity (null = no limit), confirmed places and waiting list. */
export function eventPlaces(capacity: number | null, taken: number, waitlisted: number): EventPlaces {
  if (capacity === null) return { left: null, full: false, label: 'No limit on places' };
  const left = Math.max(0, capacity - taken);
  if (left > 0) {
    return { left, full: false, label: `${left} of ${capacity} ${capacity === 1 ? 'place' : 'places'} left` };
  }
  const queue = waitlisted === 0 ? 'nobody on the waiting list yet' : `${waitlisted} on the waiting list`;
  return { left: 0, full: true, label: `Full: ${queue}` };
}

/** Where an event is, in one line: the venue and the host school, the school left out when the venue names it. */
export function eventWhereLabel(venue: string, schoolName: string | null): string {
  const parts = [venue.trim()];
  if (schoolName && !venue.toLowerCase().includes(schoolName.toLowerCase())) parts.push(schoolName);
  return parts.filter(Boolean).join(', ');
}
