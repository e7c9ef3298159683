/** The one look of Ebbroot's e-mails: plain text and a small inline-styled HTML body. */
export interface MailContent {
  subject: string;
  text: string;
  html: string;
}

export interface MailLink {
  href: string;
  label: string;
}

export const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);

const anchor = (link: MailLink, style: string) => `<a href="${escapeHtml(link.href)}" style="${style}">${escapeHtml(link.label)}</a>`;

/**
 * HTML body: greeting, paragraphs, optional label/value details and notes, the main link, optional
 * small print (each line may end in a link) and the signature. Every value is escaped here.
 */
export function mailLayout(parts: {
  greeting: string;
  lines: string[];
  link: MailLink;
  details?: [label: string, value: string][];
  /** Set apart after the details, e.g. the day's cautions. */
  notes?: string[];
  smallPrint?: { text: string; link?: MailLink }[];
  signature?: string;
}): string {
  const body = parts.lines.map((l) => `<p>${escapeHtml(l)}</p>`).join('');
  const details = parts.details?.length
    ? `<table style="border-collapse:collapse">${parts.details
        .map(([k, v]) => `<tr><th style="text-align:left;padding:2px 12px 2px 0;vertical-align:top">${escapeHtml(k)}</th><td style="padding:2px 0">${escapeHtml(v)}</td></tr>`)
        .join('')}</table>`
    : '';
  const notes = (parts.notes ?? []).map((n) => `<p style="border-left:4px solid #E0A43B;padding-left:8px">${escapeHtml(n)}</p>`).join('');
  const small = (parts.smallPrint ?? [])
    .map((s) => `<p style="color:#555;font-size:13px">${escapeHtml(s.text)}${s.link ? ` ${anchor(s.link, 'color:#555')}` : ''}</p>`)
    .join('');
  const main = `<p>${anchor(parts.link, 'color:#1F5E46;font-weight:700')}</p>`;
  const signature = `<p style="color:#555">${escapeHtml(parts.signature ?? 'Ebbroot')}</p>`;
  return `<div style="font-family:Nunito,Arial,sans-serif;color:#1d2b24"><p>${escapeHtml(parts.greeting)}</p>${body}${details}${notes}${main}${small}${signature}</div>`;
}
