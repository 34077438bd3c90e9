/**
 * The event mails in our own words: confirm your address, your place, the waiting list, a place came free, the
 * reminder, the event moved, the event cancelled.
 */
import { mailCompose, type MailMessage } from '../mail/message';
import { eventIcs, type EventIcsInput } from './event-ics';
import { eventWhenLabel } from './event-time';

export interface EventMailFacts extends EventIcsInput {
  timeZone: string;
}

const calendarFile = (event: EventMailFacts) => ({
  filename: 'event.ics',
  contentType: 'text/calendar; charset=utf-8; method=PUBLISH',
  content: eventIcs(event),
});
const whereWhen = (event: EventMailFacts) =>
  `${event.title}: ${eventWhenLabel(event.startsAt, event.timeZone)}${event.venue ? `, ${event.venue}` : ''}.`;
const cancelNote = (cancelUrl: string) =>
  `If you cannot come, please cancel so someone on the waiting list gets your place: ${cancelUrl}`;

export function registrationConfirmEmailMessage(o: {
  to: string;
  name: string;
  event: EventMailFacts;
  link: string;
  validHours: number;
}): MailMessage {
  return mailCompose({
    to: o.to,
    subject: `Confirm your registration: ${o.event.title}`,
    greeting: `Hello ${o.name},`,
    paragraphs: [
      `You asked to register for ${whereWhen(o.event)}`,
      `Please confirm that this school address is yours. The link works for ${o.validHours} hours; your place is given when you confirm.`,
    ],
    action: { label: 'Confirm my registration', url: o.link },
    footnote: 'If you did not ask for this, ignore this message: nothing happens without the confirmation.',
  });
}

export function registrationPlaceMessage(o: {
  to: string;
  name: string;
  event: EventMailFacts;
  cancelUrl: string;
  promoted: boolean;
}): MailMessage {
  return {
    ...mailCompose({
      to: o.to,
      subject: `${o.promoted ? 'A place came free for you' : 'You are registered'}: ${o.event.title}`,
      greeting: `Hello ${o.name},`,
      paragraphs: [
        o.promoted
          ? `Good news: someone cancelled, and you now have a place at ${whereWhen(o.event)}`
          : `You have a place at ${whereWhen(o.event)}`,
        'The calendar file attached adds the event to your calendar. We send a reminder the day before.',
        cancelNote(o.cancelUrl),
      ],
      action: { label: 'See the event', url: o.event.url },
      footnote: 'You get this message because you registered for this event on Kitwright.',
    }),
    attachments: [calendarFile(o.event)],
  };
}

export function registrationWaitlistMessage(o: {
  to: string;
  name: string;
  event: EventMailFacts;
  position: number;
  cancelUrl: string;
}): MailMessage {
  return mailCompose({
    to: o.to,
    subject: `On the waiting list: ${o.event.title}`,
    greeting: `Hello ${o.name},`,
    paragraphs: [
      `${o.event.title} is full, so you are number ${o.position} on its waiting list.`,
      'If a place comes free you get it automatically, and we e-mail you with the calendar file.',
      `To leave the waiting list: ${o.cancelUrl}`,
    ],
    action: { label: 'See the event', url: o.event.url },
    footnote: 'You get this message because you registered for this event on Kitwright.',
  });
}

export function registrationReminderMessage(o: {
  to: string;
  name: string;
  event: EventMailFacts;
  cancelUrl: string;
}): MailMessage {
  return {
    ...mailCompose({
      to: o.to,
      subject: `Tomorrow: ${o.event.title}`,
      greeting: `Hello ${o.name},`,
      paragraphs: [`A reminder that you have a place at ${whereWhen(o.event)}`, cancelNote(o.cancelUrl)],
      action: { label: 'See the event', url: o.event.url },
      footnote: 'You get this message because you registered for this event on Kitwright.',
    }),
    attachments: [calendarFile(o.event)],
  };
}

/**
 * The event moved (another time or place). A registrant with a place gets the new calendar file, which replaces
 * the old one (same UID, higher SEQUENCE); one on the waiting list keeps their turn.
 */
export function eventMovedMessage(o: {
  to: string;
  name: string;
  event: EventMailFacts;
  /** The event as it was before the move. */
  before: EventMailFacts;
  hasPlace: boolean;
  cancelUrl: string;
}): MailMessage {
  const message = mailCompose({
    to: o.to,
    subject: `Changed time or place: ${o.event.title}`,
    greeting: `Hello ${o.name},`,
    paragraphs: [
      `The organisers have moved ${o.event.title}. It is now: ${whereWhen(o.event)}`,
      `It was: ${whereWhen(o.before)}`,
      o.hasPlace
        ? 'Your place stays yours. The calendar file attached replaces the one you had; we send a reminder the day before.'
        : 'You keep your turn on the waiting list; if a place comes free you get it automatically.',
      cancelNote(o.cancelUrl),
    ],
    action: { label: 'See the event', url: o.event.url },
    footnote: 'You get this message because you registered for this event on Kitwright.',
  });
  return o.hasPlace ? { ...message, attachments: [calendarFile(o.event)] } : message;
}

/**
 * The event is cancelled. A registrant with a place gets the cancelled calendar file (STATUS:CANCELLED, higher
 * SEQUENCE), which marks the entry in their calendar.
 */
export function eventCancelledMessage(o: {
  to: string;
  name: string;
  event: EventMailFacts;
  hasPlace: boolean;
}): MailMessage {
  const message = mailCompose({
    to: o.to,
    subject: `Cancelled: ${o.event.title}`,
    greeting: `Hello ${o.name},`,
    paragraphs: [
      `We are sorry: the organisers have cancelled ${whereWhen(o.event)}`,
      o.hasPlace
        ? 'Your place is released and there is nothing you need to do. The calendar file attached marks the entry in your calendar as cancelled.'
        : 'Your spot on the waiting list is released; there is nothing you need to do.',
    ],
    action: { label: 'See other events', url: new URL('/events', o.event.url).toString() },
    footnote: 'You get this message because you registered for this event on Kitwright.',
  });
  return o.hasPlace ? { ...message, attachments: [calendarFile(o.event)] } : message;
}
