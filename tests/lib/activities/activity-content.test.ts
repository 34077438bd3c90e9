import { existsSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { ActivitySchema } from '../../../src/lib/activities/activity-schema';
import { ModelEntrySchema } from '../../../src/lib/activities/model-entry-schema';
import { hazardNeedsTrainedStaff, hazardsInText } from '../../../src/lib/activities/safety';
import { CONTENT_DIR, activitiesParsed, activityFiles } from './activity-files';
import { readFileSync, readdirSync } from 'node:fs';

describe('content/activities', () => {
  const files = activityFiles();

  test.each(files.map((f) => [f.file, f] as const))('%s parses with the activity schema', (_name, f) => {
    const result = ActivitySchema.safeParse(f.raw);
    expect(result.success ? [] : result.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`)).toEqual([]);
  });

  test('holds the starting activities and the later ones, one per test kind', () => {
    const activities = activitiesParsed();
    expect(activities.map((a) => a.slug)).toEqual(
      expect.arrayContaining([
        'shake-test',
        'thermal-cycling',
        'clean-room-build',
        'keep-it-non-magnetic',
        'scale-it',
        'deployment-trials',
        'interference-hunt',
        'four-point-measurement',
        'launch-stack',
      ]),
    );
    expect(new Set(activities.map((a) => a.testKind))).toEqual(
      new Set([
        'vibration',
        'thermal',
        'cleanroom',
        'magnetic',
        'scale',
        'deployment',
        'interference',
        'four-point',
        'launch-stack',
      ]),
    );
  });

  test('puts safety glasses on for springs and elastic, the teacher in charge of mains devices, and asks about pacemakers', () => {
    const bySlug = new Map(activitiesParsed().map((a) => [a.slug, a]));
    const deploy = bySlug.get('deployment-trials')!;
    expect(deploy.safety?.hazards).toContain('spring-elastic');
    expect(deploy.safety?.notes.join(' ')).toMatch(/safety glasses/);
    const hunt = bySlug.get('interference-hunt')!;
    expect(hunt.safety?.hazards).toEqual(expect.arrayContaining(['mains-power', 'strong-magnet']));
    expect(hunt.safety?.notes.join(' ')).toMatch(/Only the teacher/);
    expect(hunt.safety?.notes.join(' ')).toMatch(/pacemaker/);
  });

  test('names each file after its slug', () => {
    for (const f of files) expect(`${(f.raw as { slug: string }).slug}.md`).toBe(f.file);
  });

  test('uses only demo models that exist in content/models', () => {
    for (const a of activitiesParsed())
      for (const id of a.models) expect(existsSync(`${CONTENT_DIR}models/${id}.json`), `${a.slug} → ${id}`).toBe(true);
  });

  test('says "trained staff" in every activity with dry ice or a cryogen', () => {
    for (const a of activitiesParsed()) {
      if (!a.safety?.hazards.some(hazardNeedsTrainedStaff)) continue;
      expect(a.safety.notes.join(' ')).toMatch(/trained staff/i);
    }
  });

  test('declares a hazard for every hazard word anywhere in an activity, not only in materials', () => {
    // Steps and preparation can name a tool too (e.g. "cut with a craft knife"); the caution must follow it.
    for (const a of activitiesParsed()) {
      const words = [...a.preparation, ...a.steps, ...a.extensions].flatMap(hazardsInText);
      for (const h of words) expect(a.safety?.hazards ?? [], `${a.slug} mentions ${h}`).toContain(h);
    }
  });

  test('writes a background section in the body of every guide', () => {
    for (const f of files) expect(f.body, f.file).toMatch(/^## Why flight hardware does this$/m);
  });
});

describe('content/models', () => {
  test('every model file passes the library entry schema and its id matches the file name', () => {
    const dir = `${CONTENT_DIR}models/`;
    for (const file of readdirSync(dir).filter((f) => f.endsWith('.json'))) {
      const entry = ModelEntrySchema.parse(JSON.parse(readFileSync(dir + file, 'utf8')));
      expect(`${entry.id}.json`).toBe(file);
    }
  });
});
