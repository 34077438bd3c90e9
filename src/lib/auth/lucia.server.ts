/**
 * lucia v3 on PostgreSQL (tables users and user_sessions through @lucia-auth/adapter-postgresql, its queries
 * sent through the app's one Knex pool, so sessions take no connections of their own). Sessions last 30 days and slide: validateSession renews one with less than half its time left and
 * reports it as fresh, so the middleware re-sends the cookie. The cookie is HttpOnly, SameSite=Lax, and
 * Secure unless SITE_URL is plain http on loopback.
 */
import { Lucia, TimeSpan } from 'lucia';
import { NodePostgresAdapter } from '@lucia-auth/adapter-postgresql';
import type { Knex } from 'knex';
import type { Pool } from 'pg';
import { db } from '../db/knex';
import type { Role } from './actor';
import { USER_SESSION_COOKIE, USER_SESSION_DAYS, cookieSecure } from './cookies';
import { serverConfig } from '../server-config';

interface DatabaseUserAttributes {
  email: string;
  display_name: string;
  role: Role;
  school_id: string | null;
  email_verified_at: Date | null;
  deactivated_at: Date | null;
}

/**
 * The one method of a pg Pool that NodePostgresAdapter calls, answered on Knex's pool: its `$n` placeholders
 * become Knex's `?`, each with its argument, and Knex's raw answer on pg is pg's own result (with `rows`).
 */
const knexPool = {
  query(sql: string, args: readonly unknown[] = []) {
    const bindings: Knex.RawBinding[] = [];
    const text = sql.replace(/\$(\d+)/g, (_, n: string) => {
      bindings.push(args[Number(n) - 1] as Knex.RawBinding);
      return '?';
    });
    return db().raw(text, bindings);
  },
};

function luciaCreate() {
  // NodePostgresAdapter is typed for a pg Pool but calls only query(sql, args).
  return new Lucia(new NodePostgresAdapter(knexPool as unknown as Pool, { user: 'users', session: 'user_sessions' }), {
    sessionExpiresIn: new TimeSpan(USER_SESSION_DAYS, 'd'),
    sessionCookie: {
      name: USER_SESSION_COOKIE,
      attributes: { secure: cookieSecure(serverConfig('SITE_URL')), sameSite: 'lax' },
    },
    getUserAttributes: (attributes) => ({
      email: attributes.email,
      displayName: attributes.display_name,
      role: attributes.role,
      schoolId: attributes.school_id,
      emailVerified: attributes.email_verified_at !== null,
      active: attributes.deactivated_at === null,
    }),
  });
}

declare module 'lucia' {
  interface Register {
    Lucia: ReturnType<typeof luciaCreate>;
    DatabaseUserAttributes: DatabaseUserAttributes;
  }
}

let instance: ReturnType<typeof luciaCreate> | undefined;

/** The shared lucia instance, created on first use so a build without DATABASE_URL does not fail. */
export function lucia(): ReturnType<typeof luciaCreate> {
  instance ??= luciaCreate();
  return instance;
}
