/** Texts of the account e-mails; pure so they can be checked without sending anything. */
import { mailLayout, type MailContent, type MailLink } from './mail-layout.js';

export type { MailContent } from './mail-layout.js';

const layout = (greeting: string, lines: string[], link: MailLink) => mailLayout({ greeting, lines, link });

export function passwordResetMail(name: string, link: string, validMinutes: number): MailContent {
  const lines = [
    `Someone (we hope you) asked to reset your Ebbroot password. The link works once, for ${validMinutes} minutes.`,
    'If you did not ask, ignore this e-mail; your password stays as it is.',
  ];
  return {
    subject: 'Reset your Ebbroot password',
    text: `Hello ${name},\n\n${lines[0]}\n\n${link}\n\n${lines[1]}\n\nEbbroot`,
    html: layout(`Hello ${name},`, lines, { href: link, label: 'Choose a new password' }),
  };
}

export function verifyEmailMail(name: string, link: string): MailContent {
  const lines = ['Welcome to Ebbroot. Please confirm this is your e-mail address so coordinators know they can reach you.'];
  return {
    subject: 'Confirm your e-mail for Ebbroot',
    text: `Hello ${name},\n\n${lines[0]}\n\n${link}\n\nEbbroot`,
    html: layout(`Hello ${name},`, lines, { href: link, label: 'Confirm my e-mail' }),
  };
}
