/**
 * GET /api/activities against the activity files themselves: the expected lists are computed here from
 * content/activities/*.md read by the `yaml` package (activity-files.ts), not by the app's content collection,
 * and filtered with plain comparisons written in this test.
 */
import { describe, expect, it } from 'vitest';
import { activityFiles } from '../lib/activities/activity-files';
import { api } from './harness';

interface Listed {
  slug: string;
  gradeBands: string[];
  testKind: string;
  timeMinutes: number;
  links: { page: string };
}

const files = activityFiles().map(
  (f) => f.raw as { slug: string; gradeBands: string[]; testKind: string; timeMinutes: number },
);

async function listed(query: string): Promise<{ status: number; slugs: string[]; total: number; body: unknown }> {
  const res = await api(`/api/activities${query}`);
  const body = (await res.json()) as { activities?: Listed[]; total?: number };
  return {
    status: res.status,
    slugs: (body.activities ?? []).map((a) => a.slug).sort(),
    total: body.total ?? -1,
    body,
  };
}

describe('GET /api/activities', () => {
  it('lists every activity file, each with its page link', async () => {
    const all = await listed('');
    expect(all.status).toBe(200);
    expect(all.slugs).toEqual(files.map((f) => f.slug).sort());
    expect(all.total).toBe(files.length);
    for (const a of (all.body as { activities: Listed[] }).activities)
      expect(a.links.page).toBe(`/activities/${a.slug}`);
  });

  it('narrows by grade band, test kind and time like the library page', async () => {
    const grade = files[0]!.gradeBands[0]!;
    expect((await listed(`?grade=${encodeURIComponent(grade)}`)).slugs).toEqual(
      files
        .filter((f) => f.gradeBands.includes(grade))
        .map((f) => f.slug)
        .sort(),
    );
    const kind = files[0]!.testKind;
    expect((await listed(`?kind=${kind}`)).slugs).toEqual(
      files
        .filter((f) => f.testKind === kind)
        .map((f) => f.slug)
        .sort(),
    );
    // "one-period" keeps activities up to 55 minutes (activity-facets.ts TIME_BANDS).
    const short = await listed('?time=one-period&grade=6-8');
    expect(short.slugs).toEqual(
      files
        .filter((f) => f.timeMinutes <= 55 && f.gradeBands.includes('6-8'))
        .map((f) => f.slug)
        .sort(),
    );
    expect(short.total).toBe(files.length);
  });

  it('answers an unknown filter value or parameter with a 400 naming what would work', async () => {
    for (const query of ['?grade=13', '?kind=rocket', '?time=forever', '?colour=blue']) {
      const { status, body } = await listed(query);
      expect(status, query).toBe(400);
      expect((body as { error: { code: string; message: string } }).error.code).toBe('invalid_input');
    }
    const { body } = await listed('?grade=13');
    expect((body as { error: { message: string } }).error.message).toContain('K-2, 3-5, 6-8, 9-12');
  });
});
