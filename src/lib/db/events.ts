/** Queries on events, their registrations and attendance. */
import type { Knex } from 'knex';
import type { EventCreate, EventPatch } from '../events/event-schemas';
import { EVENT_DEFAULT_DURATION_HOURS } from '../events/event-ics';
import { eventLocalToUtc, eventUtcToLocal } from '../events/event-time';
import { isUuid } from './accounts';
import { db } from './knex';

export interface EventView {
  id: string;
  title: string;
  kind: 'workshop' | 'big_build' | 'visit' | 'other';
  state: 'draft' | 'published' | 'cancelled';
  schoolId: string | null;
  schoolName: string | null;
  venue: string;
  startsAt: string;
  endsAt: string | null;
  startsLocal: string;
  endsLocal: string | null;
  timeZone: string;
  capacity: number | null;
  kitId: string | null;
  /** The kit's title, when the event names a kit. */
  kitTitle: string | null;
  activitySlug: string | null;
  description: string;
  venuePreset: string | null;
  venueWidthM: number | null;
  venueLengthM: number | null;
  buildScaleDenominator: number | null;
  publishedAt: string | null;
  /** The calendar file's SEQUENCE: how often the event was moved or cancelled once published. */
  revision: number;
  placesTaken: number;
  waitlisted: number;
}

type Row = Record<string, unknown>;

const num = (v: unknown) => (v === null || v === undefined ? null : Number(v));

function eventView(r: Row): EventView {
  const zone = r.time_zone as string;
  const starts = r.starts_at as Date;
  const ends = (r.ends_at as Date | null) ?? null;
  return {
    id: r.id as string,
    title: r.title as string,
    kind: r.kind as EventView['kind'],
    state: r.state as EventView['state'],
    schoolId: (r.school_id as string | null) ?? null,
    schoolName: (r.school_name as string | null) ?? null,
    venue: r.venue as string,
    startsAt: starts.toISOString(),
    endsAt: ends ? ends.toISOString() : null,
    startsLocal: eventUtcToLocal(starts, zone),
    endsLocal: ends ? eventUtcToLocal(ends, zone) : null,
    timeZone: zone,
    capacity: num(r.capacity),
    kitId: (r.kit_id as string | null) ?? null,
    kitTitle: (r.kit_title as string | null) ?? null,
    activitySlug: (r.activity_slug as string | null) ?? null,
    description: r.description as string,
    venuePreset: (r.venue_preset as string | null) ?? null,
    venueWidthM: num(r.venue_width_m),
    venueLengthM: num(r.venue_length_m),
    buildScaleDenominator: num(r.build_scale_denominator),
    publishedAt: r.published_at ? (r.published_at as Date).toISOString() : null,
    revision: Number(r.revision ?? 0),
    placesTaken: Number(r.places_taken ?? 0),
    waitlisted: Number(r.waitlisted ?? 0),
  };
}

function eventQuery(trx: Knex) {
  return trx('events as e')
    .leftJoin('schools as s', 's.id', 'e.school_id')
    .leftJoin('kits as k', 'k.id', 'e.kit_id')
    .select(
      'e.*',
      's.name as school_name',
      'k.title as kit_title',
      trx.raw(
        "(SELECT count(*) FROM event_registrations r WHERE r.event_id = e.id AND r.state = 'confirmed') AS places_taken",
      ),
      trx.raw(
        "(SELECT count(*) FROM event_registrations r WHERE r.event_id = e.id AND r.state = 'waitlisted') AS waitlisted",
      ),
    );
}

/** Input fields stored as they are, by column. */
const EVENT_FIELD_COLUMNS = {
  title: 'title',
  kind: 'kind',
  schoolId: 'school_id',
  venue: 'venue',
  timeZone: 'time_zone',
  capacity: 'capacity',
  kitId: 'kit_id',
  activitySlug: 'activity_slug',
  description: 'description',
  venuePreset: 'venue_preset',
  venueWidthM: 'venue_width_m',
  venueLengthM: 'venue_length_m',
  buildScaleDenominator: 'build_scale_denominator',
} as const satisfies Partial<Record<keyof EventCreate, string>>;

/** Columns of a create or a change (only the fields given). */
function eventColumns(input: Partial<EventCreate>, zoneFallback: string): Row {
  const zone = input.timeZone ?? zoneFallback;
  const cols: Row = {};
  for (const [field, column] of Object.entries(EVENT_FIELD_COLUMNS)) {
    const value = input[field as keyof typeof EVENT_FIELD_COLUMNS];
    if (value !== undefined) cols[column] = value;
  }
  if (input.startsLocal !== undefined) cols.starts_at = eventLocalToUtc(input.startsLocal, zone);
  if (input.endsLocal !== undefined) cols.ends_at = input.endsLocal ? eventLocalToUtc(input.endsLocal, zone) : null;
  return cols;
}

export async function eventInsert(input: EventCreate, createdBy: string, trx: Knex = db()): Promise<string> {
  const [row] = await trx('events')
    .insert({ ...eventColumns(input, input.timeZone), created_by: createdBy })
    .returning('id');
  return row.id as string;
}

/** Applies a change; when the zone changes without new times, the local wall-clock times are kept. */
export async function eventUpdate(id: string, patch: EventPatch, trx: Knex = db()): Promise<boolean> {
  if (!isUuid(id)) return false;
  const current = await trx('events')
    .where({ id })
    .forUpdate()
    .first('time_zone', 'starts_at', 'ends_at', 'published_at');
  if (!current) return false;
  const full: Partial<EventCreate> = { ...patch };
  if (patch.timeZone && patch.timeZone !== current.time_zone) {
    full.startsLocal ??= eventUtcToLocal(current.starts_at, current.time_zone);
    if (full.endsLocal === undefined && current.ends_at)
      full.endsLocal = eventUtcToLocal(current.ends_at, current.time_zone);
  }
  const cols = eventColumns(full, current.time_zone);
  if (patch.state) {
    cols.state = patch.state;
    if (patch.state === 'published' && !current.published_at) cols.published_at = trx.fn.now();
  }
  await trx('events')
    .where({ id })
    .update({ ...cols, updated_at: trx.fn.now() });
  return true;
}

export async function eventById(id: string, trx: Knex = db()): Promise<EventView | null> {
  if (!isUuid(id)) return null;
  const row = await eventQuery(trx).where('e.id', id).first();
  return row ? eventView(row) : null;
}

/** Published events that have not ended (their end, or start plus the default length, is still ahead). */
const upcomingPublished = (query: Knex.QueryBuilder) =>
  query
    .where('e.state', 'published')
    .whereRaw(`coalesce(e.ends_at, e.starts_at + make_interval(hours => ?)) > now()`, [EVENT_DEFAULT_DURATION_HOURS]);

/** Published events that have not ended, soonest first (the public list). */
export async function eventListPublished(trx: Knex = db()): Promise<EventView[]> {
  const rows = await upcomingPublished(eventQuery(trx)).orderBy('e.starts_at');
  return rows.map(eventView);
}

export interface EventPage {
  events: EventView[];
  /** Events on every page together. */
  total: number;
}

/** One page of the public list (published, not ended, soonest first); `page` counts from 1. */
export async function eventPagePublished(page: number, pageSize: number, trx: Knex = db()): Promise<EventPage> {
  const [rows, count] = await Promise.all([
    upcomingPublished(eventQuery(trx))
      .orderBy([{ column: 'e.starts_at' }, { column: 'e.id' }])
      .limit(pageSize)
      .offset((page - 1) * pageSize),
    upcomingPublished(trx('events as e')).count({ count: '*' }).first(),
  ]);
  return { events: rows.map(eventView), total: Number(count?.count ?? 0) };
}

/** Every event, newest start first (coordinators). */
export async function eventListAll(trx: Knex = db()): Promise<EventView[]> {
  const rows = await eventQuery(trx).orderBy('e.starts_at', 'desc');
  return rows.map(eventView);
}

/** One page of every event, newest start first (coordinators); `page` counts from 1. */
export async function eventPageAll(page: number, pageSize: number, trx: Knex = db()): Promise<EventPage> {
  const [rows, count] = await Promise.all([
    eventQuery(trx)
      .orderBy([{ column: 'e.starts_at', order: 'desc' }, { column: 'e.id' }])
      .limit(pageSize)
      .offset((page - 1) * pageSize),
    trx('events').count({ count: '*' }).first(),
  ]);
  return { events: rows.map(eventView), total: Number(count?.count ?? 0) };
}

export interface RegistrationView {
  id: string;
  name: string;
  email: string;
  schoolId: string | null;
  schoolName: string | null;
  state: 'pending' | 'confirmed' | 'waitlisted' | 'cancelled';
  signedIn: boolean;
  createdAt: string;
  confirmedAt: string | null;
  cancelledAt: string | null;
}

/** An event's registrations: places first, then the waiting list in order, then the rest. */
export async function registrationList(eventId: string, trx: Knex = db()): Promise<RegistrationView[]> {
  const rows = await trx('event_registrations as r')
    .leftJoin('schools as s', 's.id', 'r.school_id')
    .where('r.event_id', eventId)
    .select('r.*', 's.name as school_name')
    .orderByRaw(
      "CASE r.state WHEN 'confirmed' THEN 0 WHEN 'waitlisted' THEN 1 WHEN 'pending' THEN 2 ELSE 3 END, r.queued_at NULLS LAST, r.created_at",
    );
  return rows.map((r) => ({
    id: r.id,
    name: r.name,
    email: r.email,
    schoolId: r.school_id,
    schoolName: r.school_name ?? null,
    state: r.state,
    signedIn: r.user_id !== null,
    createdAt: r.created_at.toISOString(),
    confirmedAt: r.confirmed_at ? r.confirmed_at.toISOString() : null,
    cancelledAt: r.cancelled_at ? r.cancelled_at.toISOString() : null,
  }));
}

export interface AttendanceRow {
  schoolId: string;
  schoolName: string;
  attendeeCount: number;
}

export async function attendanceList(eventId: string, trx: Knex = db()): Promise<AttendanceRow[]> {
  const rows = await trx('event_attendance as a')
    .join('schools as s', 's.id', 'a.school_id')
    .where('a.event_id', eventId)
    .select('a.school_id', 's.name', 'a.attendee_count')
    .orderBy('s.name');
  return rows.map((r) => ({ schoolId: r.school_id, schoolName: r.name, attendeeCount: r.attendee_count }));
}

/** Replaces an event's attendance with these counts per school (a school left out is removed). */
export async function attendanceReplace(
  eventId: string,
  rows: { schoolId: string; attendeeCount: number }[],
  recordedBy: string,
  trx: Knex,
): Promise<void> {
  await trx('event_attendance').where({ event_id: eventId }).delete();
  if (rows.length === 0) return;
  await trx('event_attendance').insert(
    rows.map((r) => ({
      event_id: eventId,
      school_id: r.schoolId,
      attendee_count: r.attendeeCount,
      recorded_by: recordedBy,
    })),
  );
}

/** True when this account holds a confirmed place on the event. */
export async function registrationConfirmed(eventId: string, userId: string, trx: Knex = db()): Promise<boolean> {
  if (!isUuid(eventId)) return false;
  const row = await trx('event_registrations')
    .where({ event_id: eventId, user_id: userId, state: 'confirmed' })
    .first('id');
  return row !== undefined;
}
