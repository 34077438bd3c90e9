import { classSessionEnd, userSessionEnd } from '../../../lib/auth/session.server';
import { isFormPost } from '../../../lib/auth/site-url';
import { endpoint } from '../../../lib/http/endpoint';

/**
 * Ends this browser's account session. Open to anyone, so a stale page's sign-out button still works; the
 * header posts it as a plain form (answered with a redirect home), islands as fetch (answered with JSON).
 */
export const POST = endpoint({ access: ['anyone'] }, async (context) => {
  const actor = context.locals.actor;
  if (actor.kind === 'user') await userSessionEnd(context, actor.sessionId);
  await classSessionEnd(context);
  if (isFormPost(context.request)) return context.redirect('/', 303);
  return { ok: true };
});
