/**
 * Invented reach history for the demo (the fictional schools of seeds/01_demo.ts): directory fields of the
 * five schools, two proposed schools (one a near-duplicate name), kits, published entries, past events with
 * attendance per school and teachers' sign-in days spread over the past year, so the reach dashboard has
 * something to show.
 * Runs after the main demo seed, on its rows.
 */
import type { Knex } from 'knex';

const DIRECTORY: Record<
  string,
  { district: string; grade_bands: string; high_need_basis: string; year: number | null }
> = {
  'Juniper Flats Middle School': {
    district: 'Juniper Unified',
    grade_bands: '{6-8}',
    high_need_basis: '71% of students eligible for free or reduced-price meals',
    year: 2025,
  },
  'Larkspur Elementary': {
    district: 'Larkspur City Schools',
    grade_bands: '{K-2,3-5}',
    high_need_basis: '',
    year: null,
  },
  'Bright Creek High School': {
    district: 'East Valley Joint',
    grade_bands: '{9-12}',
    high_need_basis: '58% of students eligible for free or reduced-price meals',
    year: 2025,
  },
  'Quarry Hill Middle School': { district: 'East Valley Joint', grade_bands: '{6-8}', high_need_basis: '', year: null },
  'Fennel Valley STEM Academy': {
    district: 'South Plains Rural',
    grade_bands: '{6-8,9-12}',
    high_need_basis: '64% of students eligible for free or reduced-price meals',
    year: 2024,
  },
};

export async function seedDemoReach(knex: Knex): Promise<void> {
  const now = Date.now();
  const daysAgo = (d: number) => new Date(now - d * 86_400_000);
  const schools: { id: string; name: string }[] = await knex('schools').select('id', 'name');
  const school = (name: string) => schools.find((s) => s.name === name)!.id;
  for (const [name, d] of Object.entries(DIRECTORY)) {
    await knex('schools')
      .where({ name })
      .update({
        district: d.district,
        grade_bands: knex.raw('CAST(? AS grade_band[])', [d.grade_bands]),
        high_need_basis: d.high_need_basis,
        high_need_year: d.year,
      });
  }
  await knex('schools').insert([
    { name: 'Juniper Flats Middle', city: 'Juniper Flats', region: 'North County', country: 'US', status: 'proposed' },
    { name: 'Saltbrush Primary School', city: 'Saltbrush', region: 'South Plains', country: 'US', status: 'proposed' },
  ]);

  // Spread the demo kits over the past year (newest first as the seed made them).
  const kits: { id: string }[] = await knex('kits').select('id').orderBy('created_at');
  const kitAges = [230, 140, 75, 12];
  for (const [i, kit] of kits.entries()) {
    await knex('kits')
      .where({ id: kit.id })
      .update({ created_at: daysAgo(kitAges[i % kitAges.length]!), updated_at: daysAgo(kitAges[i % kitAges.length]!) });
  }

  const classes: { id: string; name: string }[] = await knex('classes').select('id', 'name');
  const classId = (name: string) => classes.find((c) => c.name === name)!.id;
  const coordinator = await knex('users').where({ role: 'coordinator' }).first('id');
  const published = (className: string, title: string, activity: string | null, age: number) => ({
    class_id: classId(className),
    author_kind: 'teacher',
    title,
    body: 'What we built and what we measured.',
    state: 'published',
    teacher_approved: true,
    submitted_at: daysAgo(age + 2),
    reviewed_at: daysAgo(age),
    published_at: daysAgo(age),
    reviewed_by: coordinator?.id ?? null,
    activity_slug: activity,
  });
  await knex('entries').insert([
    published('Engineering Club', 'Booms across the field', 'scale-it', 135),
    published('Room 12 Explorers', 'Our first paper satellite', null, 220),
    published('Physics 2', 'Lamp on, lamp off', 'thermal-cycling', 70),
    published('Physics 2', 'Cooling curves, second try', 'thermal-cycling', 40),
  ]);

  const events = await knex('events')
    .insert([
      {
        title: 'Paper satellite workshop',
        kind: 'workshop',
        school_id: school('Juniper Flats Middle School'),
        venue: 'Library',
        starts_at: daysAgo(150),
        state: 'published',
        published_at: daysAgo(170),
        attendee_count: 41,
        created_by: coordinator?.id ?? null,
      },
      {
        title: 'Thermal test open afternoon',
        kind: 'visit',
        school_id: school('Bright Creek High School'),
        venue: 'Science block',
        starts_at: daysAgo(45),
        state: 'published',
        published_at: daysAgo(60),
        attendee_count: 57,
        created_by: coordinator?.id ?? null,
      },
    ])
    .returning(['id', 'title']);
  const [workshop, visit] = events as { id: string }[];
  await knex('event_attendance').insert([
    { event_id: workshop!.id, school_id: school('Juniper Flats Middle School'), attendee_count: 29 },
    { event_id: workshop!.id, school_id: school('Larkspur Elementary'), attendee_count: 12 },
    { event_id: visit!.id, school_id: school('Bright Creek High School'), attendee_count: 38 },
    { event_id: visit!.id, school_id: school('Quarry Hill Middle School'), attendee_count: 19 },
  ]);

  const teachers: { id: string }[] = await knex('users').where({ role: 'teacher' }).select('id').orderBy('email');
  const signInAges = [
    [5, 33, 95, 160, 240],
    [20, 130],
    [8, 50, 72, 200],
  ];
  const days = teachers.flatMap((t, i) =>
    (signInAges[i % signInAges.length] ?? []).map((age) => ({
      user_id: t.id,
      day: daysAgo(age).toISOString().slice(0, 10),
    })),
  );
  await knex('account_sign_in_days').insert(days).onConflict().ignore();
}
