import { passwordResetComplete } from '../../../lib/auth/account-flows.server';
import { clientIp } from '../../../lib/auth/client-ip.server';
import { RATE_LIMITS } from '../../../lib/auth/rate-limit-rules';
import { rateLimitEnforce } from '../../../lib/auth/rate-limit.server';
import { ResetPasswordSchema } from '../../../lib/auth/schemas';
import { userSessionStart, userSessionsEndAll } from '../../../lib/auth/session.server';
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';
import { BODY_BYTES_FORM } from '../../../lib/http/body-limits';

/** Sets a new password from a reset link, ends every other session and signs this browser in. */
export const POST = endpoint({ access: ['anyone'] }, async (context) => {
  const input = parseInput(ResetPasswordSchema, await readJson(context.request, BODY_BYTES_FORM), 'new password');
  await rateLimitEnforce(RATE_LIMITS.tokenIp, clientIp(context));
  const account = await passwordResetComplete(input.token, input.password);
  await userSessionsEndAll(account.id);
  await userSessionStart(context, account.id);
  return { ok: true, message: 'Your new password is set and every other session has been signed out.' };
});
