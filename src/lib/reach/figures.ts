/**
 * The reach figures an office reports, each defined once: its name, the sentence a funder reads beside the
 * number, and the SQL that lists the facts it counts. Pure (SQL as text; src/lib/db/reach.ts runs it).
 *
 * Every figure's SQL returns one row per fact with the same columns:
 *   at        timestamptz  when it happened (the period filter and the buckets use it)
 *   school_id uuid         the school it is credited to (null when the class or account has no school)
 *   unit      text         what is counted: facts with the same unit count once per bucket and group
 *   amount    integer      what the unit adds (1, or a class's student count, or an attendance count)
 *   item      text         what a person reads in the drill-down (a title or a name; never a student's)
 * The bindings :from and :to are the period's bounds (timestamptz, half-open).
 */

/** The figure ids, in the order the dashboard and the report show them. */
export const REACH_FIGURE_IDS = [
  'schools',
  'active_teachers',
  'classes',
  'students',
  'kits',
  'activities',
  'entries',
  'events',
  'attendance',
] as const;
export type ReachFigureId = (typeof REACH_FIGURE_IDS)[number];

export interface ReachFigure {
  id: ReachFigureId;
  label: string;
  /** The definition shown beside the number, on the dashboard and in the quarterly report. */
  definition: string;
  /** SQL listing the facts (see the module comment). */
  factsSql: string;
  /** Heading of the drill-down's amount column when a unit adds more than 1. */
  amountLabel?: string;
}

const IN_PERIOD = (column: string) => `${column} >= :from AND ${column} < :to`;

/** An event counts as held when it was published (not a draft, not cancelled) and started within the period, by now. */
export const REACH_EVENT_HELD_SQL = `ev.state = 'published' AND ${IN_PERIOD('ev.starts_at')} AND ev.starts_at <= now()`;

const KIT_CLASS_FACTS = (amount: string) => `
  SELECT k.created_at AS at, c.school_id, c.id::text AS unit, ${amount} AS amount, c.name AS item
  FROM kits k JOIN classes c ON c.id = k.class_id
  WHERE ${IN_PERIOD('k.created_at')}`;
const ENTRY_CLASS_FACTS = (amount: string) => `
  SELECT e.published_at AS at, c.school_id, c.id::text AS unit, ${amount} AS amount, c.name AS item
  FROM entries e JOIN classes c ON c.id = e.class_id
  WHERE e.state = 'published' AND ${IN_PERIOD('e.published_at')}`;
const ATTENDANCE_FACTS = `
  SELECT ev.starts_at AS at, a.school_id, ev.id::text || '/' || a.school_id::text AS unit,
         a.attendee_count AS amount, ev.title AS item
  FROM events ev JOIN event_attendance a ON a.event_id = ev.id
  WHERE ${REACH_EVENT_HELD_SQL}`;

const CLASSES_DEFINITION = 'built a kit or had a journal entry published in the period';

export const REACH_FIGURES: readonly ReachFigure[] = [
  {
    id: 'schools',
    label: 'Schools reached',
    definition: `Schools with at least one class that ${CLASSES_DEFINITION}, or with people at an event held in the period.`,
    factsSql: `
      SELECT at, school_id, school_id::text AS unit, 1 AS amount, s.name AS item
      FROM (${KIT_CLASS_FACTS('1')} UNION ALL ${ENTRY_CLASS_FACTS('1')} UNION ALL ${ATTENDANCE_FACTS}) f
      JOIN schools s ON s.id = f.school_id`,
  },
  {
    id: 'active_teachers',
    label: 'Active teachers',
    definition: 'Teacher accounts that signed in or built a kit in the period, each counted once.',
    factsSql: `
      SELECT (d.day::timestamp AT TIME ZONE 'UTC') AS at, u.school_id, u.id::text AS unit, 1 AS amount,
             u.display_name AS item
      FROM account_sign_in_days d JOIN users u ON u.id = d.user_id
      WHERE u.role = 'teacher' AND ${IN_PERIOD("(d.day::timestamp AT TIME ZONE 'UTC')")}
      UNION ALL
      SELECT k.created_at, u.school_id, u.id::text, 1, u.display_name
      FROM kits k JOIN users u ON u.id = k.teacher_id
      WHERE u.role = 'teacher' AND ${IN_PERIOD('k.created_at')}`,
  },
  {
    id: 'classes',
    label: 'Classes',
    definition: `Classes that ${CLASSES_DEFINITION}, each counted once.`,
    factsSql: `${KIT_CLASS_FACTS('1')} UNION ALL ${ENTRY_CLASS_FACTS('1')}`,
  },
  {
    id: 'students',
    label: 'Students reached',
    definition:
      'The sum of the student counts of those classes, each class counted once in a period (a class active in two months counts in each month, once in the quarter).',
    factsSql: `${KIT_CLASS_FACTS('c.student_count')} UNION ALL ${ENTRY_CLASS_FACTS('c.student_count')}`,
    amountLabel: 'Students',
  },
  {
    id: 'kits',
    label: 'Kits built',
    definition: 'Kits saved by teachers for a class in the period.',
    factsSql: `
      SELECT k.created_at AS at, c.school_id, k.id::text AS unit, 1 AS amount, k.title || ' · ' || c.name AS item
      FROM kits k JOIN classes c ON c.id = k.class_id
      WHERE ${IN_PERIOD('k.created_at')}`,
  },
  {
    id: 'activities',
    label: 'Activities run',
    definition:
      'Distinct activities per class: a class that built a kit for an activity or published an entry about it ran it; the same activity in the same class counts once.',
    factsSql: `
      SELECT k.created_at AS at, c.school_id, c.id::text || '/' || k.activity_slug AS unit, 1 AS amount,
             k.activity_slug || ' · ' || c.name AS item
      FROM kits k JOIN classes c ON c.id = k.class_id
      WHERE k.activity_slug IS NOT NULL AND ${IN_PERIOD('k.created_at')}
      UNION ALL
      SELECT e.published_at, c.school_id, c.id::text || '/' || e.activity_slug, 1, e.activity_slug || ' · ' || c.name
      FROM entries e JOIN classes c ON c.id = e.class_id
      WHERE e.state = 'published' AND e.activity_slug IS NOT NULL AND ${IN_PERIOD('e.published_at')}`,
  },
  {
    id: 'entries',
    label: 'Entries published',
    definition: 'Class journal entries a coordinator published in the period (and still published).',
    factsSql: `
      SELECT e.published_at AS at, c.school_id, e.id::text AS unit, 1 AS amount, e.title AS item
      FROM entries e JOIN classes c ON c.id = e.class_id
      WHERE e.state = 'published' AND ${IN_PERIOD('e.published_at')}`,
  },
  {
    id: 'events',
    label: 'Events held',
    definition:
      'Published workshops, builds and visits (not cancelled) that took place in the period, credited to each school with people there (or to the host school when no attendance is recorded).',
    factsSql: `
      SELECT ev.starts_at AS at, COALESCE(a.school_id, ev.school_id) AS school_id, ev.id::text AS unit,
             1 AS amount, ev.title AS item
      FROM events ev LEFT JOIN event_attendance a ON a.event_id = ev.id
      WHERE ${REACH_EVENT_HELD_SQL}`,
  },
  {
    id: 'attendance',
    label: 'Event attendance',
    definition: 'People at those events, as the counts recorded per school after each event.',
    factsSql: ATTENDANCE_FACTS,
    amountLabel: 'People',
  },
];

/** The figure with this id. */
export function reachFigure(id: ReachFigureId): ReachFigure {
  return REACH_FIGURES.find((f) => f.id === id)!;
}
