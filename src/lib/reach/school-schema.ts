/**
 * Input shapes of the schools directory (coordinators edit, accept and merge schools), shared by the
 * endpoints and the forms, and the similarity above which two names are flagged as near duplicates.
 */
import { z } from 'zod';
import { SCHOOL_SETTINGS } from './reach-query';

export const GRADE_BANDS = ['K-2', '3-5', '6-8', '9-12'] as const;
/** Longest school name, city, district or region. */
export const SCHOOL_TEXT_MAX = 160;
/** Longest high-need basis text. */
export const SCHOOL_BASIS_MAX = 300;
/**
 * Trigram similarity (pg_trgm's similarity(), 0–1) at or above which two school names are flagged as possible
 * duplicates. pg_trgm's own default threshold for the % operator is 0.3 (PostgreSQL documentation, F.35
 * pg_trgm, pg_trgm.similarity_threshold); school names share words like "Middle School", so we ask for more.
 */
export const SCHOOL_DUPLICATE_SIMILARITY = 0.45;

const text = (label: string) =>
  z.string().trim().max(SCHOOL_TEXT_MAX, `${label} may be at most ${SCHOOL_TEXT_MAX} characters.`);

/** Fields of a school a coordinator may change; accepting a proposed school sets status "approved". */
export const SchoolUpdateSchema = z
  .object({
    name: text('The name').min(2, 'Give the school a name of at least 2 characters.'),
    city: text('The city'),
    district: text('The district'),
    region: text('The region'),
    country: text('The country'),
    setting: z.enum(SCHOOL_SETTINGS),
    gradeBands: z.array(z.enum(GRADE_BANDS)).max(GRADE_BANDS.length),
    highNeed: z.boolean(),
    /** What the flag rests on, e.g. "62% eligible for free or reduced-price meals". */
    highNeedBasis: z.string().trim().max(SCHOOL_BASIS_MAX),
    /** First calendar year of the school year the basis figure is from. */
    highNeedYear: z.number().int().min(1990).max(2100).nullable(),
    status: z.literal('approved'),
  })
  .partial()
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: 'Change at least one field.' })
  .refine((v) => !v.highNeed || (v.highNeedBasis ?? '').length > 0, {
    message: 'Say what the high-need flag rests on (e.g. the share of students eligible for free meals).',
    path: ['highNeedBasis'],
  });
export type SchoolUpdate = z.infer<typeof SchoolUpdateSchema>;

/** Merge this school into another: every teacher, class, kit and event moves to `intoId`. */
export const SchoolMergeSchema = z.object({ intoId: z.string().uuid('intoId must be a school id (a UUID).') }).strict();

/** GET /api/schools/directory: filters and paging of the directory. */
export const SchoolDirectoryQuerySchema = z.object({
  q: z.string().trim().max(SCHOOL_TEXT_MAX).optional(),
  status: z.enum(['approved', 'proposed']).optional(),
  region: z.string().trim().min(1).max(SCHOOL_TEXT_MAX).optional(),
  setting: z.enum(SCHOOL_SETTINGS).optional(),
  highNeed: z
    .enum(['true', 'false'])
    .transform((v) => v === 'true')
    .optional(),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
});
export type SchoolDirectoryQuery = z.infer<typeof SchoolDirectoryQuerySchema>;

/** One school of the directory with every field and its number of teachers and classes. */
export interface SchoolRecord {
  id: string;
  name: string;
  city: string;
  district: string;
  region: string;
  country: string;
  setting: (typeof SCHOOL_SETTINGS)[number];
  gradeBands: (typeof GRADE_BANDS)[number][];
  highNeed: boolean;
  highNeedBasis: string;
  highNeedYear: number | null;
  status: 'approved' | 'proposed';
  teacherCount: number;
  classCount: number;
}

/** A proposed school (every directory field) and the schools it may duplicate, with name similarity (0–1). */
export interface SchoolDuplicate {
  school: SchoolRecord;
  similar: { id: string; name: string; city: string; status: string; similarity: number }[];
}
