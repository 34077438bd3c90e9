import { invitationSend } from '../../../lib/auth/account-admin.server';
import { actorUser } from '../../../lib/auth/actor-require';
import { InvitationCreateSchema } from '../../../lib/auth/schemas';
import { siteUrl } from '../../../lib/auth/site-url';
import { invitationList } from '../../../lib/db/invitations';
import { endpoint } from '../../../lib/http/endpoint';
import { json, readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';
import { BODY_BYTES_FORM } from '../../../lib/http/body-limits';

/** Recent invitations with their state (admins). */
export const GET = endpoint({ access: ['admin'] }, async () => {
  const rows = await invitationList();
  return {
    invitations: rows.map((r) => ({
      id: r.id,
      email: r.email,
      role: r.role,
      createdAt: new Date(r.created_at).toISOString(),
      expiresAt: new Date(r.expires_at).toISOString(),
      state: r.accepted_at ? 'accepted' : new Date(r.expires_at) < new Date() ? 'expired' : 'open',
    })),
  };
});

/** Invites a coordinator or admin by e-mail with a one-time link valid 7 days (admins). */
export const POST = endpoint({ access: ['admin'] }, async (context) => {
  const admin = actorUser(context.locals.actor);
  const input = parseInput(InvitationCreateSchema, await readJson(context.request, BODY_BYTES_FORM), 'invitation');
  return json({ invitation: await invitationSend(admin, input, siteUrl(context.url)) }, 201);
});
