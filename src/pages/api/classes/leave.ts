import { classSessionEnd } from '../../../lib/auth/session.server';
import { isFormPost } from '../../../lib/auth/site-url';
import { endpoint } from '../../../lib/http/endpoint';

/** Ends this device's class session (open to anyone, so a stale page's button still works). */
export const POST = endpoint({ access: ['anyone'] }, async (context) => {
  await classSessionEnd(context);
  if (isFormPost(context.request)) return context.redirect('/join?left=1', 303);
  return { ok: true };
});
