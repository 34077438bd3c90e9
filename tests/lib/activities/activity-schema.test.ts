import { describe, expect, test } from 'vitest';
import { ActivitySchema } from '../../../src/lib/activities/activity-schema';
import { activityFixture } from './activity-fixture';

/** The messages of a failed parse, each prefixed by its dotted path. */
function problems(input: unknown): string[] {
  const result = ActivitySchema.safeParse(input);
  if (result.success) return [];
  return result.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
}

describe('ActivitySchema', () => {
  test('accepts the minimal fixture and fills defaults', () => {
    const a = ActivitySchema.parse(activityFixture());
    expect(a.extensions).toEqual([]);
    expect(a.order).toBe(100);
    expect(a.materials[0]!.per).toBe('team');
  });

  test('rejects an NGSS code of unknown shape, naming it and giving examples', () => {
    const p = problems(activityFixture({ standards: [{ code: 'MS-XYZ-9', note: 'x' }] }));
    expect(p).toEqual([expect.stringMatching(/^standards\.0\.code: "MS-XYZ-9" is not an NGSS .* MS-ETS1-2/)]);
  });

  test('rejects engineering codes beyond the published range and lower-case codes', () => {
    // NGSS Engineering Design: MS-ETS1 has four expectations, 3-5-ETS1 three.
    expect(problems(activityFixture({ standards: [{ code: 'MS-ETS1-5', note: 'x' }] }))).toHaveLength(1);
    expect(problems(activityFixture({ standards: [{ code: '3-5-ETS1-4', note: 'x' }] }))).toHaveLength(1);
    expect(problems(activityFixture({ standards: [{ code: 'ms-ps2-3', note: 'x' }] }))).toHaveLength(1);
  });

  test('accepts every code the brief lists', () => {
    const codes = [
      'MS-ETS1-1',
      'MS-ETS1-4',
      'MS-PS3-3',
      'MS-PS2-3',
      'MS-PS2-5',
      '3-PS2-3',
      'HS-PS2-5',
      'MS-ESS1-3',
      '3-5-ETS1-1',
      '3-5-ETS1-3',
      'HS-ETS1-4',
      'K-2-ETS1-2',
    ];
    expect(problems(activityFixture({ standards: codes.map((code) => ({ code, note: 'x' })) }))).toEqual([]);
  });

  test('rejects an unknown grade band, listing the allowed ones', () => {
    const p = problems(activityFixture({ gradeBands: ['6-8', '7-9' as never] }));
    expect(p).toEqual(['gradeBands.1: "7-9" is not a grade band; use one of K-2, 3-5, 6-8, 9-12']);
  });

  test.each([
    ['Bar magnet', 'strong-magnet'],
    ['Kettle of hot water', 'hot-water'],
    ['Craft knife', 'craft-knife'],
    ['Block of dry ice', 'dry-ice'],
    ['Glue gun and hot glue sticks', 'hot-glue'],
  ])('demands a safety block when materials list "%s"', (item, hazard) => {
    const p = problems(activityFixture({ materials: [{ item, quantity: 1 }] }));
    expect(p).toEqual([
      `safety: materials list "${item}" (a ${hazard} hazard), so the activity needs a safety block with hazards: [${hazard}]`,
    ]);
  });

  test('demands the missing hazard when a safety block exists but does not cover a material', () => {
    const p = problems(
      activityFixture({ materials: [{ item: 'Neodymium magnets', quantity: 2 }], safety: { hazards: ['scissors'] } }),
    );
    expect(p).toEqual([
      'safety.hazards: materials list "Neodymium magnets", so safety.hazards must include "strong-magnet"',
    ]);
  });

  test('does not read "magnetic compass" or "dry ice" as hazards they are not', () => {
    expect(problems(activityFixture({ materials: [{ item: 'Magnetic compass', quantity: 1 }] }))).toEqual([]);
    const p = problems(
      activityFixture({
        materials: [{ item: 'Dry ice pellets', quantity: 1 }],
        safety: { hazards: ['dry-ice'], notes: ['Only trained staff handle the dry ice.'] },
      }),
    );
    expect(p).toEqual([]);
  });

  test('rejects an unknown hazard with the list of known ones', () => {
    const p = problems(activityFixture({ safety: { hazards: ['lasers' as never] } }));
    expect(p).toHaveLength(1);
    expect(p[0]).toMatch(
      /^safety\.hazards\.0: "lasers" is not a hazard Kitwright knows; use one of craft-knife, .*ladder, spring-elastic, mains-power$/,
    );
  });

  test('asks for a trained-staff note when dry ice or a cryogen is a hazard', () => {
    const p = problems(activityFixture({ safety: { hazards: ['cryogen'], notes: ['Wear gloves.'] } }));
    expect(p).toEqual(['safety.notes: hazards cryogen need a safety note saying that only trained staff handle them']);
  });

  test('rejects duplicate column keys, a reversed team size and a too-wide data sheet', () => {
    const base = activityFixture();
    const col = base.record.columns[0]!;
    expect(problems({ ...base, record: { ...base.record, columns: [col, col] } })).toEqual([
      'record.columns: "distance_cm" is listed twice',
    ]);
    expect(problems({ ...base, teamSize: { min: 5, max: 2 } })).toEqual([
      'teamSize: teamSize.min (5) is larger than teamSize.max (2)',
    ]);
    const wide = Array.from({ length: 8 }, (_, i) => ({ ...col, key: `c${i}` }));
    expect(problems({ ...base, record: { ...base.record, columns: wide } })).toEqual([
      'record.columns: at most 7 columns fit across a portrait page',
    ]);
  });

  test('rejects a column that feeds an unknown tool and a slug with capitals', () => {
    const base = activityFixture();
    const bad = { ...base.record.columns[0]!, tool: 'sound' as never };
    expect(problems({ ...base, record: { ...base.record, columns: [bad] } })).toEqual([
      'record.columns.0.tool: "sound" is not a data tool; use one of vibration, thermal, cleanroom, magnetic, scale, deployment, interference, four-point, launch-stack',
    ]);
    expect(problems({ ...base, slug: 'Shake_Test' })).toEqual([
      'slug: slug must be lower-case words joined by hyphens, like "shake-test"',
    ]);
  });
});

describe('DataSheetSchema fields', () => {
  test('rejects a single field whose key repeats a column key', () => {
    const base = activityFixture();
    const field = { key: 'distance_cm', name: 'Background', unit: 'cm' };
    const result = ActivitySchema.safeParse({ ...base, record: { ...base.record, fields: [field] } });
    expect(result.success ? [] : result.error.issues.map((i) => i.message)).toEqual(['"distance_cm" is listed twice']);
  });
});
