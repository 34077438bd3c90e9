/**
 * Who is making a request: nobody, a signed-in account with a role, or a student class session (no
 * account, limited to one class). Framework-free; the middleware builds it and puts it on Astro.locals.
 */
export const ROLES = ['teacher', 'coordinator', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export type Actor =
  | { kind: 'anonymous' }
  | {
      kind: 'user';
      userId: string;
      role: Role;
      schoolId: string | null;
      email: string;
      displayName: string;
      sessionId: string;
    }
  | { kind: 'class'; classId: string; classSessionId: string };

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
