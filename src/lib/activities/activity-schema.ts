/**
 * The frontmatter of an activity guide (content/activities/*.md), checked once when Astro loads the
 * collection and again by the tests. One base schema for every library entry (title and summary), extended
 * here for activities and in model-entry-schema.ts for demo models. Refinements explain what is wrong and
 * what would work, because the people who read them write guides, not code.
 */
import { z } from 'zod';
import { DATA_TOOLS, GRADE_BANDS, TEST_KINDS } from './activity-facets';
import { NGSS_CODE_EXAMPLES, ngssCodeValid } from './ngss-codes';
import { HazardSchema, hazardsInText, hazardNeedsTrainedStaff } from './safety';

const KEBAB = /^[a-z0-9]+(-[a-z0-9]+)*$/;
const text = (max: number) => z.string().trim().min(1, 'must not be empty').max(max, `keep it under ${max} characters`);
const kebabId = (what: string) =>
  z.string().regex(KEBAB, `${what} must be lower-case words joined by hyphens, like "shake-test"`);
const enumOf = <T extends readonly [string, ...string[]]>(values: T, what: string) =>
  z.enum(values, {
    errorMap: (issue, ctx) =>
      issue.code === 'invalid_enum_value'
        ? { message: `"${String(issue.received)}" is not a ${what}; use one of ${values.join(', ')}` }
        : { message: ctx.defaultError },
  });

/** Fields every library entry has, activities and demo models alike. */
export const LibraryEntryBaseSchema = z.object({
  /** Name shown as the page heading and on the PDFs. */
  title: text(80),
  /** One or two sentences for the library card and the page description. */
  summary: z
    .string()
    .trim()
    .min(20, 'write at least one full sentence (20 characters)')
    .max(320, 'keep it under 320 characters'),
});

export const GradeBandSchema = enumOf(GRADE_BANDS, 'grade band');
export const TestKindSchema = enumOf(TEST_KINDS, 'test kind');
export const DataToolSchema = enumOf(DATA_TOOLS, 'data tool');

/** One column of the student data sheet. */
export const DataSheetColumnSchema = z.object({
  /** Stable machine name, snake_case with the unit at the end (`distance_cm`); also the CSV header. */
  key: z.string().regex(/^[a-z][a-z0-9_]*$/, 'a column key is snake_case, like "distance_cm"'),
  /** Heading printed on the sheet. */
  name: text(40),
  /** Unit printed under the heading ("cm", "°C", "µT"); "" for a count or a label. */
  unit: z.string().trim().max(12, 'keep the unit short (12 characters)'),
  /** The data tool this column is typed into; absent for notes the tools do not read. */
  tool: DataToolSchema.optional(),
});

/** What students record: the data sheet the tool islands read. */
export const DataSheetSchema = z.object({
  /** The data tool the sheet mainly feeds. */
  tool: DataToolSchema,
  /** One or two sentences printed above the table. */
  instructions: text(400),
  /** Blank rows printed on the sheet. */
  rows: z.number().int().min(3, 'print at least 3 rows').max(30, 'more than 30 rows do not fit one page'),
  /** Single values written once above the table (a floor area, a background reading); same shape as a column. */
  fields: z.array(DataSheetColumnSchema).max(4, 'at most 4 single fields fit above the table').default([]),
  /** Table columns, left to right. */
  columns: z
    .array(DataSheetColumnSchema)
    .min(1, 'a data sheet needs at least one column')
    .max(7, 'at most 7 columns fit across a portrait page'),
});

export const StandardAlignmentSchema = z.object({
  /** NGSS performance expectation code. */
  code: z.string().refine(ngssCodeValid, (code) => ({
    message: `"${code}" is not an NGSS performance expectation code; codes look like ${NGSS_CODE_EXAMPLES.join(', ')}`,
  })),
  /** How the activity works toward it, in our own words. */
  note: text(240),
});

export const MaterialSchema = z.object({
  /** What it is, as a teacher would shop for it. */
  item: text(120),
  /** How many (or how much) per team, or per class when `per` is "class". */
  quantity: z.number().positive('a quantity must be more than zero'),
  /** Unit of the quantity when it is not a count ("sheets", "m", "L"). */
  unit: z.string().trim().max(20).optional(),
  /** Whether the quantity is per team (default) or shared by the class. */
  per: z.enum(['team', 'class']).default('team'),
});

export const SafetyBlockSchema = z.object({
  /** Hazards from the fixed list; each prints its caution. */
  hazards: z.array(HazardSchema).min(1, 'list at least one hazard, or leave the safety block out'),
  /** Activity-specific precautions, printed after the standard cautions. */
  notes: z.array(text(400)).default([]),
});

/** The activity frontmatter before cross-field checks (extend this, then refine). */
export const ActivityObjectSchema = LibraryEntryBaseSchema.extend({
  /** URL name: /activities/<slug>; must match the file name. */
  slug: kebabId('slug'),
  /** Library order, smallest first. */
  order: z.number().int().min(0).default(100),
  gradeBands: z.array(GradeBandSchema).min(1, 'name at least one grade band'),
  /** Class time needed, minutes, preparation not included. */
  timeMinutes: z.number().int('give whole minutes').min(10, 'at least 10 minutes').max(600, 'at most 600 minutes'),
  teamSize: z.object({ min: z.number().int().min(1).max(12), max: z.number().int().min(1).max(12) }),
  testKind: TestKindSchema,
  /** Demo model ids from content/models; the page links each to the kit builder. */
  models: z.array(kebabId('a model id')).min(1, 'name the demo model the class builds'),
  learningGoals: z.array(text(240)).min(1, 'name at least one learning goal'),
  standards: z.array(StandardAlignmentSchema).min(1, 'align to at least one NGSS performance expectation'),
  materials: z.array(MaterialSchema).min(1, 'list the materials'),
  preparation: z.array(text(400)).min(1, 'say what the teacher prepares'),
  /** Numbered steps for the class. */
  steps: z.array(text(600)).min(3, 'give at least 3 steps'),
  record: DataSheetSchema,
  discussion: z.array(text(300)).min(1, 'give at least one discussion question'),
  extensions: z.array(text(400)).default([]),
  /** Required when the materials name a hazard (see HAZARD_KEYWORDS). */
  safety: SafetyBlockSchema.optional(),
});

type ActivityObject = z.infer<typeof ActivityObjectSchema>;

/** Cross-field checks: safety covers the materials, trained staff for cryogens, tidy lists. */
function activityRefine(a: ActivityObject, ctx: z.RefinementCtx): void {
  const declared = new Set(a.safety?.hazards ?? []);
  for (const m of a.materials) {
    for (const hazard of hazardsInText(m.item)) {
      if (declared.has(hazard)) continue;
      ctx.addIssue({
        code: 'custom',
        path: a.safety ? ['safety', 'hazards'] : ['safety'],
        message: a.safety
          ? `materials list "${m.item}", so safety.hazards must include "${hazard}"`
          : `materials list "${m.item}" (a ${hazard} hazard), so the activity needs a safety block with hazards: [${hazard}]`,
      });
      declared.add(hazard);
    }
  }
  const cold = a.safety?.hazards.filter(hazardNeedsTrainedStaff) ?? [];
  if (cold.length > 0 && !a.safety!.notes.some((n) => /trained staff/i.test(n))) {
    ctx.addIssue({
      code: 'custom',
      path: ['safety', 'notes'],
      message: `hazards ${cold.join(', ')} need a safety note saying that only trained staff handle them`,
    });
  }
  const dupes = (list: readonly string[]) => list.filter((x, i) => list.indexOf(x) !== i);
  for (const [path, list] of [
    ['gradeBands', a.gradeBands],
    ['safety.hazards', a.safety?.hazards ?? []],
    ['record.columns', [...a.record.fields, ...a.record.columns].map((c) => c.key)],
    ['standards', a.standards.map((s) => s.code)],
  ] as const) {
    const d = dupes(list);
    if (d.length) ctx.addIssue({ code: 'custom', path: path.split('.'), message: `"${d[0]}" is listed twice` });
  }
  if (a.teamSize.min > a.teamSize.max) {
    ctx.addIssue({
      code: 'custom',
      path: ['teamSize'],
      message: `teamSize.min (${a.teamSize.min}) is larger than teamSize.max (${a.teamSize.max})`,
    });
  }
}

/** The full activity frontmatter schema: Astro's content collection uses it as is. */
export const ActivitySchema = ActivityObjectSchema.superRefine(activityRefine);
export type Activity = z.infer<typeof ActivitySchema>;
export type ActivityInput = z.input<typeof ActivitySchema>;
export type DataSheet = z.infer<typeof DataSheetSchema>;
export type DataSheetColumn = z.infer<typeof DataSheetColumnSchema>;
