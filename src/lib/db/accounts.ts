/** Queries on users (accounts of teachers, coordinators and admins). Stores return null for a missing row. */
import type { Knex } from 'knex';
import type { Role } from '../actor';
import { db } from './knex';
import { accountTokensVoid } from './tokens';

export interface AccountRow {
  id: string;
  email: string;
  display_name: string;
  password_hash: string | null;
  role: Role;
  school_id: string | null;
  email_verified_at: Date | null;
  deactivated_at: Date | null;
  created_at: Date;
}

/** An account as the admin list shows it (no password hash). */
export interface AccountSummary {
  id: string;
  email: string;
  displayName: string;
  role: Role;
  schoolId: string | null;
  schoolName: string | null;
  emailVerified: boolean;
  active: boolean;
  createdAt: string;
}

/** The account with this (lower-cased) e-mail, or null. */
export async function accountByEmail(email: string, trx: Knex = db()): Promise<AccountRow | null> {
  return (await trx<AccountRow>('users').where({ email: email.toLowerCase() }).first()) ?? null;
}

/** The account with this id, or null (also for a malformed id). */
export async function accountById(id: string, trx: Knex = db()): Promise<AccountRow | null> {
  if (!isUuid(id)) return null;
  return (await trx<AccountRow>('users').where({ id }).first()) ?? null;
}

/** Inserts an account and returns it; null when the e-mail is already taken. */
export async function accountInsert(
  account: {
    email: string;
    displayName: string;
    passwordHash: string;
    role: Role;
    schoolId: string | null;
    emailVerified: boolean;
  },
  trx: Knex = db(),
): Promise<AccountRow | null> {
  const rows = await trx('users')
    .insert({
      email: account.email.toLowerCase(),
      display_name: account.displayName,
      password_hash: account.passwordHash,
      role: account.role,
      school_id: account.schoolId,
      email_verified_at: account.emailVerified ? trx.fn.now() : null,
    })
    .onConflict('email')
    .ignore()
    .returning('*');
  return (rows[0] as AccountRow | undefined) ?? null;
}

/** Marks the e-mail address verified. */
export async function accountEmailVerify(id: string, trx: Knex = db()): Promise<void> {
  await trx('users').where({ id }).whereNull('email_verified_at').update({ email_verified_at: trx.fn.now() });
}

/** Replaces the password hash and voids every unused password-reset link of the account. */
export async function accountPasswordSet(id: string, passwordHash: string, trx: Knex = db()): Promise<void> {
  await trx.transaction(async (t) => {
    await t('users').where({ id }).update({ password_hash: passwordHash, updated_at: t.fn.now() });
    // A reset link mailed before the change must not undo it (OWASP Forgot Password Cheat Sheet: tokens are
    // single use and expire; a changed password ends what was pending).
    await accountTokensVoid(id, 'reset_password', t);
  });
}

/** Sets the role of an account. */
export async function accountRoleSet(id: string, role: Role, trx: Knex = db()): Promise<void> {
  await trx('users').where({ id }).update({ role, updated_at: trx.fn.now() });
}

/** Deactivates (active false) or reactivates an account. */
export async function accountActiveSet(id: string, active: boolean, trx: Knex = db()): Promise<void> {
  await trx('users')
    .where({ id })
    .update({ deactivated_at: active ? null : trx.fn.now(), updated_at: trx.fn.now() });
}

/** Every account for the admin list, newest first. */
export async function accountList(trx: Knex = db()): Promise<AccountSummary[]> {
  const rows = await trx('users')
    .leftJoin('schools', 'schools.id', 'users.school_id')
    .select(
      'users.id',
      'users.email',
      'users.display_name',
      'users.role',
      'users.school_id',
      'schools.name as school_name',
      'users.email_verified_at',
      'users.deactivated_at',
      'users.created_at',
    )
    .orderBy('users.created_at', 'desc')
    .limit(1000);
  return rows.map((r) => accountSummary(r));
}

/** Maps a users row (joined with its school name) to the public summary. */
export function accountSummary(r: AccountRow & { school_name?: string | null }): AccountSummary {
  return {
    id: r.id,
    email: r.email,
    displayName: r.display_name,
    role: r.role,
    schoolId: r.school_id,
    schoolName: r.school_name ?? null,
    emailVerified: r.email_verified_at !== null,
    active: r.deactivated_at === null,
    createdAt: new Date(r.created_at).toISOString(),
  };
}

/** True for a canonical UUID string (Postgres rejects anything else with an error, not a missing row). */
export function isUuid(value: string): boolean {
  return /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(value);
}
