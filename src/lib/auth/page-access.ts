/**
 * The page side of "every page declares who it admits": the same audiences and actorAdmitted as API routes,
 * answered the way a browser needs — a redirect to sign-in (or to /join for class pages) when nobody is
 * signed in, a 403 when the wrong kind of visitor is.
 */
import { actorAdmitted, type Actor, type Audience, type Role } from './actor';

export type PageAccess = { allowed: true } | { allowed: false; redirect: string } | { allowed: false; status: 403 };

/** Decides a page request from the actor, the page's audiences and its URL (kept as ?next= for sign-in). */
export function pageAccess(actor: Actor, audiences: readonly Audience[], url: URL): PageAccess {
  if (actorAdmitted(actor, audiences)) return { allowed: true };
  if (actor.kind === 'anonymous') {
    if (audiences.length === 1 && audiences[0] === 'class') return { allowed: false, redirect: '/join' };
    return { allowed: false, redirect: `/sign-in?next=${encodeURIComponent(url.pathname + url.search)}` };
  }
  return { allowed: false, status: 403 };
}

/** Where an account lands after signing in when no next page was asked for. */
export function roleHome(role: Role): string {
  return role === 'teacher' ? '/classes' : role === 'admin' ? '/admin/accounts' : '/review';
}
