/**
 * Class journal entries: their states, what may happen in each, the limits, and the zod schemas shared by the
 * forms and the endpoints. Framework-free; islands import it too.
 *
 * A teacher's entry: draft → submitted → published | returned | declined. A team's entry (written through the
 * class session, a team name only) is submitted by the team and waits for its teacher's approval before it reaches
 * the review queue. Returned entries go back to their authors as drafts with the coordinator's note; a teacher
 * may withdraw a submitted entry (back to draft). Nothing is public before a coordinator publishes it.
 */
import { z } from 'zod';
import { SavedResultSchema } from '../analysis/saved-result';
import { TextSchema } from '../text-schema';

export const ENTRY_STATES = ['draft', 'submitted', 'published', 'returned', 'declined'] as const;
export type EntryState = (typeof ENTRY_STATES)[number];
export type EntryAuthorKind = 'teacher' | 'team';

/** Most saved data tool results an entry shows. */
export const ENTRY_SAVED_RESULTS_MAX = 3;
export const ENTRY_TITLE_MAX = 160;
/** Longest Markdown body, characters. */
export const ENTRY_BODY_MAX = 20_000;
export const ENTRY_TEAM_NAME_MAX = 40;
export const ENTRY_NOTE_MAX = 2_000;
/** Largest JSON request body an entry route reads: a body plus three saved results at their cap. */
export const ENTRY_REQUEST_BYTES_MAX = 1_300_000;
/** Most entries one bulk publish may decide. */
export const ENTRY_BULK_MAX = 200;

/** The states in which an entry's authors may still change it. */
export function entryStateEditable(state: EntryState): boolean {
  return state === 'draft' || state === 'returned';
}

/** What may be done to an entry; who may do it is decided in entry-access.server.ts. */
export type EntryAction = 'submit' | 'approve' | 'withdraw' | 'publish' | 'return' | 'decline';
export type ReviewDecision = 'publish' | 'return' | 'decline';

/** The state an entry must be in for an action, and the state it moves to. */
export const ENTRY_TRANSITIONS: Record<EntryAction, { from: readonly EntryState[]; to: EntryState }> = {
  submit: { from: ['draft', 'returned'], to: 'submitted' },
  approve: { from: ['submitted'], to: 'submitted' },
  withdraw: { from: ['submitted'], to: 'draft' },
  publish: { from: ['submitted'], to: 'published' },
  return: { from: ['submitted'], to: 'returned' },
  decline: { from: ['submitted'], to: 'declined' },
};

/** The state a review decision leaves the entry in. */
export function reviewDecisionState(decision: ReviewDecision): EntryState {
  return ENTRY_TRANSITIONS[decision].to;
}

/** Words for a state, as teachers and coordinators read them. */
export const ENTRY_STATE_LABELS: Record<EntryState, string> = {
  draft: 'Draft',
  submitted: 'Submitted',
  published: 'Published',
  returned: 'Returned for changes',
  declined: 'Declined',
};

const text = (max: number) => TextSchema.trim().max(max);
const slug = z
  .string()
  .regex(/^[a-z0-9-]{1,80}$/, 'must be an activity slug (lower-case letters, digits and hyphens)')
  .nullable();

const entryFields = {
  title: text(ENTRY_TITLE_MAX).min(1, 'give the entry a title'),
  body: text(ENTRY_BODY_MAX),
  activitySlug: slug,
  kitId: z.string().uuid().nullable(),
  savedResults: z
    .array(SavedResultSchema)
    .max(ENTRY_SAVED_RESULTS_MAX, `an entry shows at most ${ENTRY_SAVED_RESULTS_MAX} saved results`),
};

/** A team name: letters, digits, spaces and simple punctuation; never a student's name (the form says so). */
export const TeamNameSchema = text(ENTRY_TEAM_NAME_MAX)
  .min(1, 'give the team a name (a team name only, no student names)')
  .regex(/^[\p{L}\p{N} .,'’&!?-]+$/u, "may use letters, digits, spaces and . , ' & ! ? -");

/** A new entry. A teacher names the class; a class session writes for its own class and gives a team name. */
export const EntryCreateSchema = z
  .object({
    classId: z.string().uuid().optional(),
    teamName: TeamNameSchema.optional(),
    title: entryFields.title,
    body: entryFields.body.default(''),
    activitySlug: entryFields.activitySlug.default(null),
    kitId: entryFields.kitId.default(null),
    savedResults: entryFields.savedResults.default([]),
  })
  .strict();
export type EntryCreate = z.infer<typeof EntryCreateSchema>;

/** Changes to a draft or returned entry; only the fields sent change. */
export const EntryUpdateSchema = z
  .object({
    teamName: TeamNameSchema.optional(),
    title: entryFields.title.optional(),
    body: entryFields.body.optional(),
    activitySlug: entryFields.activitySlug.optional(),
    kitId: entryFields.kitId.optional(),
    savedResults: entryFields.savedResults.optional(),
  })
  .strict()
  .refine((v) => Object.keys(v).length > 0, 'send at least one field to change');
export type EntryUpdate = z.infer<typeof EntryUpdateSchema>;

/** Adds one saved result to an entry (the data tools' "Save to the class journal"). */
export const EntryResultAddSchema = z.object({ savedResult: SavedResultSchema }).strict();

/**
 * Submitting (a teacher's own entry) or approving (a team's entry): the teacher confirms that no student can be
 * identified in the photos, or that the school's releases are on file. Required when the entry has photos.
 */
export const EntrySubmitSchema = z
  .object({
    photosConfirmed: z.boolean().default(false),
  })
  .strict();
export type EntrySubmit = z.infer<typeof EntrySubmitSchema>;

/** The checks a coordinator ticks before publishing, each one required. */
export const REVIEW_CHECKLIST = {
  noFacesOrNames: 'No faces a student could be recognised by, and no student names',
  noPersonalData: 'No personal data (addresses, contact details, birthdays)',
  onTopic: 'On topic for the activity',
  respectful: 'Respectful and kind',
} as const;
export type ReviewChecklistItem = keyof typeof REVIEW_CHECKLIST;

const ticked = (item: ReviewChecklistItem) =>
  z.literal(true, { errorMap: () => ({ message: `tick "${REVIEW_CHECKLIST[item]}" before publishing` }) });

export const ReviewChecklistSchema = z
  .object({
    noFacesOrNames: ticked('noFacesOrNames'),
    noPersonalData: ticked('noPersonalData'),
    onTopic: ticked('onTopic'),
    respectful: ticked('respectful'),
  })
  .strict();

const note = (what: string) => text(ENTRY_NOTE_MAX).min(1, `write ${what} for the teacher`);

/** A coordinator's decision on one submitted entry. */
export const ReviewDecisionSchema = z.discriminatedUnion('decision', [
  z
    .object({ decision: z.literal('publish'), checklist: ReviewChecklistSchema, note: text(ENTRY_NOTE_MAX).optional() })
    .strict(),
  z.object({ decision: z.literal('return'), note: note('a note saying what to change') }).strict(),
  z.object({ decision: z.literal('decline'), note: note('the reason') }).strict(),
]);
export type ReviewDecisionInput = z.infer<typeof ReviewDecisionSchema>;

/** Publishing the selected rows of the queue at once, after the same checklist. */
export const ReviewBulkPublishSchema = z
  .object({
    entryIds: z
      .array(z.string().uuid())
      .min(1, 'select at least one entry')
      .max(ENTRY_BULK_MAX, `publish at most ${ENTRY_BULK_MAX} entries at once`),
    checklist: ReviewChecklistSchema,
  })
  .strict();

export const REVIEW_QUEUE_SORTS = ['submitted', 'title', 'school', 'class', 'activity'] as const;
export const REVIEW_PAGE_SIZE_MAX = 100;

/** The review queue's filters, sort and page, as query parameters. */
export const ReviewQueueQuerySchema = z
  .object({
    schoolId: z.string().uuid().optional(),
    classId: z.string().uuid().optional(),
    activity: z
      .string()
      .regex(/^[a-z0-9-]{1,80}$/)
      .optional(),
    /** Only entries waiting at least this many days. */
    minAgeDays: z.coerce.number().int().min(0).max(3650).optional(),
    /** Only entries waiting at most this many days. */
    maxAgeDays: z.coerce.number().int().min(0).max(3650).optional(),
    sort: z.enum(REVIEW_QUEUE_SORTS).default('submitted'),
    dir: z.enum(['asc', 'desc']).default('asc'),
    page: z.coerce.number().int().min(1).max(100_000).default(1),
    pageSize: z.coerce.number().int().min(1).max(REVIEW_PAGE_SIZE_MAX).default(25),
  })
  .strict();
export type ReviewQueueQuery = z.infer<typeof ReviewQueueQuerySchema>;

/** Most entries one PDF booklet prints (a class's year, or one school's published entries). */
export const JOURNAL_BOOKLET_ENTRIES_MAX = 200;

/** Whose journal a PDF booklet prints: a class (its teacher: every entry; staff: published ones) or a school. */
export const JournalBookletQuerySchema = z
  .object({ classId: z.string().uuid().optional(), schoolId: z.string().uuid().optional() })
  .strict()
  .refine((q) => (q.classId === undefined) !== (q.schoolId === undefined), {
    message: 'name either a class (?classId=) or a school (?schoolId=), not both',
  });
export type JournalBookletQuery = z.infer<typeof JournalBookletQuerySchema>;
