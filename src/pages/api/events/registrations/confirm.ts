import { siteUrl } from '../../../../lib/auth/site-url';
import { RegistrationTokenSchema } from '../../../../lib/events/event-schemas';
import { registrationConfirm } from '../../../../lib/events/registration.server';
import { endpoint } from '../../../../lib/http/endpoint';
import { readJson } from '../../../../lib/http/respond';
import { parseInput } from '../../../../lib/validation';
import { BODY_BYTES_TOKEN } from '../../../../lib/http/body-limits';

/** Confirms an e-mail registration with the token from its link: a place or the waiting list. */
export const POST = endpoint({ access: ['anyone'] }, async ({ request, url }) => {
  const { token } = parseInput(RegistrationTokenSchema, await readJson(request, BODY_BYTES_TOKEN), 'confirmation');
  return { registration: await registrationConfirm(token, siteUrl(url)) };
});
