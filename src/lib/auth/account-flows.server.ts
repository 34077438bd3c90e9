/**
 * The account flows behind the /api/auth routes: sign-up with e-mail verification, password reset and
 * change, and accepting a staff invitation. Each one-time link carries a random token whose SHA-256 alone is
 * stored; every act is written to the audit log.
 */
import type { z } from 'zod';
import { db } from '../db/knex';
import {
  accountByEmail,
  accountById,
  accountEmailVerify,
  accountInsert,
  accountPasswordSet,
  type AccountRow,
} from '../db/accounts';
import { auditRecord } from '../db/audit';
import { invitationAccept } from '../db/invitations';
import { schoolApprovedById, schoolPropose } from '../db/schools';
import { accountTokenConsume, accountTokenInsert, accountTokensVoid } from '../db/tokens';
import { ConflictError, InputError } from '../errors';
import { resetPasswordMessage, siteLink, signUpExistingMessage, verifyEmailMessage } from '../mail/account-messages';
import { mailSendLater } from '../mail/transport.server';
import { passwordHash } from './password';
import type { InvitationAcceptSchema, SignUp } from './schemas';
import { signInLockEnd } from './sign-in-lockout.server';
import { tokenHash, tokenNew } from './tokens.server';

/** A verification link works for 48 hours (common practice, no source). */
export const VERIFY_EMAIL_VALID_HOURS = 48;
/** A reset link works for one hour (issue 3; OWASP Forgot Password Cheat Sheet asks for a short lifetime). */
export const RESET_PASSWORD_VALID_SECONDS = 3600;

export interface FlowContext {
  siteUrl: string;
  requestId: string;
}

/** Sends a fresh verification link to an account (older unused links stop working). */
export async function verificationSend(account: AccountRow, ctx: FlowContext): Promise<void> {
  const { token, hash } = tokenNew();
  await accountTokensVoid(account.id, 'verify_email');
  await accountTokenInsert(account.id, 'verify_email', hash, VERIFY_EMAIL_VALID_HOURS * 3600);
  mailSendLater(
    verifyEmailMessage({
      to: account.email,
      displayName: account.display_name,
      link: siteLink(ctx.siteUrl, '/verify-email', token),
      validHours: VERIFY_EMAIL_VALID_HOURS,
    }),
    ctx.requestId,
  );
}

/**
 * Creates a teacher account (unverified) and mails the verification link. A taken address gets a notice
 * mail instead and the caller the same answer, so sign-up does not reveal who has an account.
 */
export async function accountSignUp(input: SignUp, ctx: FlowContext): Promise<void> {
  // Hash first on both paths so a taken address does not answer faster.
  const hash = await passwordHash(input.password);
  const existing = await accountByEmail(input.email);
  if (existing) {
    mailSendLater(
      signUpExistingMessage({
        to: existing.email,
        signInUrl: new URL('/sign-in', ctx.siteUrl).toString(),
        resetUrl: new URL('/forgot-password', ctx.siteUrl).toString(),
      }),
      ctx.requestId,
    );
    return;
  }
  if (input.schoolChoice === 'existing' && !(await schoolApprovedById(input.schoolId ?? ''))) {
    throw new InputError('That school is not in the list; pick one from the list or propose it.', {
      schoolId: ['Pick your school from the list, or propose a new one.'],
    });
  }
  const account = await db().transaction(async (trx) => {
    let schoolId = input.schoolId || null;
    let proposed = false;
    if (input.schoolChoice === 'proposed') {
      const school = await schoolPropose(input.proposedSchoolName ?? '', input.proposedSchoolCity ?? '', trx);
      schoolId = school.id;
      proposed = school.created;
    }
    const row = await accountInsert(
      {
        email: input.email,
        displayName: input.displayName,
        passwordHash: hash,
        role: 'teacher',
        schoolId,
        emailVerified: false,
      },
      trx,
    );
    if (!row) return null;
    await auditRecord({ actorId: row.id, action: 'account.signed_up', targetType: 'user', targetId: row.id }, trx);
    if (proposed && schoolId) {
      await auditRecord(
        {
          actorId: row.id,
          action: 'school.proposed',
          targetType: 'school',
          targetId: schoolId,
          details: { name: input.proposedSchoolName, city: input.proposedSchoolCity },
        },
        trx,
      );
    }
    return row;
  });
  if (account) await verificationSend(account, ctx);
}

const USED_LINK = 'This link has been used or has expired. Ask for a new one and open the newest e-mail.';

/** Uses a verification token; throws InputError on a used, expired or unknown token. */
export async function emailVerify(token: string): Promise<AccountRow> {
  const userId = await accountTokenConsume('verify_email', tokenHash(token));
  const account = userId ? await accountById(userId) : null;
  if (!account) throw new InputError(USED_LINK, { token: [USED_LINK] });
  await accountEmailVerify(account.id);
  await auditRecord({
    actorId: account.id,
    action: 'account.email_verified',
    targetType: 'user',
    targetId: account.id,
  });
  return account;
}

/** Mails a reset link when an active account has this address; silent otherwise. */
export async function passwordResetRequest(email: string, ctx: FlowContext): Promise<void> {
  const account = await accountByEmail(email);
  if (!account || account.deactivated_at) return;
  const { token, hash } = tokenNew();
  await accountTokensVoid(account.id, 'reset_password');
  await accountTokenInsert(account.id, 'reset_password', hash, RESET_PASSWORD_VALID_SECONDS);
  mailSendLater(
    resetPasswordMessage({
      to: account.email,
      displayName: account.display_name,
      link: siteLink(ctx.siteUrl, '/reset-password', token),
    }),
    ctx.requestId,
  );
}

/**
 * Uses a reset token: sets the new password, marks the address verified (the mail reached it), ends any
 * sign-in lock (the mail proved the owner) and returns the account; the caller ends every session and opens a
 * new one.
 */
export async function passwordResetComplete(token: string, password: string): Promise<AccountRow> {
  const hash = await passwordHash(password);
  const userId = await accountTokenConsume('reset_password', tokenHash(token));
  const account = userId ? await accountById(userId) : null;
  if (!account || account.deactivated_at) throw new InputError(USED_LINK, { token: [USED_LINK] });
  await accountPasswordSet(account.id, hash);
  await accountEmailVerify(account.id);
  await signInLockEnd(account.email);
  await auditRecord({
    actorId: account.id,
    action: 'account.password_reset',
    targetType: 'user',
    targetId: account.id,
  });
  return account;
}

/** Accepts an invitation: creates the verified account with the invited role and returns it. */
export async function invitationComplete(input: z.infer<typeof InvitationAcceptSchema>): Promise<AccountRow> {
  const hash = await passwordHash(input.password);
  return db().transaction(async (trx) => {
    const invitation = await invitationAccept(tokenHash(input.token), trx);
    if (!invitation) {
      const message = 'This invitation has been used or has expired (they last 7 days). Ask an admin for a new one.';
      throw new InputError(message, { token: [message] });
    }
    const account = await accountInsert(
      {
        email: invitation.email,
        displayName: input.displayName,
        passwordHash: hash,
        role: invitation.role,
        schoolId: null,
        emailVerified: true,
      },
      trx,
    );
    if (!account) throw new ConflictError(`${invitation.email} already has an account; sign in instead.`);
    await auditRecord(
      {
        actorId: account.id,
        action: 'invitation.accepted',
        targetType: 'invitation',
        targetId: invitation.id,
        details: { role: invitation.role, invitedBy: invitation.invited_by },
      },
      trx,
    );
    return account;
  });
}
