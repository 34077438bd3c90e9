/**
 * Test helpers for accounts and sessions: accounts made straight in the test database (unique e-mails, so
 * reruns and parallel files never collide), sessions opened by inserting rows the way lucia and the class
 * session store do (no sign-in round trip, so rate limits stay untouched), and mail read from the SMTP fake.
 */
import { createHash, randomBytes } from 'node:crypto';
import type { Knex } from 'knex';
import { passwordHash } from '../../src/lib/auth/password';
import { CLASS_SESSION_COOKIE, USER_SESSION_COOKIE } from '../../src/lib/auth/cookies';
import type { Role } from '../../src/lib/auth/actor';
import { MAIL_URL } from './harness';

export interface TestAccount {
  id: string;
  email: string;
  password: string;
  role: Role;
  schoolId: string | null;
}

/** A unique address under example.org for this run. */
export function emailUnique(label: string): string {
  return `${label}-${Date.now().toString(36)}-${randomBytes(3).toString('hex')}@example.org`;
}

/** The id of a seeded school by name. */
export async function schoolIdByName(knex: Knex, name: string): Promise<string> {
  const row = await knex('schools').where({ name }).first('id');
  if (!row) throw new Error(`seeded school "${name}" is missing`);
  return row.id as string;
}

let hashCache: Promise<string> | undefined;
export const TEST_PASSWORD = 'correct horse battery staple 42';

/** Inserts a verified, active account with TEST_PASSWORD. */
export async function accountCreate(
  knex: Knex,
  o: { role: Role; label?: string; schoolId?: string | null; verified?: boolean },
): Promise<TestAccount> {
  hashCache ??= passwordHash(TEST_PASSWORD);
  const email = emailUnique(o.label ?? o.role);
  const [row] = await knex('users')
    .insert({
      email,
      display_name: `Test ${o.role}`,
      role: o.role,
      password_hash: await hashCache,
      school_id: o.schoolId ?? null,
      email_verified_at: o.verified === false ? null : knex.fn.now(),
    })
    .returning(['id']);
  return { id: row.id, email, password: TEST_PASSWORD, role: o.role, schoolId: o.schoolId ?? null };
}

/** Opens a lucia session row for the account and returns the Cookie header value. */
export async function userSessionCookie(knex: Knex, userId: string): Promise<string> {
  const id = randomBytes(20).toString('hex');
  await knex('user_sessions').insert({ id, user_id: userId, expires_at: new Date(Date.now() + 30 * 86_400_000) });
  return `${USER_SESSION_COOKIE}=${id}`;
}

/** Opens a class session row for the class and returns the Cookie header value. */
export async function classSessionCookie(knex: Knex, classId: string): Promise<string> {
  const token = randomBytes(32).toString('base64url');
  const id = createHash('sha256').update(token).digest('hex');
  await knex('class_sessions').insert({ id, class_id: classId, expires_at: new Date(Date.now() + 8 * 3_600_000) });
  return `${CLASS_SESSION_COOKIE}=${token}`;
}

/** Inserts a class for a teacher with a unique code and returns its id and code. */
export async function classCreateDirect(knex: Knex, teacher: TestAccount, name = 'Test class') {
  const code = randomBytes(6)
    .toString('hex')
    .slice(0, 8)
    .toUpperCase()
    .replace(/[01IOL]/g, 'Z');
  const [row] = await knex('classes')
    .insert({
      teacher_id: teacher.id,
      school_id: teacher.schoolId,
      name,
      grade_band: '6-8',
      student_count: 20,
      join_code: code,
    })
    .returning(['id']);
  return { id: row.id as string, code };
}

/** The name=value pairs of a response's Set-Cookie headers joined for a Cookie header. */
export function cookiesFrom(res: Response): string {
  return res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
}

export interface Mail {
  to: string[];
  subject: string;
  text: string;
  html: string;
}

/** Waits (up to 10 s) until `count` mails to the address match the subject, and returns the newest. */
export async function mailWait(to: string, subject: RegExp, count = 1): Promise<Mail> {
  const deadline = Date.now() + 10_000;
  for (;;) {
    const res = await fetch(`${MAIL_URL}/messages?to=${encodeURIComponent(to)}`);
    const messages = (await res.json()) as Mail[];
    const matching = messages.filter((m) => subject.test(m.subject));
    if (matching.length >= count) return matching.at(-1)!;
    if (Date.now() > deadline) throw new Error(`no mail to ${to} matching ${subject} within 10 s`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** The first link in a mail's text part that contains the path. */
export function linkIn(mail: Mail, path: string): URL {
  const match = mail.text.match(new RegExp(`https?://\\S*${path.replace(/[/?]/g, '\\$&')}\\S*`));
  if (!match) throw new Error(`no ${path} link in mail "${mail.subject}"`);
  return new URL(match[0]);
}
