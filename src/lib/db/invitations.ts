/** Staff invitations (coordinator or admin) sent by an admin: stored hashed, valid 7 days, used once. */
import type { Knex } from 'knex';
import type { Role } from '../actor';
import { db } from './knex';

export const INVITATION_VALID_DAYS = 7;

export interface InvitationRow {
  id: string;
  email: string;
  role: Role;
  invited_by: string | null;
  expires_at: Date;
  accepted_at: Date | null;
  created_at: Date;
}

/** Stores an invitation and returns its id. */
export async function invitationInsert(
  invitation: { email: string; role: Role; tokenHash: string; invitedBy: string },
  trx: Knex = db(),
): Promise<string> {
  const [row] = await trx('invitations')
    .insert({
      email: invitation.email,
      role: invitation.role,
      token_hash: invitation.tokenHash,
      invited_by: invitation.invitedBy,
      expires_at: trx.raw(`now() + make_interval(days => ?)`, [INVITATION_VALID_DAYS]),
    })
    .returning('id');
  return (row as { id: string }).id;
}

/** The open (unused, unexpired) invitation with this token hash, or null. */
export async function invitationOpenByHash(tokenHash: string, trx: Knex = db()): Promise<InvitationRow | null> {
  return (
    ((await trx('invitations')
      .where({ token_hash: tokenHash })
      .whereNull('accepted_at')
      .where('expires_at', '>', trx.fn.now())
      .first()) as InvitationRow | undefined) ?? null
  );
}

/** Marks the invitation accepted, atomically; null when it was already used or has expired. */
export async function invitationAccept(tokenHash: string, trx: Knex = db()): Promise<InvitationRow | null> {
  const rows = await trx('invitations')
    .where({ token_hash: tokenHash })
    .whereNull('accepted_at')
    .where('expires_at', '>', trx.fn.now())
    .update({ accepted_at: trx.fn.now() })
    .returning('*');
  return (rows[0] as InvitationRow | undefined) ?? null;
}

/** Recent invitations for the admin page, newest first. */
export async function invitationList(trx: Knex = db()): Promise<InvitationRow[]> {
  return trx<InvitationRow>('invitations')
    .select('id', 'email', 'role', 'invited_by', 'expires_at', 'accepted_at', 'created_at')
    .orderBy('created_at', 'desc')
    .limit(200);
}
