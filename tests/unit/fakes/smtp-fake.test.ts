import nodemailer from 'nodemailer';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { startFakes, type RunningFakes } from '../../../fakes/index.js';

interface MessageJson {
  id: string;
  to: string[];
  from: string;
  subject: string;
  text: string;
  html: string;
  attachments: string[];
  date: string;
}

let fakes: RunningFakes;
let inbox: string;

beforeAll(async () => {
  fakes = await startFakes({ smtpPort: 0, mailInspectPort: 0, oauthPort: 0, stripePort: 0 });
  inbox = `http://127.0.0.1:${fakes.mailInspectPort}`;
});
afterAll(() => fakes.close());
beforeEach(async () => {
  await fetch(`${inbox}/messages`, { method: 'DELETE' });
});

function transport() {
  return nodemailer.createTransport({ host: '127.0.0.1', port: fakes.smtpPort, secure: false, ignoreTLS: true });
}

async function listMessages(query = ''): Promise<MessageJson[]> {
  const response = await fetch(`${inbox}/messages${query}`);
  expect(response.status).toBe(200);
  return (await response.json()) as MessageJson[];
}

describe('SMTP fake with the nodemailer transport', () => {
  it('stores a sent mail with its attachment names, newest first', async () => {
    const mailer = transport();
    await mailer.sendMail({ from: 'Ebbroot <no-reply@ebbroot.test>', to: 'first@example.com', subject: 'First', text: 'one' });
    await mailer.sendMail({
      from: 'Ebbroot <no-reply@ebbroot.test>',
      to: 'Volunteer <volunteer@example.com>',
      subject: 'Planting day on Saturday',
      text: 'Meet at the jetty.',
      html: '<p>Meet at the <b>jetty</b>.</p>',
      attachments: [{ filename: 'workday.ics', content: 'BEGIN:VCALENDAR\r\nEND:VCALENDAR\r\n', contentType: 'text/calendar' }],
    });

    const messages = await listMessages();

    expect(messages.map((m) => m.subject)).toEqual(['Planting day on Saturday', 'First']);
    expect(messages[0]).toMatchObject({
      to: ['volunteer@example.com'],
      from: expect.stringContaining('no-reply@ebbroot.test'),
      text: expect.stringContaining('Meet at the jetty.'),
      html: expect.stringContaining('<b>jetty</b>'),
      attachments: ['workday.ics'],
    });
    expect(Date.parse(messages[0]?.date ?? '')).not.toBeNaN();
  });

  it('filters by recipient ignoring case, including Bcc recipients', async () => {
    await transport().sendMail({ from: 'a@ebbroot.test', to: 'lead@example.com', bcc: 'Hidden@Example.com', subject: 'Roster', text: 'x' });
    await transport().sendMail({ from: 'a@ebbroot.test', to: 'other@example.com', subject: 'Other', text: 'y' });

    const forHidden = await listMessages('?to=hidden@EXAMPLE.com');

    expect(forHidden.map((m) => m.subject)).toEqual(['Roster']);
  });

  it('returns one message by id and 404 for an unknown id', async () => {
    await transport().sendMail({ from: 'a@ebbroot.test', to: 'b@example.com', subject: 'One', text: 'z' });
    const [listed] = await listMessages();

    const found = await fetch(`${inbox}/messages/${listed?.id ?? ''}`);
    const missing = await fetch(`${inbox}/messages/does-not-exist`);

    expect(await found.json()).toMatchObject({ id: listed?.id, subject: 'One' });
    expect(missing.status).toBe(404);
  });

  it('serves attachment content for download', async () => {
    await transport().sendMail({ from: 'a@ebbroot.test', to: 'b@example.com', subject: 'Sheet', text: 'z', attachments: [{ filename: 'plots.csv', content: 'plot,count\nA,12\n' }] });
    const [listed] = await listMessages();

    const response = await fetch(`${inbox}/messages/${listed?.id ?? ''}/attachments/0`);

    expect(response.headers.get('content-disposition')).toContain('plots.csv');
    expect(await response.text()).toBe('plot,count\nA,12\n');
  });

  it('clears every message on DELETE /messages', async () => {
    await transport().sendMail({ from: 'a@ebbroot.test', to: 'b@example.com', subject: 'Gone', text: 'z' });

    const response = await fetch(`${inbox}/messages`, { method: 'DELETE' });

    expect(response.status).toBe(204);
    expect(await listMessages()).toEqual([]);
  });
});

describe('SMTP fake inbox pages', () => {
  it('lists messages with escaped subjects and links to each message', async () => {
    await transport().sendMail({ from: 'a@ebbroot.test', to: 'b@example.com', subject: '<script>alert(1)</script>', text: 'z' });
    const [listed] = await listMessages();

    const page = await (await fetch(`${inbox}/`)).text();

    expect(page).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
    expect(page).not.toContain('<script>alert(1)');
    expect(page).toContain(`href="/inbox/${listed?.id ?? ''}"`);
  });

  it('shows the HTML body only inside a sandboxed iframe, escaped into srcdoc', async () => {
    await transport().sendMail({ from: 'a@ebbroot.test', to: 'b@example.com', subject: 'Html', text: 'plain "quoted" text', html: '<p onclick="x()">Hi & bye</p>' });
    const [listed] = await listMessages();

    const page = await (await fetch(`${inbox}/inbox/${listed?.id ?? ''}`)).text();

    expect(page).toContain('sandbox srcdoc="&lt;p onclick=&quot;x()&quot;&gt;Hi &amp; bye&lt;/p&gt;');
    expect(page).toContain('plain &quot;quoted&quot; text');
    expect(page).not.toContain('<p onclick');
  });
});
