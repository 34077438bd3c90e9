/** An entry as the API and the pages show it: the body as safe HTML beside its Markdown, and its photos. */
import type { Actor } from '../auth/actor';
import type { EntryJoined, EntryListRow } from '../db/entries';
import { actorReviews, entryAuthorSide, entryIsOwnClass } from './entry-access.server';
import { ENTRY_STATE_LABELS, entryStateEditable } from './entry-rules';
import { markdownExcerpt, markdownToSafeHtml } from './markdown';

const iso = (d: Date | null) => (d ? new Date(d).toISOString() : null);

/** The entry for this actor: the review note and who decided only for its own class and reviewers. */
export function entryView(entry: EntryJoined, actor: Actor) {
  const inside = entry.state !== 'published' || entryIsOwnClass(actor, entry) || actorReviews(actor);
  return {
    id: entry.id,
    classId: entry.class_id,
    className: entry.class_name,
    schoolName: entry.school_name,
    activitySlug: entry.activity_slug,
    kitId: entry.kit_id,
    kitTitle: entry.kit_title,
    authorKind: entry.author_kind,
    teamName: entry.team_name,
    title: entry.title,
    body: entry.body,
    bodyHtml: markdownToSafeHtml(entry.body),
    savedResults: entry.saved_results,
    state: entry.state,
    stateLabel: ENTRY_STATE_LABELS[entry.state],
    teacherApproved: entry.teacher_approved,
    editable: entryStateEditable(entry.state) && entryAuthorSide(actor, entry),
    submittedAt: iso(entry.submitted_at),
    publishedAt: iso(entry.published_at),
    updatedAt: iso(entry.updated_at),
    ...(inside
      ? { reviewNote: entry.review_note, reviewedBy: entry.reviewer_name, reviewedAt: iso(entry.reviewed_at) }
      : {}),
  };
}
export type EntryView = ReturnType<typeof entryView>;

/** One row of the review queue or a list: no body, an excerpt. */
export function entrySummary(entry: EntryListRow, now: Date) {
  return {
    id: entry.id,
    title: entry.title,
    excerpt: markdownExcerpt(entry.body),
    className: entry.class_name,
    classId: entry.class_id,
    schoolName: entry.school_name,
    schoolId: entry.school_id,
    activitySlug: entry.activity_slug,
    authorKind: entry.author_kind,
    teamName: entry.team_name,
    state: entry.state,
    teacherApproved: entry.teacher_approved,
    resultCount: entry.result_count,
    submittedAt: iso(entry.submitted_at),
    publishedAt: iso(entry.published_at),
    waitingDays: entry.submitted_at
      ? Math.floor((now.getTime() - new Date(entry.submitted_at).getTime()) / 86_400_000)
      : null,
  };
}
export type EntrySummary = ReturnType<typeof entrySummary>;
