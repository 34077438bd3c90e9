import { passwordResetRequest } from '../../../lib/auth/account-flows.server';
import { clientIp } from '../../../lib/auth/client-ip.server';
import { RATE_LIMITS } from '../../../lib/auth/rate-limit-rules';
import { rateLimitEnforce } from '../../../lib/auth/rate-limit.server';
import { ForgotPasswordSchema } from '../../../lib/auth/schemas';
import { siteUrl } from '../../../lib/auth/site-url';
import { endpoint } from '../../../lib/http/endpoint';
import { json, readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';
import { BODY_BYTES_FORM } from '../../../lib/http/body-limits';

/** Asks for a reset link; the same 202 whether or not the address has an account. */
export const POST = endpoint({ access: ['anyone'] }, async (context) => {
  const input = parseInput(ForgotPasswordSchema, await readJson(context.request, BODY_BYTES_FORM), 'reset request');
  await rateLimitEnforce(RATE_LIMITS.resetIp, clientIp(context));
  await rateLimitEnforce(RATE_LIMITS.resetEmail, input.email);
  await passwordResetRequest(input.email, { siteUrl: siteUrl(context.url), requestId: context.locals.requestId });
  return json(
    {
      ok: true,
      message: `If ${input.email} has an account, a link to choose a new password is on its way. It works for one hour.`,
    },
    202,
  );
});
