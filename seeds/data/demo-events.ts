/**
 * The demo's events and live links (invented): a life-size build of the Skein probe on the field of the
 * rural Fennel Valley STEM Academy with registrations, and two live links with a month of scans.
 */
import type { Knex } from 'knex';
import { createHash, randomBytes } from 'node:crypto';
import { DateTime } from 'luxon';

const tokenHashNew = () => createHash('sha256').update(randomBytes(32).toString('base64url')).digest('hex');

export interface DemoEventRefs {
  coordinatorId: string;
  schoolId: (name: string) => string | null;
  userByEmail: (email: string) => { id: string; school_id: string | null };
  kitId: string | null;
}

export async function seedDemoEvents(knex: Knex, refs: DemoEventRefs): Promise<void> {
  const zone = 'America/Chicago';
  const starts = DateTime.now()
    .setZone(zone)
    .plus({ days: 21 })
    .set({ hour: 9, minute: 30, second: 0, millisecond: 0 });
  const [event] = await knex('events')
    .insert({
      title: 'Skein probe life-size build',
      kind: 'big_build',
      school_id: refs.schoolId('Fennel Valley STEM Academy'),
      venue: 'School football field, Fennel Valley STEM Academy',
      starts_at: starts.toJSDate(),
      ends_at: starts.plus({ hours: 3 }).toJSDate(),
      time_zone: zone,
      attendee_count: 0,
      capacity: 20,
      kit_id: refs.kitId,
      activity_slug: 'scale-it',
      description:
        'We lay out the Skein probe at full size on the football field: the body from foam-board panels and each ' +
        'boom staked out with rope. Teachers from nearby schools are welcome to bring a class.',
      notes: 'Booms laid out with string on the field; body from foam-board panels.',
      state: 'published',
      published_at: new Date(),
      venue_preset: 'football-field',
      build_scale_denominator: 1,
      created_by: refs.coordinatorId,
    })
    .returning('id');

  const teacher = (email: string, name: string) => {
    const user = refs.userByEmail(email);
    return { user_id: user.id, email, name, school_id: user.school_id };
  };
  const registrants = [
    teacher('teacher@juniper-flats.example', 'Mina Thorsby'),
    teacher('teacher@larkspur.example', 'Owen Pellquist'),
    {
      user_id: null,
      email: 'r.vantreese@fennel-valley.example',
      name: 'Ros Vantreese',
      school_id: refs.schoolId('Fennel Valley STEM Academy'),
    },
    {
      user_id: null,
      email: 'j.okonkwo-hale@quarry-hill.example',
      name: 'Jem Okonkwo-Hale',
      school_id: refs.schoolId('Quarry Hill Middle School'),
    },
  ];
  await knex('event_registrations').insert(
    registrants.map((r, i) => ({
      ...r,
      event_id: event.id,
      state: 'confirmed',
      queued_at: new Date(Date.now() - (10 - i) * 86_400_000),
      confirmed_at: new Date(Date.now() - (10 - i) * 86_400_000),
      manage_token_hash: tokenHashNew(),
    })),
  );

  // A past workshop with attendance recorded per school (counts only), which the reach figures read.
  const past = DateTime.now().setZone(zone).minus({ days: 40 }).set({ hour: 13, minute: 0, second: 0, millisecond: 0 });
  const [workshop] = await knex('events')
    .insert({
      title: 'Thermal puck workshop',
      kind: 'workshop',
      school_id: refs.schoolId('Juniper Flats Middle School'),
      venue: 'Science room 4, Juniper Flats Middle School',
      starts_at: past.toJSDate(),
      ends_at: past.plus({ hours: 2 }).toJSDate(),
      time_zone: zone,
      capacity: 30,
      activity_slug: 'thermal-cycling',
      description: 'Build the thermal puck and log how fast it cools.',
      state: 'published',
      published_at: past.minus({ days: 20 }).toJSDate(),
      created_by: refs.coordinatorId,
    })
    .returning('id');
  await knex('event_attendance').insert([
    {
      event_id: workshop.id,
      school_id: refs.schoolId('Juniper Flats Middle School'),
      attendee_count: 24,
      recorded_by: refs.coordinatorId,
    },
    {
      event_id: workshop.id,
      school_id: refs.schoolId('Larkspur Elementary'),
      attendee_count: 9,
      recorded_by: refs.coordinatorId,
    },
  ]);

  const links = await knex('live_links')
    .insert([
      { code: 'SKEN42', title: 'Skein activity bookmark', target_url: '/activities', created_by: refs.coordinatorId },
      { code: 'BGB7XD', title: 'Big build poster', target_url: `/events/${event.id}`, created_by: refs.coordinatorId },
    ])
    .returning('id');
  // Invented scan counts: a few a day, more on the days after the posters went up.
  const today = DateTime.utc().startOf('day');
  const scans = links.flatMap((link, l) =>
    Array.from({ length: 30 }, (_, d) => ({
      link_id: link.id,
      day: today.minus({ days: d }).toISODate(),
      count: ((d * 7 + l * 3) % 11) + (d < 8 ? 6 : 0) + l,
    })).filter((row) => row.count > 0),
  );
  await knex('live_link_scans').insert(scans);
}
