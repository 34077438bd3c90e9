import { emailVerify } from '../../../lib/auth/account-flows.server';
import { clientIp } from '../../../lib/auth/client-ip.server';
import { RATE_LIMITS } from '../../../lib/auth/rate-limit-rules';
import { rateLimitEnforce } from '../../../lib/auth/rate-limit.server';
import { VerifyEmailSchema } from '../../../lib/auth/schemas';
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';
import { BODY_BYTES_FORM } from '../../../lib/http/body-limits';

/** Uses the one-time link of a verification mail; the page posts it so link scanners cannot use it up. */
export const POST = endpoint({ access: ['anyone'] }, async (context) => {
  const input = parseInput(VerifyEmailSchema, await readJson(context.request, BODY_BYTES_FORM), 'verification');
  await rateLimitEnforce(RATE_LIMITS.tokenIp, clientIp(context));
  const account = await emailVerify(input.token);
  return { ok: true, email: account.email, message: 'Your address is confirmed. You can sign in now.' };
});
