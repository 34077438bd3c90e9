import { describe, expect, it } from 'vitest';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { DATA_TOOLS, type DataTool } from '../../../src/lib/activities/activity-facets';
import { activityDataTools, activityPaperForSheet, dataToolHref } from '../../../src/lib/activities/activity-links';
import { activitiesParsed } from './activity-files';
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

describe('dataToolHref', () => {
  it('names a page that exists for every data tool', () => {
    for (const tool of DATA_TOOLS) {
      const page = fileURLToPath(new URL(`../../../src/pages${dataToolHref(tool)}.astro`, import.meta.url));
      expect(existsSync(page), page).toBe(true);
    }
  });
});

describe('activityDataTools', () => {
  it("lists the data sheet's tool first and each other tool a column feeds once", () => {
    const column = (key: string, tool?: DataTool) => ({ key, name: key, unit: '', tool });
    const record = {
      tool: 'thermal' as const,
      instructions: 'Write down the readings.',
      rows: 5,
      fields: [column('room_c', 'thermal')],
      columns: [column('note'), column('field_ut', 'magnetic'), column('t_c', 'thermal'), column('b_ut', 'magnetic')],
    };
    expect(activityDataTools({ record })).toEqual(['thermal', 'magnetic']);
  });

  it('gives every library activity at least the tool of its data sheet', () => {
    for (const activity of activitiesParsed()) {
      expect(activityDataTools(activity)[0]).toBe(activity.record.tool);
    }
  });
});
