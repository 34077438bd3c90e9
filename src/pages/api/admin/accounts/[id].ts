import { accountUpdateByAdmin } from '../../../../lib/auth/account-admin.server';
import { actorUser } from '../../../../lib/auth/actor-require';
import { AccountUpdateSchema } from '../../../../lib/auth/schemas';
import { endpoint } from '../../../../lib/http/endpoint';
import { readJson } from '../../../../lib/http/respond';
import { parseInput } from '../../../../lib/validation';
import { BODY_BYTES_FORM } from '../../../../lib/http/body-limits';

/** Changes an account's role or deactivates / reactivates it (admins; not their own account). */
export const PATCH = endpoint({ access: ['admin'] }, async (context) => {
  const admin = actorUser(context.locals.actor);
  const input = parseInput(AccountUpdateSchema, await readJson(context.request, BODY_BYTES_FORM), 'account change');
  return { account: await accountUpdateByAdmin(admin, context.params.id ?? '', input) };
});
