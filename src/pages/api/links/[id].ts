import { STAFF } from '../../../lib/auth/actor';
import { actorUser } from '../../../lib/auth/actor-require';
import { auditRecord } from '../../../lib/db/audit';
import { liveLinkById, liveLinkScansByDay, liveLinkUpdate } from '../../../lib/db/live-links';
import { NotFoundError } from '../../../lib/errors';
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { LinkPatchSchema } from '../../../lib/links/link-code';
import { parseInput } from '../../../lib/validation';
import { BODY_BYTES_FORM } from '../../../lib/http/body-limits';

/** One live link with its scans by day (staff). */
export const GET = endpoint({ access: STAFF }, async ({ params }) => {
  const link = await liveLinkById(params.id ?? '');
  if (!link) throw new NotFoundError('No live link has this id.');
  return { link, scansByDay: await liveLinkScansByDay(link.id) };
});

/** Changes a link's title or target, or retires it; the next scan goes to the new target (staff). */
export const PATCH = endpoint({ access: STAFF }, async (context) => {
  const staff = actorUser(context.locals.actor);
  const id = context.params.id ?? '';
  const patch = parseInput(LinkPatchSchema, await readJson(context.request, BODY_BYTES_FORM), 'live link change');
  if (!(await liveLinkUpdate(id, patch))) throw new NotFoundError('No live link has this id.');
  await auditRecord({
    actorId: staff.userId,
    action: 'link.updated',
    targetType: 'live_link',
    targetId: id,
    details: patch,
  });
  return { link: await liveLinkById(id) };
});
