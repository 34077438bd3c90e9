import { describe, expect, it } from 'vitest';
import { activityPaperForSheet } from '../../../src/lib/activities/activity-links';
import { SHEET_SIZES } from '../../../src/lib/layout/sheet-sizes';

describe('activityPaperForSheet', () => {
  // ISO 216 names its A series A0…A10; every other sheet we offer is a US size (ASME Y14.1) or stock.
  it('prints the guide and data sheet on A4 for an ISO A sheet and on Letter for the rest', () => {
    const papers = Object.fromEntries(Object.keys(SHEET_SIZES).map((id) => [id, activityPaperForSheet(id)]));
    expect(papers).toMatchObject({
      a3: 'a4',
      a4: 'a4',
      a5: 'a4',
      letter: 'letter',
      legal: 'letter',
      tabloid: 'letter',
    });
    expect(activityPaperForSheet('panel-1220x2440')).toBe('letter');
  });
});
