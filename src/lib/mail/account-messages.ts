/**
 * The account mails in our own wording: verify an e-mail address, reset a password, a staff invitation, and a
 * notice when someone signs up with an address that already has an account. Framework-free builders.
 */
import { mailCompose, type MailMessage } from './message';

/** Absolute link on the site for a path and a token. */
export function siteLink(siteUrl: string, path: string, token: string): string {
  const url = new URL(path, siteUrl);
  url.searchParams.set('token', token);
  return url.toString();
}

export function verifyEmailMessage(o: { to: string; displayName: string; link: string; validHours: number }) {
  return mailCompose({
    to: o.to,
    subject: 'Confirm your e-mail address for Kitwright',
    greeting: `Hello ${o.displayName},`,
    paragraphs: [
      'Thank you for creating a teacher account on Kitwright. Please confirm that this address is yours so you can sign in and set up your classes.',
      `The link works once and for ${o.validHours} hours.`,
    ],
    action: { label: 'Confirm my e-mail address', url: o.link },
    footnote: 'If you did not create an account, you can ignore this message; nothing will happen.',
  });
}

export function resetPasswordMessage(o: { to: string; displayName: string; link: string }): MailMessage {
  return mailCompose({
    to: o.to,
    subject: 'Choose a new Kitwright password',
    greeting: `Hello ${o.displayName},`,
    paragraphs: [
      'Someone (we hope you) asked to reset the password of your Kitwright account.',
      'The link works once and for one hour. Choosing a new password signs you out on every other device.',
    ],
    action: { label: 'Choose a new password', url: o.link },
    footnote: 'If you did not ask for this, ignore this message: your password stays as it is.',
  });
}

export function invitationMessage(o: {
  to: string;
  roleLabel: string;
  inviterName: string;
  link: string;
  validDays: number;
}): MailMessage {
  return mailCompose({
    to: o.to,
    subject: `You are invited to Kitwright as ${o.roleLabel}`,
    greeting: 'Hello,',
    paragraphs: [
      `${o.inviterName} invited you to join Kitwright as ${o.roleLabel}. Open the link to choose your name and password.`,
      `The invitation works once and for ${o.validDays} days.`,
    ],
    action: { label: 'Accept the invitation', url: o.link },
    footnote: 'If you did not expect this invitation, ignore this message.',
  });
}

export function signUpExistingMessage(o: { to: string; signInUrl: string; resetUrl: string }): MailMessage {
  return mailCompose({
    to: o.to,
    subject: 'Someone tried to create a Kitwright account with your address',
    greeting: 'Hello,',
    paragraphs: [
      'Someone just tried to sign up for Kitwright with this e-mail address, but it already has an account.',
      `If it was you, sign in at ${o.signInUrl}, or choose a new password at ${o.resetUrl} if you have forgotten it.`,
    ],
    footnote: 'If it was not you, you can ignore this message; your account has not changed.',
  });
}
