/**
 * Registration for events: a signed-in teacher gets a place (or the waiting list) at once; anyone else gives a
 * name and a school address and gets the place when they confirm the mailed link. A cancellation hands the
 * place to the first on the waiting list. Each step locks the event row, so two registrations cannot both
 * take the last place, and queues its mail in the same transaction.
 */
import type { Knex } from 'knex';
import type { UserActor } from '../auth/actor-require';
import { tokenHash, tokenNew } from '../auth/tokens.server';
import { isUuid } from '../db/accounts';
import { db } from '../db/knex';
import { ConflictError, InputError, NotFoundError } from '../errors';
import { mailSend } from '../mail/transport.server';
import {
  registrationConfirmEmailMessage,
  registrationPlaceMessage,
  registrationWaitlistMessage,
  type EventMailFacts,
} from './event-messages';
import type { RegistrationCreate } from './event-schemas';

/** How long a mailed confirmation link works. */
export const REGISTRATION_CONFIRM_VALID_HOURS = 48;

export type RegistrationState = 'pending' | 'confirmed' | 'waitlisted' | 'cancelled';

export interface RegistrationResult {
  state: RegistrationState;
  /** Place on the waiting list (1 = next), when waitlisted. */
  position?: number;
}

export interface EventRow {
  id: string;
  title: string;
  description: string;
  venue: string;
  starts_at: Date;
  ends_at: Date | null;
  time_zone: string;
  capacity: number | null;
  state: string;
  revision: number;
}

export const eventPageUrl = (site: string, eventId: string) => new URL(`/events/${eventId}`, site).toString();
const cancelUrl = (site: string, token: string) => {
  const url = new URL('/events/registration', site);
  url.searchParams.set('cancel', token);
  return url.toString();
};

export function eventMailFacts(event: EventRow, site: string): EventMailFacts {
  return {
    id: event.id,
    title: event.title,
    description: event.description,
    venue: event.venue,
    startsAt: event.starts_at,
    endsAt: event.ends_at,
    timeZone: event.time_zone,
    url: eventPageUrl(site, event.id),
    revision: event.revision,
    cancelled: event.state === 'cancelled',
  };
}

/** The published, not yet started event, locked for this transaction. */
async function eventForRegistration(trx: Knex, eventId: string): Promise<EventRow> {
  // Text that is no UUID names no event (PostgreSQL would refuse it as a uuid: 22P02).
  const event = isUuid(eventId)
    ? ((await trx('events').where({ id: eventId }).forUpdate().first()) as EventRow | undefined)
    : undefined;
  if (!event || event.state !== 'published') throw new NotFoundError('No published event has this address.');
  if (event.starts_at.getTime() <= Date.now()) {
    throw new ConflictError('This event has already started; registration is closed.');
  }
  return event;
}

async function placesTaken(trx: Knex, eventId: string): Promise<number> {
  const row = await trx('event_registrations')
    .where({ event_id: eventId, state: 'confirmed' })
    .count({ count: '*' })
    .first();
  return Number(row?.count ?? 0);
}

async function waitlistPosition(trx: Knex, eventId: string, queuedAt: Date): Promise<number> {
  const row = await trx('event_registrations')
    .where({ event_id: eventId, state: 'waitlisted' })
    .where('queued_at', '<=', queuedAt)
    .count({ count: '*' })
    .first();
  return Number(row?.count ?? 0);
}

/** Gives a place or a waiting-list spot to a registration whose address is known, and mails the outcome. */
async function placeAssign(
  trx: Knex,
  event: EventRow,
  reg: { id: string; name: string; email: string },
  manageToken: string,
  site: string,
): Promise<RegistrationResult> {
  const full = event.capacity !== null && (await placesTaken(trx, event.id)) >= event.capacity;
  const now = new Date();
  const state = full ? 'waitlisted' : 'confirmed';
  await trx('event_registrations')
    .where({ id: reg.id })
    .update({ state, queued_at: now, confirmed_at: now, confirm_token_hash: null });
  const facts = eventMailFacts(event, site);
  if (!full) {
    await mailSend(
      registrationPlaceMessage({
        to: reg.email,
        name: reg.name,
        event: facts,
        cancelUrl: cancelUrl(site, manageToken),
        promoted: false,
      }),
      { trx },
    );
    return { state };
  }
  const position = await waitlistPosition(trx, event.id, now);
  await mailSend(
    registrationWaitlistMessage({
      to: reg.email,
      name: reg.name,
      event: facts,
      position,
      cancelUrl: cancelUrl(site, manageToken),
    }),
    { trx },
  );
  return { state, position };
}

async function registrationInsert(
  trx: Knex,
  row: { event_id: string; user_id: string | null; name: string; email: string; school_id: string | null },
  manageHash: string,
  confirmHash: string | null,
): Promise<string> {
  const taken = await trx('event_registrations')
    .where({ event_id: row.event_id, email: row.email })
    .whereNot({ state: 'cancelled' })
    .first('id');
  if (taken) {
    throw new ConflictError(
      `${row.email} is already registered for this event; the e-mail we sent has the link to cancel.`,
      {
        email: ['Already registered for this event.'],
      },
    );
  }
  const [inserted] = await trx('event_registrations')
    .insert({ ...row, state: 'pending', manage_token_hash: manageHash, confirm_token_hash: confirmHash })
    .returning('id');
  return inserted.id as string;
}

/** A signed-in teacher registers as themselves. */
export async function registrationCreateForTeacher(
  eventId: string,
  teacher: UserActor,
  site: string,
): Promise<RegistrationResult> {
  return db().transaction(async (trx) => {
    const event = await eventForRegistration(trx, eventId);
    const manage = tokenNew();
    const reg = { name: teacher.displayName, email: teacher.email.toLowerCase() };
    const id = await registrationInsert(
      trx,
      { event_id: eventId, user_id: teacher.userId, ...reg, school_id: teacher.schoolId },
      manage.hash,
      null,
    );
    return placeAssign(trx, event, { id, ...reg }, manage.token, site);
  });
}

/** Anyone else registers with a name and school address; the place is given when they confirm by e-mail. */
export async function registrationCreateByEmail(
  eventId: string,
  input: RegistrationCreate,
  site: string,
): Promise<RegistrationResult> {
  return db().transaction(async (trx) => {
    const event = await eventForRegistration(trx, eventId);
    if (input.schoolId && !(await trx('schools').where({ id: input.schoolId, status: 'approved' }).first('id'))) {
      throw new InputError('Pick your school from the list.', { schoolId: ['Not a school on the list.'] });
    }
    const manage = tokenNew();
    const confirm = tokenNew();
    // The cancel token is mailed only once the address is confirmed (a new one is made then).
    await registrationInsert(
      trx,
      { event_id: eventId, user_id: null, name: input.name, email: input.email, school_id: input.schoolId },
      manage.hash,
      confirm.hash,
    );
    const link = new URL('/events/registration', site);
    link.searchParams.set('confirm', confirm.token);
    await mailSend(
      registrationConfirmEmailMessage({
        to: input.email,
        name: input.name,
        event: eventMailFacts(event, site),
        link: link.toString(),
        validHours: REGISTRATION_CONFIRM_VALID_HOURS,
      }),
      { trx },
    );
    return { state: 'pending' };
  });
}

/** Confirms an e-mail registration from its mailed link: a place, or the waiting list. */
export async function registrationConfirm(token: string, site: string): Promise<RegistrationResult> {
  return db().transaction(async (trx) => {
    const found = await trx('event_registrations')
      .where({ confirm_token_hash: tokenHash(token) })
      .first('id', 'event_id');
    if (!found) throw new NotFoundError('This confirmation link is not valid any more. It may have been used already.');
    const event = await eventForRegistration(trx, found.event_id);
    const reg = await trx('event_registrations').where({ id: found.id }).forUpdate().first();
    if (reg.state !== 'pending' || reg.confirm_token_hash !== tokenHash(token)) {
      throw new NotFoundError('This confirmation link is not valid any more. It may have been used already.');
    }
    if (Date.now() - reg.created_at.getTime() > REGISTRATION_CONFIRM_VALID_HOURS * 3_600_000) {
      throw new ConflictError('This confirmation link has expired. Please register again on the event page.');
    }
    // A fresh cancel token: the first one was never mailed.
    const manage = tokenNew();
    await trx('event_registrations').where({ id: reg.id }).update({ manage_token_hash: manage.hash });
    return placeAssign(trx, event, reg, manage.token, site);
  });
}

/**
 * Cancels a registration from the link in its mails. A freed place goes to the first on the waiting list,
 * who is told by e-mail with the calendar file.
 */
export async function registrationCancel(
  token: string,
  site: string,
): Promise<{ state: 'cancelled'; promoted: boolean }> {
  return db().transaction(async (trx) => {
    const found = await trx('event_registrations')
      .where({ manage_token_hash: tokenHash(token) })
      .first('id', 'event_id');
    if (!found)
      throw new NotFoundError(
        'This cancellation link is not valid any more: use the link in the newest e-mail about this event.',
      );
    const event = (await trx('events').where({ id: found.event_id }).forUpdate().first()) as EventRow;
    const reg = await trx('event_registrations').where({ id: found.id }).forUpdate().first();
    if (reg.state === 'cancelled') return { state: 'cancelled', promoted: false };
    await trx('event_registrations').where({ id: reg.id }).update({ state: 'cancelled', cancelled_at: trx.fn.now() });
    if (reg.state !== 'confirmed' || event.starts_at.getTime() <= Date.now())
      return { state: 'cancelled', promoted: false };
    const next = await trx('event_registrations')
      .where({ event_id: event.id, state: 'waitlisted' })
      .orderBy('queued_at')
      .forUpdate()
      .first();
    if (!next) return { state: 'cancelled', promoted: false };
    const manage = tokenNew();
    await trx('event_registrations')
      .where({ id: next.id })
      .update({ state: 'confirmed', confirmed_at: trx.fn.now(), manage_token_hash: manage.hash });
    await mailSend(
      registrationPlaceMessage({
        to: next.email,
        name: next.name,
        event: eventMailFacts(event, site),
        cancelUrl: cancelUrl(site, manage.token),
        promoted: true,
      }),
      { trx },
    );
    return { state: 'cancelled', promoted: true };
  });
}

export { cancelUrl as registrationCancelUrl };

export interface RegistrationLinkView {
  eventId: string;
  eventTitle: string;
  startsAt: Date;
  endsAt: Date | null;
  timeZone: string;
  venue: string;
  name: string;
  state: RegistrationState;
}

/**
 * What a mailed link is about, read without changing anything (the page shows it; a POST acts on it): the
 * registration a confirm or cancel token belongs to, or null when no registration holds that token now.
 */
export async function registrationByLinkToken(
  kind: 'confirm' | 'cancel',
  token: string,
): Promise<RegistrationLinkView | null> {
  const column = kind === 'confirm' ? 'r.confirm_token_hash' : 'r.manage_token_hash';
  const row = await db()('event_registrations as r')
    .join('events as e', 'e.id', 'r.event_id')
    .where(column, tokenHash(token))
    .first('e.id as event_id', 'e.title', 'e.starts_at', 'e.ends_at', 'e.time_zone', 'e.venue', 'r.name', 'r.state');
  if (!row) return null;
  return {
    eventId: row.event_id,
    eventTitle: row.title,
    startsAt: row.starts_at,
    endsAt: row.ends_at,
    timeZone: row.time_zone,
    venue: row.venue,
    name: row.name,
    state: row.state,
  };
}
