/**
 * What an admin does to accounts: invite a coordinator or admin, change a role, deactivate or reactivate.
 * Every act goes to the audit log; deactivation ends every session of the account at once.
 */
import type { z } from 'zod';
import { accountByEmail, accountById, accountActiveSet, accountRoleSet, accountSummary } from '../db/accounts';
import { auditRecord } from '../db/audit';
import { INVITATION_VALID_DAYS, invitationInsert } from '../db/invitations';
import { ConflictError, ForbiddenError, NotFoundError } from '../errors';
import { invitationMessage, siteLink } from '../mail/account-messages';
import { mailSend } from '../mail/transport.server';
import type { Actor } from './actor';
import type { AccountUpdateSchema, InvitationCreateSchema } from './schemas';
import { userSessionsEndAll } from './session.server';
import { tokenNew } from './tokens.server';

type Admin = Extract<Actor, { kind: 'user' }>;

export const ROLE_LABELS = { teacher: 'a teacher', coordinator: 'an outreach coordinator', admin: 'an admin' } as const;

/** Applies a role change and/or (de)activation to another account; returns the updated summary. */
export async function accountUpdateByAdmin(admin: Admin, id: string, change: z.infer<typeof AccountUpdateSchema>) {
  const account = await accountById(id);
  if (!account) throw new NotFoundError('There is no account with that id.');
  if (account.id === admin.userId) {
    throw new ForbiddenError('You cannot change your own role or deactivate yourself; ask another admin.');
  }
  if (change.role && change.role !== account.role) {
    await accountRoleSet(account.id, change.role);
    await auditRecord({
      actorId: admin.userId,
      action: 'account.role_changed',
      targetType: 'user',
      targetId: account.id,
      details: { from: account.role, to: change.role },
    });
  }
  const isActive = account.deactivated_at === null;
  if (change.active !== undefined && change.active !== isActive) {
    await accountActiveSet(account.id, change.active);
    if (!change.active) await userSessionsEndAll(account.id);
    await auditRecord({
      actorId: admin.userId,
      action: change.active ? 'account.reactivated' : 'account.deactivated',
      targetType: 'user',
      targetId: account.id,
    });
  }
  const updated = await accountById(account.id);
  return accountSummary(updated!);
}

/** Sends a one-time invitation link (7 days) for a coordinator or admin account. */
export async function invitationSend(
  admin: Admin,
  input: z.infer<typeof InvitationCreateSchema>,
  site: string,
): Promise<{ id: string; email: string; role: string; validDays: number }> {
  if (await accountByEmail(input.email)) {
    throw new ConflictError(`${input.email} already has an account; change its role on the accounts page instead.`, {
      email: ['This address already has an account.'],
    });
  }
  const { token, hash } = tokenNew();
  const id = await invitationInsert({ email: input.email, role: input.role, tokenHash: hash, invitedBy: admin.userId });
  await auditRecord({
    actorId: admin.userId,
    action: 'invitation.sent',
    targetType: 'invitation',
    targetId: id,
    details: { email: input.email, role: input.role },
  });
  await mailSend(
    invitationMessage({
      to: input.email,
      roleLabel: ROLE_LABELS[input.role],
      inviterName: admin.displayName,
      link: siteLink(site, '/invitation', token),
      validDays: INVITATION_VALID_DAYS,
    }),
  );
  return { id, email: input.email, role: input.role, validDays: INVITATION_VALID_DAYS };
}
