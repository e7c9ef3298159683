/** Texts of the account e-mails; pure so they can be checked without sending anything. */
export interface MailContent {
  subject: string;
  text: string;
  html: string;
}

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);

function layout(greeting: string, lines: string[], link: { href: string; label: string }): string {
  const body = lines.map((l) => `<p>${escapeHtml(l)}</p>`).join('');
  return `<div style="font-family:Nunito,Arial,sans-serif;color:#1d2b24"><p>${escapeHtml(greeting)}</p>${body}<p><a href="${escapeHtml(link.href)}" style="color:#1F5E46;font-weight:700">${escapeHtml(link.label)}</a></p><p style="color:#555">Ebbroot</p></div>`;
}

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
