/** The mail a teacher gets when a coordinator decides one of their class's journal entries. Framework-free. */
import type { EntryState } from '../journal/entry-rules';
import { mailCompose, type MailMessage } from './message';

const DECISION_WORDS: Partial<Record<EntryState, { subject: string; paragraph: string; action: string }>> = {
  published: {
    subject: 'published',
    paragraph: 'It is now on the public class journal pages, with its plots and photos.',
    action: 'See the published entry',
  },
  returned: {
    subject: 'returned for changes',
    paragraph: 'It is back in your class journal as a draft. Change it as the note asks and submit it again.',
    action: 'Open the entry',
  },
  declined: {
    subject: 'not published',
    paragraph: 'It stays private to your class: only you, your class session and the outreach office can see it.',
    action: 'Open the entry',
  },
};

export function entryDecisionMessage(o: {
  to: string;
  teacherName: string;
  entryTitle: string;
  className: string;
  state: EntryState;
  note: string | null;
  link: string;
}): MailMessage {
  const words = DECISION_WORDS[o.state];
  if (!words) throw new Error(`no decision mail for the state ${o.state}`);
  return mailCompose({
    to: o.to,
    subject: `Journal entry ${words.subject}: ${o.entryTitle}`,
    greeting: `Hello ${o.teacherName},`,
    paragraphs: [
      `The outreach office reviewed “${o.entryTitle}” from ${o.className}: ${words.subject}.`,
      words.paragraph,
      ...(o.note ? [`Note from the reviewer: ${o.note}`] : []),
    ],
    action: { label: words.action, url: o.link },
    footnote: 'You get this message because you teach the class that wrote the entry.',
  });
}
