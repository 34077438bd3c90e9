import { STAFF, actorAdmitted } from '../../../lib/auth/actor';
import { schoolListAll, schoolOptions } from '../../../lib/db/schools';
import { endpoint } from '../../../lib/http/endpoint';

/**
 * Schools: approved schools by name and city for anyone (the sign-up list); every school with its status and
 * reach fields for coordinators and admins. New schools are proposed through sign-up.
 */
export const GET = endpoint({ access: ['anyone'] }, async ({ locals }) => {
  if (actorAdmitted(locals.actor, STAFF)) return { schools: await schoolListAll() };
  return { schools: await schoolOptions() };
});
