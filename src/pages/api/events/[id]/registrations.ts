import { STAFF } from '../../../../lib/auth/actor';
import { clientIp } from '../../../../lib/auth/client-ip.server';
import { RATE_LIMITS } from '../../../../lib/auth/rate-limit-rules';
import { rateLimitEnforce } from '../../../../lib/auth/rate-limit.server';
import { siteUrl } from '../../../../lib/auth/site-url';
import { registrationList } from '../../../../lib/db/events';
import { eventVisible } from '../../../../lib/events/event-access.server';
import { RegistrationCreateSchema } from '../../../../lib/events/event-schemas';
import { registrationCreateByEmail, registrationCreateForTeacher } from '../../../../lib/events/registration.server';
import { endpoint } from '../../../../lib/http/endpoint';
import { json, readJson } from '../../../../lib/http/respond';
import { parseInput } from '../../../../lib/validation';
import { BODY_BYTES_FORM } from '../../../../lib/http/body-limits';

/** The event's registrations (staff). */
export const GET = endpoint({ access: STAFF }, async ({ locals, params }) => {
  const event = await eventVisible(locals.actor, params.id ?? '');
  return { registrations: await registrationList(event.id) };
});

/**
 * Registers for a published event: a signed-in teacher as themselves (no body needed); anyone else with a name
 * and school e-mail, confirmed by a mailed link. 201 with the state: confirmed, waitlisted or pending. Those
 * without an account are rate-limited per address and per e-mail (429 + Retry-After): each one sends a mail.
 */
export const POST = endpoint({ access: ['anyone'] }, async (context) => {
  const { locals, params, request, url } = context;
  const site = siteUrl(url);
  const actor = locals.actor;
  if (actor.kind === 'user' && actor.role === 'teacher') {
    return json({ registration: await registrationCreateForTeacher(params.id ?? '', actor, site) }, 201);
  }
  await rateLimitEnforce(RATE_LIMITS.eventRegistrationIp, clientIp(context));
  const input = parseInput(RegistrationCreateSchema, await readJson(request, BODY_BYTES_FORM), 'registration');
  await rateLimitEnforce(RATE_LIMITS.eventRegistrationEmail, input.email);
  return json({ registration: await registrationCreateByEmail(params.id ?? '', input, site) }, 201);
});
