import { accountSignUp } from '../../../lib/auth/account-flows.server';
import { clientIp } from '../../../lib/auth/client-ip.server';
import { RATE_LIMITS } from '../../../lib/auth/rate-limit-rules';
import { rateLimitEnforce } from '../../../lib/auth/rate-limit.server';
import { SignUpSchema } from '../../../lib/auth/schemas';
import { siteUrl } from '../../../lib/auth/site-url';
import { endpoint } from '../../../lib/http/endpoint';
import { json, readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';
import { BODY_BYTES_LONG_FORM } from '../../../lib/http/body-limits';

/** Teacher sign-up: always the same 202 answer, so it does not reveal whether an address has an account. */
export const POST = endpoint({ access: ['anyone'] }, async (context) => {
  const input = parseInput(SignUpSchema, await readJson(context.request, BODY_BYTES_LONG_FORM), 'sign-up');
  await rateLimitEnforce(RATE_LIMITS.signUpIp, clientIp(context));
  await rateLimitEnforce(RATE_LIMITS.signUpEmail, input.email);
  await accountSignUp(input, { siteUrl: siteUrl(context.url), requestId: context.locals.requestId });
  return json(
    {
      ok: true,
      message: `We sent a link to ${input.email}. Open it to confirm your address, then sign in.`,
    },
    202,
  );
});
