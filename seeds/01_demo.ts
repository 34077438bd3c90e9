/**
 * The invented demo scenario: the Northfield Space Science Lab's outreach office, five
 * fictional schools, teachers and classes (student counts only), kits of the demo models, journal entries in
 * every state with drawn photos (confirmed by their teachers) and saved results, one big-build event, two live
 * links of the office and one per kit. Runs only on an empty database (scripts/db.ts).
 */
import type { Knex } from 'knex';
import { passwordHash } from '../src/lib/auth/password';
import { randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { kitInsertWithLink } from '../src/lib/db/kits';
import { buildKit } from '../src/lib/kit/build-kit';
import { kitFonts } from '../src/lib/kit/fonts.server';
import { KitInputsSchema, kitRequestOf } from '../src/lib/kit/kit-inputs';
import { ModelContentSchema } from '../src/lib/geometry/model-schema';
import { vibrationAnalyse } from '../src/lib/analysis/vibration';
import { vibrationInputFromCsv } from '../src/lib/analysis/vibration-csv';
import { vibrationSavedResult } from '../src/lib/analysis/saved-result-tools';
import { vibrationSampleCsv } from '../src/lib/tools/vibration-sample';
import { DEMO_ACCOUNTS } from './data/demo-accounts';
import { seedDemoEvents } from './data/demo-events';
import { seedDemoPhotos } from './data/demo-photos';
import { seedDemoReach } from './data/demo-reach';

const SCHOOLS = [
  {
    name: 'Juniper Flats Middle School',
    city: 'Juniper Flats',
    region: 'North County',
    setting: 'rural',
    high_need: true,
  },
  { name: 'Larkspur Elementary', city: 'Larkspur', region: 'North County', setting: 'suburban', high_need: false },
  { name: 'Bright Creek High School', city: 'Bright Creek', region: 'East Valley', setting: 'urban', high_need: true },
  {
    name: 'Quarry Hill Middle School',
    city: 'Quarry Hill',
    region: 'East Valley',
    setting: 'suburban',
    high_need: false,
  },
  {
    name: 'Fennel Valley STEM Academy',
    city: 'Fennel Valley',
    region: 'South Plains',
    setting: 'rural',
    high_need: true,
  },
] as const;

const CLASSES = [
  {
    teacher: 'teacher@juniper-flats.example',
    name: 'Period 3 Science',
    grade_band: '6-8',
    student_count: 26,
    join_code: 'JFMS3K7Q',
  },
  {
    teacher: 'teacher@juniper-flats.example',
    name: 'Engineering Club',
    grade_band: '6-8',
    student_count: 14,
    join_code: 'JFCXUB42',
  },
  {
    teacher: 'teacher@larkspur.example',
    name: 'Room 12 Explorers',
    grade_band: '3-5',
    student_count: 22,
    join_code: 'RMKZ2RMP',
  },
  {
    teacher: 'teacher@bright-creek.example',
    name: 'Physics 2',
    grade_band: '9-12',
    student_count: 31,
    join_code: 'BCHPHY2X',
  },
] as const;

export async function seed(knex: Knex): Promise<void> {
  const schools = await knex('schools')
    .insert(SCHOOLS.map((s) => ({ ...s, country: 'US', status: 'approved' })))
    .returning(['id', 'name']);
  const schoolId = (name: string) => schools.find((s) => s.name === name)?.id ?? null;

  const users = [];
  for (const account of DEMO_ACCOUNTS) {
    users.push({
      email: account.email,
      display_name: account.displayName,
      role: account.role,
      password_hash: await passwordHash(account.password),
      school_id: 'school' in account ? schoolId(account.school) : null,
      email_verified_at: knex.fn.now(),
    });
  }
  const inserted = await knex('users').insert(users).returning(['id', 'email', 'school_id']);
  const userBy = (email: string) => inserted.find((u) => u.email === email)!;

  const classes = await knex('classes')
    .insert(
      CLASSES.map(({ teacher, ...c }) => ({
        ...c,
        teacher_id: userBy(teacher).id,
        school_id: userBy(teacher).school_id,
      })),
    )
    .returning(['id', 'name', 'teacher_id']);
  const classBy = (name: string) => classes.find((c) => c.name === name)!;

  // Each kit differs from the usual classroom settings (Letter, 160 g/m², one copy) only where shown.
  await seedKits(knex, classBy, [
    {
      className: 'Period 3 Science',
      inputs: { modelId: 'skein-probe', activitySlug: 'shake-test', scaleDenominator: 25 },
    },
    {
      className: 'Engineering Club',
      inputs: {
        modelId: 'skein-probe',
        activitySlug: 'scale-it',
        scaleDenominator: 50,
        copies: 2,
        venue: { kind: 'preset', id: 'football-field' },
      },
    },
    { className: 'Room 12 Explorers', inputs: { modelId: 'wren-3u', scaleDenominator: 2 } },
    {
      className: 'Physics 2',
      inputs: { modelId: 'thermal-puck', activitySlug: 'thermal-cycling', scaleDenominator: 5 },
    },
  ]);

  const coordinator = userBy('coordinator@northfield-lab.example');
  const period3 = classBy('Period 3 Science');
  const room12 = classBy('Room 12 Explorers');
  const physics = classBy('Physics 2');
  const now = Date.now();
  const daysAgo = (d: number) => new Date(now - d * 86_400_000);

  // The shake-test tool's own invented sample record, analysed as the tool does, so the entries show a real plot.
  const sample = vibrationInputFromCsv(vibrationSampleCsv(), { units: 'auto' });
  const shakeResult = JSON.stringify([vibrationSavedResult(vibrationAnalyse(sample.input, sample.unitSource))]);

  const entries = (await knex('entries')
    .insert([
      {
        class_id: period3.id,
        author_kind: 'team',
        team_name: 'Team Comet',
        title: 'Our probe survived the shake table',
        body: 'Two tabs came loose on the first run; we added glue and it held for all three runs.',
        saved_results: shakeResult,
        state: 'published',
        photos_confirmed_at: daysAgo(9),
        photos_confirmed_by: period3.teacher_id,
        teacher_approved: true,
        submitted_at: daysAgo(9),
        reviewed_at: daysAgo(8),
        published_at: daysAgo(8),
        reviewed_by: coordinator.id,
        activity_slug: 'shake-test',
      },
      {
        class_id: period3.id,
        author_kind: 'team',
        team_name: 'Team Nebula',
        title: 'Blanket versus no blanket',
        body: 'With the foil blanket our puck warmed more slowly under the lamp.',
        state: 'submitted',
        teacher_approved: true,
        submitted_at: daysAgo(2),
        activity_slug: 'thermal-cycling',
      },
      {
        class_id: room12.id,
        author_kind: 'teacher',
        title: 'Shaking the Wren at 20 Hz and 80 Hz',
        photos_confirmed_at: daysAgo(1),
        photos_confirmed_by: room12.teacher_id,
        body: 'We taped a phone to the Wren and shook it by hand on a foam block. The **PSD** shows our two shakes.',
        state: 'submitted',
        teacher_approved: true,
        submitted_at: daysAgo(1),
        activity_slug: 'shake-test',
        saved_results: shakeResult,
      },
      {
        class_id: room12.id,
        author_kind: 'teacher',
        title: 'Room 12 built the Wren',
        photos_confirmed_at: daysAgo(5),
        photos_confirmed_by: room12.teacher_id,
        body: 'Every team finished the body; the solar panels were the hardest part.',
        state: 'returned',
        review_note: 'Lovely! Please say in the alt text which part the class found hardest, then resubmit.',
        submitted_at: daysAgo(5),
        reviewed_at: daysAgo(4),
        reviewed_by: coordinator.id,
      },
      {
        class_id: physics.id,
        author_kind: 'team',
        team_name: 'Magnetos',
        title: 'How fast does a magnet fade?',
        body: 'We measured the field of a fridge magnet from 2 cm to 20 cm.',
        state: 'draft',
        activity_slug: 'keep-it-non-magnetic',
      },
      {
        class_id: physics.id,
        author_kind: 'team',
        team_name: 'Spam bots',
        title: 'Buy now',
        body: 'Off-topic post.',
        state: 'declined',
        teacher_approved: true,
        review_note: 'Off topic for the journal.',
        submitted_at: daysAgo(3),
        reviewed_at: daysAgo(3),
        reviewed_by: coordinator.id,
      },
    ])
    .returning(['id', 'title'])) as { id: string; title: string }[];
  await seedDemoPhotos(knex, entries);

  const engineeringKit = await knex('kits')
    .where({ class_id: classBy('Engineering Club').id })
    .first('id');
  await seedDemoEvents(knex, {
    coordinatorId: coordinator.id,
    schoolId,
    userByEmail: userBy,
    kitId: engineeringKit?.id ?? null,
  });

  await seedDemoReach(knex);
}

interface DemoKit {
  className: string;
  inputs: Record<string, unknown>;
}

const DEMO_KIT_DEFAULTS = {
  sheetSizeId: 'letter',
  paperGsm: 160,
  copies: 1,
  units: 'us',
  venue: { kind: 'preset', id: 'classroom' },
};

/**
 * Saves demo kits the way the kit API does: validated inputs, a real build for the hash and sheet count, and each
 * kit's own live link.
 */
async function seedKits(
  knex: Knex,
  classBy: (name: string) => { id: string; teacher_id: string },
  kits: DemoKit[],
): Promise<void> {
  const fonts = await kitFonts();
  const siteUrl = (process.env.SITE_URL ?? 'http://127.0.0.1:4321').replace(/\/+$/, '');
  for (const kit of kits) {
    const inputs = KitInputsSchema.parse({ ...DEMO_KIT_DEFAULTS, ...kit.inputs });
    const owner = classBy(kit.className);
    const file = new URL(`../content/models/${inputs.modelId}.json`, import.meta.url);
    const content = ModelContentSchema.parse(JSON.parse(readFileSync(file, 'utf8')));
    await kitInsertWithLink(
      {
        id: randomUUID(),
        classId: owner.id,
        teacherId: owner.teacher_id,
        title: content.title,
        modelId: content.id,
        activitySlug: inputs.activitySlug ?? null,
        inputs,
      },
      {
        requestFor: (qrUrl) => kitRequestOf(inputs, content, qrUrl),
        build: (request) => buildKit(request, fonts, { outputs: ['svg'] }),
        siteUrl,
      },
      knex,
    );
  }
}
