import { actorUser } from '../../../lib/auth/actor-require';
import { ANY_ACCOUNT } from '../../../lib/auth/actor';
import { userSessionCookieRefresh, userSessionsEndAll } from '../../../lib/auth/session.server';
import { isFormPost } from '../../../lib/auth/site-url';
import { auditRecord } from '../../../lib/db/audit';
import { endpoint } from '../../../lib/http/endpoint';

/** Ends every session of the signed-in account, this one included (account page). */
export const POST = endpoint({ access: ANY_ACCOUNT }, async (context) => {
  const actor = actorUser(context.locals.actor);
  await userSessionsEndAll(actor.userId);
  userSessionCookieRefresh(context, null);
  await auditRecord({
    actorId: actor.userId,
    action: 'account.sessions_ended',
    targetType: 'user',
    targetId: actor.userId,
  });
  if (isFormPost(context.request)) return context.redirect('/sign-in?signedOut=everywhere', 303);
  return { ok: true };
});
