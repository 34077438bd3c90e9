/**
 * lucia v3 on PostgreSQL (tables users and user_sessions through @lucia-auth/adapter-postgresql on its own pg
 * Pool). Sessions last 30 days and slide: validateSession renews one with less than half its time left and
 * reports it as fresh, so the middleware re-sends the cookie. The cookie is HttpOnly, SameSite=Lax, and
 * Secure unless SITE_URL is plain http on loopback.
 */
import { Lucia, TimeSpan } from 'lucia';
import { NodePostgresAdapter } from '@lucia-auth/adapter-postgresql';
import pg from 'pg';
import type { Role } from './actor';
import { USER_SESSION_COOKIE, USER_SESSION_DAYS, cookieSecure } from './cookies';

interface DatabaseUserAttributes {
  email: string;
  display_name: string;
  role: Role;
  school_id: string | null;
  email_verified_at: Date | null;
  deactivated_at: Date | null;
}

function luciaCreate(pool: pg.Pool) {
  return new Lucia(new NodePostgresAdapter(pool, { user: 'users', session: 'user_sessions' }), {
    sessionExpiresIn: new TimeSpan(USER_SESSION_DAYS, 'd'),
    sessionCookie: {
      name: USER_SESSION_COOKIE,
      attributes: { secure: cookieSecure(process.env.SITE_URL), sameSite: 'lax' },
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
  if (!instance) {
    const url = process.env.DATABASE_URL;
    if (!url) throw new Error('DATABASE_URL is not set; start the app with `npm start` or `npm run dev`.');
    instance = luciaCreate(new pg.Pool({ connectionString: url, max: Number(process.env.DATABASE_POOL_MAX ?? 10) }));
  }
  return instance;
}
