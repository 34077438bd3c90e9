import { verificationSend } from '../../../lib/auth/account-flows.server';
import { actorPublic } from '../../../lib/auth/actor-require';
import { clientIp } from '../../../lib/auth/client-ip.server';
import { housekeepingMaybe } from '../../../lib/auth/housekeeping.server';
import { RATE_LIMITS } from '../../../lib/auth/rate-limit-rules';
import { rateLimitEnforce, rateLimitReset } from '../../../lib/auth/rate-limit.server';
import { SignInSchema } from '../../../lib/auth/schemas';
import { passwordCheckLocked } from '../../../lib/auth/sign-in-lockout.server';
import { userSessionStart } from '../../../lib/auth/session.server';
import { signInWarm } from '../../../lib/auth/sign-in.server';
import { siteUrl } from '../../../lib/auth/site-url';
import { AuthenticationError, ForbiddenError } from '../../../lib/errors';
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';
import { BODY_BYTES_LONG_FORM } from '../../../lib/http/body-limits';

signInWarm();

const WRONG = 'That e-mail and password do not match an account. Check both, or reset your password.';

/**
 * Signs in with e-mail and password; unknown e-mail and wrong password get the same 401 in about the same time.
 * Wrong passwords in a row lock the address for longer each time (src/lib/auth/sign-in-lockout.ts): 429.
 */
export const POST = endpoint({ access: ['anyone'] }, async (context) => {
  const input = parseInput(SignInSchema, await readJson(context.request, BODY_BYTES_LONG_FORM), 'sign-in');
  await rateLimitEnforce(RATE_LIMITS.signInIp, clientIp(context));
  await rateLimitEnforce(RATE_LIMITS.signInAccount, input.email);
  const check = await passwordCheckLocked(input.email, input.password);
  if (!check.ok) {
    if (check.reason === 'credentials') throw new AuthenticationError(WRONG);
    if (check.reason === 'deactivated') {
      throw new ForbiddenError('This account has been deactivated. Ask an admin of your outreach office.');
    }
    await verificationSend(check.account, { siteUrl: siteUrl(context.url), requestId: context.locals.requestId });
    throw new ForbiddenError(`Confirm your e-mail address first: we have sent a new link to ${check.account.email}.`);
  }
  await rateLimitReset(RATE_LIMITS.signInAccount, input.email);
  housekeepingMaybe(context.locals.requestId);
  await userSessionStart(context, check.account.id);
  return {
    ok: true,
    actor: actorPublic({
      kind: 'user',
      userId: check.account.id,
      role: check.account.role,
      schoolId: check.account.school_id,
      email: check.account.email,
      displayName: check.account.display_name,
      sessionId: '',
    }),
  };
});
