import { ANY_ACCOUNT } from '../../../lib/auth/actor';
import { actorUser } from '../../../lib/auth/actor-require';
import { passwordHash } from '../../../lib/auth/password';
import { RATE_LIMITS } from '../../../lib/auth/rate-limit-rules';
import { rateLimitEnforce } from '../../../lib/auth/rate-limit.server';
import { PasswordChangeSchema } from '../../../lib/auth/schemas';
import { passwordCheckLocked } from '../../../lib/auth/sign-in-lockout.server';
import { accountPasswordSet } from '../../../lib/db/accounts';
import { auditRecord } from '../../../lib/db/audit';
import { sessionsEndForAccount } from '../../../lib/db/sessions';
import { InputError } from '../../../lib/errors';
import { endpoint } from '../../../lib/http/endpoint';
import { readJson } from '../../../lib/http/respond';
import { parseInput } from '../../../lib/validation';
import { BODY_BYTES_FORM } from '../../../lib/http/body-limits';

/**
 * Changes the password of the signed-in account after checking the current one (under the sign-in lockout: 429
 * while the address is locked); other sessions end.
 */
export const POST = endpoint({ access: ANY_ACCOUNT }, async (context) => {
  const actor = actorUser(context.locals.actor);
  const input = parseInput(PasswordChangeSchema, await readJson(context.request, BODY_BYTES_FORM), 'password change');
  await rateLimitEnforce(RATE_LIMITS.signInAccount, actor.email);
  // Wrong current passwords count toward the sign-in lockout: this is a door to guess a password through, too.
  const check = await passwordCheckLocked(actor.email, input.currentPassword);
  if (!check.ok) {
    const message = 'Your current password is not right.';
    throw new InputError(message, { currentPassword: [message] });
  }
  await accountPasswordSet(actor.userId, await passwordHash(input.newPassword));
  const ended = await sessionsEndForAccount(actor.userId, actor.sessionId);
  await auditRecord({
    actorId: actor.userId,
    action: 'account.password_changed',
    targetType: 'user',
    targetId: actor.userId,
  });
  return { ok: true, sessionsEnded: ended, message: 'Your password is changed; other devices are signed out.' };
});
