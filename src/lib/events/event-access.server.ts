/** Who sees which event: anyone a published or cancelled-after-publishing one; staff every event. */
import type { Actor } from '../auth/actor';
import { eventById, type EventView } from '../db/events';
import { NotFoundError } from '../errors';

export function actorIsStaff(actor: Actor): boolean {
  return actor.kind === 'user' && (actor.role === 'coordinator' || actor.role === 'admin');
}

/** The event if this visitor may see it, else 404 (a draft does not exist for the public). */
export async function eventVisible(actor: Actor, id: string): Promise<EventView> {
  const event = await eventById(id);
  if (!event || (!actorIsStaff(actor) && event.publishedAt === null)) {
    throw new NotFoundError('No published event has this address.');
  }
  return event;
}
