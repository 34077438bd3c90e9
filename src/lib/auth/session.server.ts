/**
 * Starting and ending the two kinds of session on a request: lucia sessions of accounts and class sessions of
 * student devices. Cookies are HttpOnly, SameSite=Lax, Secure outside local development, path "/".
 */
import type { AstroCookieSetOptions } from 'astro';
import type { RequestContext } from '../http/request-context';
import { accountSignInDayRecord } from '../db/account-sign-in-days';
import { classSessionDelete, classSessionInsert } from '../db/classes';
import { CLASS_SESSION_COOKIE, CLASS_SESSION_HOURS, cookieSecure } from './cookies';
import { lucia } from './lucia.server';
import { tokenHash, tokenNew } from './tokens.server';
import { serverConfig } from '../server-config';

type CookieContext = Pick<RequestContext, 'cookies'>;

function luciaCookieSet(context: CookieContext, cookie: { name: string; value: string; attributes: object }) {
  context.cookies.set(cookie.name, cookie.value, cookie.attributes as AstroCookieSetOptions);
}

/** Opens a lucia session for the account, notes the day for reach, sets its cookie; returns the session id. */
export async function userSessionStart(context: CookieContext, userId: string): Promise<string> {
  const session = await lucia().createSession(userId, {});
  await accountSignInDayRecord(userId);
  luciaCookieSet(context, lucia().createSessionCookie(session.id));
  return session.id;
}

/** Ends the given lucia session and blanks the cookie. */
export async function userSessionEnd(context: CookieContext, sessionId: string): Promise<void> {
  await lucia().invalidateSession(sessionId);
  luciaCookieSet(context, lucia().createBlankSessionCookie());
}

/** Ends every lucia session of the account (deactivation, password reset, sign-out everywhere). */
export async function userSessionsEndAll(userId: string): Promise<void> {
  await lucia().invalidateUserSessions(userId);
}

/** Sets (or refreshes) the account cookie after validation; blanks it when the session is gone. */
export function userSessionCookieRefresh(context: CookieContext, sessionId: string | null): void {
  luciaCookieSet(context, sessionId ? lucia().createSessionCookie(sessionId) : lucia().createBlankSessionCookie());
}

function classCookieOptions(maxAgeSeconds: number): AstroCookieSetOptions {
  return {
    httpOnly: true,
    sameSite: 'lax',
    secure: cookieSecure(serverConfig('SITE_URL')),
    path: '/',
    maxAge: maxAgeSeconds,
  };
}

/** Opens an 8-hour class session for the class and sets its cookie (a random token; the row keeps its hash). */
export async function classSessionStart(context: CookieContext, classId: string): Promise<void> {
  const { token, hash } = tokenNew();
  await classSessionInsert(hash, classId, CLASS_SESSION_HOURS);
  context.cookies.set(CLASS_SESSION_COOKIE, token, classCookieOptions(CLASS_SESSION_HOURS * 3600));
}

/** Ends the class session of this request, if any, and deletes its cookie. */
export async function classSessionEnd(context: CookieContext): Promise<void> {
  const token = context.cookies.get(CLASS_SESSION_COOKIE)?.value;
  if (token) await classSessionDelete(tokenHash(token));
  context.cookies.delete(CLASS_SESSION_COOKIE, { path: '/' });
}
