import { STAFF } from '../../../lib/auth/actor';
import { actorUser } from '../../../lib/auth/actor-require';
import { auditRecord } from '../../../lib/db/audit';
import { liveLinkInsert, liveLinkList } from '../../../lib/db/live-links';
import { endpoint } from '../../../lib/http/endpoint';
import { json, readJson } from '../../../lib/http/respond';
import { LinkCreateSchema } from '../../../lib/links/link-code';
import { parseInput } from '../../../lib/validation';
import { BODY_BYTES_FORM } from '../../../lib/http/body-limits';

/** Every live link with its total scans (staff). */
export const GET = endpoint({ access: STAFF }, async () => ({ links: await liveLinkList() }));

/** Creates a live link with a fresh code (staff). */
export const POST = endpoint({ access: STAFF }, async (context) => {
  const staff = actorUser(context.locals.actor);
  const input = parseInput(LinkCreateSchema, await readJson(context.request, BODY_BYTES_FORM), 'live link');
  const link = await liveLinkInsert({ title: input.title, target: input.target, createdBy: staff.userId });
  await auditRecord({
    actorId: staff.userId,
    action: 'link.created',
    targetType: 'live_link',
    targetId: link.id,
    details: input,
  });
  return json({ link }, 201);
});
