/** Shared zod schemas and limits of events, registrations and attendance (forms and endpoints). */
import { z } from 'zod';
import { LOCAL_DATE_TIME_PATTERN, timeZoneValid } from './event-time';

export const EVENT_KINDS = ['workshop', 'big_build', 'visit', 'other'] as const;
export const EVENT_STATES = ['draft', 'published', 'cancelled'] as const;
export const EVENT_KIND_LABELS: Record<(typeof EVENT_KINDS)[number], string> = {
  workshop: 'Workshop',
  big_build: 'Big build',
  visit: 'Visit',
  other: 'Other',
};

export const EVENT_TITLE_MAX = 160;
export const EVENT_TEXT_MAX = 4000;
export const EVENT_VENUE_MAX = 200;
/** Places on one event; a limit to keep typing mistakes out (common practice, no source). */
export const EVENT_CAPACITY_MAX = 5000;
export const REGISTRANT_NAME_MAX = 120;
/** People one school can bring to one event, as a typing-mistake guard (common practice, no source). */
export const ATTENDANCE_COUNT_MAX = 5000;

const localDateTime = (what: string) =>
  z
    .string({ required_error: `give the ${what} as a date and time at the venue` })
    .regex(LOCAL_DATE_TIME_PATTERN, `the ${what} must look like 2026-03-09T09:30`);

const EventFieldsSchema = z.object({
  title: z.string().trim().min(1, 'give the event a title').max(EVENT_TITLE_MAX),
  kind: z.enum(EVENT_KINDS),
  schoolId: z.string().uuid('pick a school from the list').nullable().default(null),
  venue: z.string().trim().max(EVENT_VENUE_MAX).default(''),
  startsLocal: localDateTime('start'),
  endsLocal: localDateTime('end').nullable().default(null),
  timeZone: z.string().refine(timeZoneValid, 'pick the venue’s time zone from the list (for example America/Chicago)'),
  capacity: z.number().int('places must be a whole number').min(1).max(EVENT_CAPACITY_MAX).nullable().default(null),
  kitId: z.string().uuid().nullable().default(null),
  activitySlug: z
    .string()
    .regex(/^[a-z0-9-]{1,80}$/, 'pick an activity from the list')
    .nullable()
    .default(null),
  description: z.string().max(EVENT_TEXT_MAX).default(''),
  venuePreset: z.string().max(40).nullable().default(null),
  venueWidthM: z.number().positive().max(10_000).nullable().default(null),
  venueLengthM: z.number().positive().max(10_000).nullable().default(null),
  buildScaleDenominator: z.number().int().min(1).max(1000).nullable().default(null),
});

const endsAfterStart = (v: { startsLocal?: string; endsLocal?: string | null }) =>
  !v.startsLocal || !v.endsLocal || v.endsLocal > v.startsLocal;
const ENDS_MESSAGE = { message: 'the end must be after the start', path: ['endsLocal'] };

export const EventCreateSchema = EventFieldsSchema.strict().refine(endsAfterStart, ENDS_MESSAGE);
export type EventCreate = z.infer<typeof EventCreateSchema>;

/** A change: any field, and the state (publish, back to draft, cancel). */
export const EventPatchSchema = EventFieldsSchema.partial()
  .extend({ state: z.enum(EVENT_STATES).optional() })
  .strict()
  .refine(endsAfterStart, ENDS_MESSAGE);
export type EventPatch = z.infer<typeof EventPatchSchema>;

/** A registration: signed-in teachers send nothing (their account says who they are); others their name. */
export const RegistrationCreateSchema = z
  .object({
    name: z.string().trim().min(1, 'give your name').max(REGISTRANT_NAME_MAX),
    email: z.string().trim().toLowerCase().email('give your school e-mail address').max(254),
    schoolId: z.string().uuid('pick your school from the list').nullable().default(null),
  })
  .strict();
export type RegistrationCreate = z.infer<typeof RegistrationCreateSchema>;

/** A token from a mailed link (confirm or cancel). */
export const RegistrationTokenSchema = z.object({ token: z.string().min(20).max(200) }).strict();

export const AttendanceSchema = z
  .object({
    rows: z
      .array(
        z.object({
          schoolId: z.string().uuid('pick a school'),
          attendeeCount: z.number().int('a whole number of people').min(0).max(ATTENDANCE_COUNT_MAX),
        }),
      )
      .max(500)
      .refine((rows) => new Set(rows.map((r) => r.schoolId)).size === rows.length, 'each school once'),
  })
  .strict();
export type Attendance = z.infer<typeof AttendanceSchema>;
