import { escapeHtml, renderPage } from '../support/html.js';
import type { StoredMessage } from './mail-store.js';

const BANNER = 'Local test mail inbox: a stand-in SMTP server. No mail leaves this machine.';

export function renderInbox(messages: StoredMessage[]): string {
  const rows = messages
    .map(
      (m) => `<tr>
  <td><a href="/inbox/${encodeURIComponent(m.id)}">${escapeHtml(m.subject || '(no subject)')}</a></td>
  <td>${escapeHtml(m.to.join(', '))}</td>
  <td><time datetime="${escapeHtml(m.date)}">${escapeHtml(m.date)}</time></td>
</tr>`,
    )
    .join('\n');
  const table =
    messages.length === 0
      ? '<p>No messages yet.</p>'
      : `<table>
<caption class="visually-hidden">Received messages, newest first</caption>
<thead><tr><th scope="col">Subject</th><th scope="col">To</th><th scope="col">Received</th></tr></thead>
<tbody>
${rows}
</tbody>
</table>`;
  return renderPage('Test inbox', `<h1>Test inbox</h1>\n<p>${messages.length} message(s), newest first.</p>\n${table}`, BANNER);
}

export function renderMessage(message: StoredMessage): string {
  const attachments = message.attachments
    .map(
      (a, index) =>
        `<li><a href="/messages/${encodeURIComponent(message.id)}/attachments/${index}">${escapeHtml(a.filename)}</a> (${escapeHtml(a.contentType)})</li>`,
    )
    .join('');
  // The iframe has an empty sandbox: the mail's HTML can neither run scripts nor
  // reach this page, and srcdoc keeps it from being fetched as a page of its own.
  const html = message.html
    ? `<h2>HTML</h2>\n<iframe title="HTML body of the message" sandbox srcdoc="${escapeHtml(message.html)}"></iframe>`
    : '';
  const body = `<p><a href="/">Back to the inbox</a></p>
<h1>${escapeHtml(message.subject || '(no subject)')}</h1>
<dl>
  <dt>From</dt><dd>${escapeHtml(message.from)}</dd>
  <dt>To</dt><dd>${escapeHtml(message.to.join(', '))}</dd>
  <dt>Received</dt><dd><time datetime="${escapeHtml(message.date)}">${escapeHtml(message.date)}</time></dd>
</dl>
${attachments ? `<h2>Attachments</h2>\n<ul>${attachments}</ul>` : ''}
<h2>Text</h2>
<pre>${escapeHtml(message.text || '(no text part)')}</pre>
${html}`;
  return renderPage(message.subject || 'Message', body, BANNER);
}

export function renderMissingMessage(id: string): string {
  const body = `<p><a href="/">Back to the inbox</a></p>\n<h1>Message not found</h1>\n<p role="alert">No message with id ${escapeHtml(id)}; the inbox may have been cleared.</p>`;
  return renderPage('Message not found', body, BANNER);
}
