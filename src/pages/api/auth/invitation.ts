import { invitationComplete } from '../../../lib/auth/account-flows.server';
import { clientIp } from '../../../lib/auth/client-ip.server';
import { RATE_LIMITS } from '../../../lib/auth/rate-limit-rules';
import { rateLimitEnforce } from '../../../lib/auth/rate-limit.server';
import { InvitationAcceptSchema } from '../../../lib/auth/schemas';
import { userSessionStart } from '../../../lib/auth/session.server';
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';
import { BODY_BYTES_FORM } from '../../../lib/http/body-limits';

/** Accepts a staff invitation: creates the account with the invited role and signs it in. */
export const POST = endpoint({ access: ['anyone'] }, async (context) => {
  const input = parseInput(InvitationAcceptSchema, await readJson(context.request, BODY_BYTES_FORM), 'invitation');
  await rateLimitEnforce(RATE_LIMITS.tokenIp, clientIp(context));
  const account = await invitationComplete(input);
  await userSessionStart(context, account.id);
  return { ok: true, role: account.role, message: 'Welcome to Kitwright. Your account is ready.' };
});
