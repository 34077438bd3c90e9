import { describe, expect, test } from 'vitest';
import {
  ACTIVITY_FILTER_NONE,
  activityFilterApply,
  activityFilterFromQuery,
  activityFilterToQuery,
} from '../../../src/lib/activities/activity-filter';
import { gradeBandsLabel, minutesLabel } from '../../../src/lib/activities/activity-facets';
import type { ActivityFacets } from '../../../src/lib/activities/activity-filter';

const list: (ActivityFacets & { id: string })[] = [
  { id: 'a', gradeBands: ['K-2', '3-5'], testKind: 'magnetic', timeMinutes: 45 },
  { id: 'b', gradeBands: ['6-8'], testKind: 'thermal', timeMinutes: 100 },
  { id: 'c', gradeBands: ['6-8', '9-12'], testKind: 'magnetic', timeMinutes: 55 },
  { id: 'd', gradeBands: ['9-12'], testKind: 'scale', timeMinutes: 180 },
];
const ids = (q: string) => activityFilterApply(list, activityFilterFromQuery(new URLSearchParams(q))).map((a) => a.id);

describe('activityFilterApply', () => {
  test('keeps everything with no filter, in the given order', () => {
    expect(activityFilterApply(list, ACTIVITY_FILTER_NONE).map((a) => a.id)).toEqual(['a', 'b', 'c', 'd']);
    expect(activityFilterApply([], ACTIVITY_FILTER_NONE)).toEqual([]);
  });

  test('keeps activities that include the grade band', () => {
    expect(ids('grade=6-8')).toEqual(['b', 'c']);
    expect(ids('grade=K-2')).toEqual(['a']);
  });

  test('keeps activities of the test kind', () => {
    expect(ids('kind=magnetic')).toEqual(['a', 'c']);
  });

  test('keeps activities up to the time band, the limit included', () => {
    expect(ids('time=one-period')).toEqual(['a', 'c']);
    expect(ids('time=two-periods')).toEqual(['a', 'b', 'c']);
  });

  test('combines filters with "and"', () => {
    expect(ids('grade=6-8&kind=magnetic&time=one-period')).toEqual(['c']);
    expect(ids('grade=K-2&kind=scale')).toEqual([]);
  });
});

describe('activityFilterFromQuery', () => {
  test('ignores unknown or empty values instead of failing', () => {
    expect(activityFilterFromQuery(new URLSearchParams('grade=13&kind=&time=forever'))).toEqual(ACTIVITY_FILTER_NONE);
  });

  test('round-trips through activityFilterToQuery', () => {
    const f = activityFilterFromQuery(new URLSearchParams('kind=thermal&grade=9-12&time=two-periods'));
    expect(activityFilterFromQuery(new URLSearchParams(activityFilterToQuery(f)))).toEqual(f);
    expect(activityFilterToQuery(ACTIVITY_FILTER_NONE)).toBe('');
  });
});

describe('minutesLabel', () => {
  test('says minutes and hours as a reader would', () => {
    expect(minutesLabel(40)).toBe('40 min');
    expect(minutesLabel(60)).toBe('1 h');
    expect(minutesLabel(110)).toBe('1 h 50 min');
    expect(minutesLabel(0)).toBe('—');
    expect(minutesLabel(Number.NaN)).toBe('—');
  });
});

describe('gradeBandsLabel', () => {
  test('joins neighbouring bands into one range and lists gaps', () => {
    expect(gradeBandsLabel(['6-8', '3-5'])).toBe('Grades 3–8');
    expect(gradeBandsLabel(['K-2', '3-5', '6-8', '9-12'])).toBe('Grades K–12');
    expect(gradeBandsLabel(['K-2', '6-8'])).toBe('Grades K–2, 6–8');
    expect(gradeBandsLabel([])).toBe('—');
  });
});

describe('activityMaterialLabel', () => {
  test('prints the amount per team or class, singular for one', async () => {
    const { activityMaterialLabel } = await import('../../../src/lib/activities/activity-text');
    expect(activityMaterialLabel({ item: 'Scissors', quantity: 2, per: 'team' })).toBe('Scissors: 2 per team');
    expect(activityMaterialLabel({ item: 'Kit', quantity: 1, unit: 'sheets', per: 'team' })).toBe(
      'Kit: 1 sheet per team',
    );
    expect(activityMaterialLabel({ item: 'Gloves', quantity: 4, unit: 'pairs', per: 'class' })).toBe(
      'Gloves: 4 pairs per class',
    );
  });
});
