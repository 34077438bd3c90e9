/**
 * Who a page or endpoint admits, and whether an actor (src/lib/actor.ts) is one of them. The middleware builds
 * the actor and puts it on Astro.locals.
 */
import { ROLES, type Actor, type Role } from '../actor';

export { ROLES, type Actor, type Role };

/** Who a page or endpoint admits: "anyone", a class session, or accounts of the listed roles. */
export type Audience = 'anyone' | 'class' | Role;

/** True when the actor is one of the audiences. */
export function actorAdmitted(actor: Actor, audiences: readonly Audience[]): boolean {
  if (audiences.includes('anyone')) return true;
  if (actor.kind === 'class') return audiences.includes('class');
  if (actor.kind === 'user') return audiences.includes(actor.role);
  return false;
}

/** Every account role: staff and teachers alike. */
export const ANY_ACCOUNT: readonly Audience[] = ROLES;
/** Outreach staff. */
export const STAFF: readonly Audience[] = ['coordinator', 'admin'];
