/**
 * Reads the session cookies of a request and returns who is asking: an account (lucia session, renewed when
 * past half its life, cookie re-sent), else a student class session (token hashed and looked up), else
 * anonymous. A deactivated account's sessions are ended on sight.
 */
import { classSessionClassId } from '../db/classes';
import type { RequestContext } from '../http/request-context';
import type { Actor } from './actor';
import { CLASS_SESSION_COOKIE } from './cookies';
import { lucia } from './lucia.server';
import { userSessionCookieRefresh, userSessionsEndAll } from './session.server';
import { tokenHash } from './tokens.server';

export async function actorResolve(context: Pick<RequestContext, 'cookies'>): Promise<Actor> {
  const sessionId = context.cookies.get(lucia().sessionCookieName)?.value ?? null;
  if (sessionId) {
    const { session, user } = await lucia().validateSession(sessionId);
    if (session && user && user.active && user.emailVerified) {
      if (session.fresh) userSessionCookieRefresh(context, session.id);
      return {
        kind: 'user',
        userId: user.id,
        role: user.role,
        schoolId: user.schoolId,
        email: user.email,
        displayName: user.displayName,
        sessionId: session.id,
      };
    }
    if (user && !user.active) await userSessionsEndAll(user.id);
    userSessionCookieRefresh(context, null);
  }
  const classToken = context.cookies.get(CLASS_SESSION_COOKIE)?.value;
  if (classToken && classToken.length <= 64) {
    const classSessionId = tokenHash(classToken);
    const classId = await classSessionClassId(classSessionId);
    if (classId) return { kind: 'class', classId, classSessionId };
    context.cookies.delete(CLASS_SESSION_COOKIE, { path: '/' });
  }
  return { kind: 'anonymous' };
}
