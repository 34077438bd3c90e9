import { siteUrl } from '../../../../lib/auth/site-url';
import { RegistrationTokenSchema } from '../../../../lib/events/event-schemas';
import { registrationCancel } from '../../../../lib/events/registration.server';
import { endpoint } from '../../../../lib/http/endpoint';
import { readJson } from '../../../../lib/http/respond';
import { parseInput } from '../../../../lib/validation';
import { BODY_BYTES_TOKEN } from '../../../../lib/http/body-limits';

/** Cancels a registration with the token from its mails; a freed place goes to the waiting list. */
export const POST = endpoint({ access: ['anyone'] }, async ({ request, url }) => {
  const { token } = parseInput(RegistrationTokenSchema, await readJson(request, BODY_BYTES_TOKEN), 'cancellation');
  return { registration: await registrationCancel(token, siteUrl(url)) };
});
