/** Narrowing helpers for handlers whose endpoint() access already admitted only accounts or class sessions. */
import { AuthenticationError } from '../errors';
import type { Actor } from './actor';

export type UserActor = Extract<Actor, { kind: 'user' }>;
export type ClassActor = Extract<Actor, { kind: 'class' }>;

/** The account actor; throws 401 if the route's access rule let anything else through. */
export function actorUser(actor: Actor): UserActor {
  if (actor.kind !== 'user') throw new AuthenticationError('Sign in to do this.');
  return actor;
}

/** The class-session actor; throws 401 otherwise. */
export function actorClass(actor: Actor): ClassActor {
  if (actor.kind !== 'class') throw new AuthenticationError('Open your class with its class code first.');
  return actor;
}

/** What the browser may know about who is signed in (no ids of sessions). */
export function actorPublic(actor: Actor) {
  if (actor.kind === 'user') {
    return {
      kind: 'user' as const,
      email: actor.email,
      displayName: actor.displayName,
      role: actor.role,
      schoolId: actor.schoolId,
    };
  }
  if (actor.kind === 'class') return { kind: 'class' as const, classId: actor.classId };
  return { kind: 'anonymous' as const };
}
