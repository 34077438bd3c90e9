/**
 * Gathers a class journal booklet for an actor and writes it (journal-booklet-pdf.ts). A teacher prints one of
 * their own classes, every entry in every state, each marked with its state; coordinators and admins print one
 * school's or one class's published entries only. Another teacher's class, or a school for a teacher, answers as
 * if it did not exist or was not theirs to print; nothing unpublished reaches staff through it.
 */
import { classForActor } from '../auth/class-access.server';
import type { Actor } from '../actor';
import { entryById, entryListForClass, publishedEntries, type EntryJoined, type EntryListRow } from '../db/entries';
import { schoolRecordById } from '../db/school-directory';
import { ForbiddenError, NotFoundError } from '../errors';
import { kitFonts } from '../kit/fonts.server';
import { entryPhotoList, photoBytes } from '../photos/entry-photos.server';
import { ENTRY_STATE_LABELS, JOURNAL_BOOKLET_ENTRIES_MAX, type JournalBookletQuery } from './entry-rules';
import { journalBookletPdf, type BookletEntry } from './journal-booklet-pdf';

const day = (d: Date) => new Date(d).toISOString().slice(0, 10);

/** The whole entries of list rows (one read each; a booklet is a rare download). */
async function entriesWhole(rows: EntryListRow[]): Promise<EntryJoined[]> {
  return (await Promise.all(rows.map((r) => entryById(r.id)))).filter((e) => e !== null);
}

/** The entries and the booklet's title for the actor, or a NotFound/Forbidden error. */
async function bookletSource(actor: Actor, query: JournalBookletQuery) {
  const staff = actor.kind === 'user' && actor.role !== 'teacher';
  if (query.classId) {
    const klass = await classForActor(actor, query.classId);
    // A teacher's list reads the start of each body only; the booklet prints whole entries.
    const rows = staff
      ? await publishedEntries({ classId: klass.id, limit: JOURNAL_BOOKLET_ENTRIES_MAX })
      : await entriesWhole(await entryListForClass(klass.id, { limit: JOURNAL_BOOKLET_ENTRIES_MAX }));
    return {
      title: `${klass.name} journal`,
      subtitle: staff
        ? `Published entries of one class${klass.schoolName ? `, ${klass.schoolName}` : ''}`
        : 'Every entry of the class, each with its state',
      slug: 'class',
      rows,
    };
  }
  if (!staff) throw new ForbiddenError('Only coordinators and admins print a school’s booklet; name your class.');
  const school = await schoolRecordById(query.schoolId!);
  if (!school) throw new NotFoundError('There is no school with that id.');
  return {
    title: `${school.name} journal`,
    subtitle: 'Published entries of one school',
    slug: 'school',
    rows: await publishedEntries({ schoolId: school.id, limit: JOURNAL_BOOKLET_ENTRIES_MAX }),
  };
}

/** What the booklet prints of one entry: its words, its photos' display copies and its saved results. */
async function bookletEntry(
  row: EntryJoined,
  photos: Awaited<ReturnType<typeof entryPhotoList>>,
): Promise<BookletEntry> {
  const stored = await Promise.all(
    (photos.get(row.id) ?? []).map(async (p) => {
      const jpeg = await photoBytes(p.id, 'display');
      return jpeg ? { jpeg, widthPx: p.widthPx, heightPx: p.heightPx, altText: p.altText } : null;
    }),
  );
  return {
    title: row.title,
    byline: [row.author_kind === 'team' ? row.team_name : 'The teacher', row.class_name, row.school_name]
      .filter(Boolean)
      .join(' · '),
    status:
      row.state === 'published' && row.published_at
        ? `Published ${day(row.published_at)}`
        : ENTRY_STATE_LABELS[row.state],
    body: row.body,
    photos: stored.filter((p) => p !== null),
    results: row.saved_results,
  };
}

/** The booklet's PDF bytes and a file name for it. */
export async function journalBookletFor(actor: Actor, query: JournalBookletQuery) {
  const source = await bookletSource(actor, query);
  // Oldest first, as a journal reads.
  const rows = [...source.rows].sort((a, b) => new Date(a.created_at).getTime() - new Date(b.created_at).getTime());
  const photos = await entryPhotoList(rows.map((r) => r.id));
  const entries = await Promise.all(rows.map((r) => bookletEntry(r, photos)));
  const now = new Date();
  const bytes = journalBookletPdf(
    { title: source.title, subtitle: source.subtitle, madeText: `made ${day(now)}`, entries },
    await kitFonts(),
  );
  return { bytes, filename: `journal-${source.slug}-${day(now)}.pdf` };
}
