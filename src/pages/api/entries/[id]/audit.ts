import { auditList } from '../../../../lib/db/audit';
import { endpoint } from '../../../../lib/http/endpoint';
import { entryForActor, entryIsOwnClass, actorReviews } from '../../../../lib/journal/entry-access.server';
import { NotFoundError } from '../../../../lib/errors';

/** An entry's history (who moved it from which state to which, when): its teacher and reviewers. */
export const GET = endpoint({ access: ['teacher', 'coordinator', 'admin'] }, async ({ locals, params }) => {
  const entry = await entryForActor(locals.actor, params.id ?? '');
  if (!entryIsOwnClass(locals.actor, entry) && !actorReviews(locals.actor))
    throw new NotFoundError('There is no journal entry with that id among the entries you can open.');
  const events = await auditList({ targetId: entry.id });
  return {
    events: events.map((e) => ({
      action: e.action,
      actorEmail: e.actorEmail,
      from: e.details.from ?? null,
      to: e.details.to ?? null,
      note: e.details.note ?? null,
      at: e.createdAt,
    })),
  };
});
