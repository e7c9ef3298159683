import { describe, expect, it } from 'vitest';
import {
  calendarDescription, cancellationMail, changeMail, confirmationMail, CREW_CAUTIONS, promotionMail, reminderMail, waitlistMail,
  type CrewMailContext, type CrewMailWorkday,
} from '../../server/domain/crew-mails.js';

const workday = (over: Partial<CrewMailWorkday> = {}): CrewMailWorkday => ({
  id: '0b7e4f5e-1111-4111-8111-111111111111',
  title: 'Planting at North Cove',
  startsAt: new Date('2025-08-16T11:30:00Z'),
  endsAt: new Date('2025-08-16T15:30:00Z'),
  timeZone: 'America/New_York',
  siteName: 'North Cove',
  meetingPoint: '',
  launchName: 'Cove Road launch',
  whatToBring: 'Water shoes, 2 litres of water',
  cancelMessage: '',
  ...over,
});
const ctx: CrewMailContext = {
  appUrl: 'https://ebbroot.example',
  recipientName: 'Ana',
  organisationName: 'Bay Mangroves',
  unsubscribeUrl: 'https://ebbroot.example/api/unsubscribe/reminders?u=abc&t=xyz',
};
const page = 'https://ebbroot.example/workdays/0b7e4f5e-1111-4111-8111-111111111111';

const all = {
  confirmation: confirmationMail(workday(), ctx, 'Planter'),
  waitlist: waitlistMail(workday(), ctx, 'Planter', 3),
  promotion: promotionMail(workday(), ctx, 'Planter'),
  reminder: reminderMail(workday(), ctx, 'Planter'),
  change: changeMail(workday(), ctx, 'The start moved to 7:30 AM.'),
  cancellation: cancellationMail(workday({ cancelMessage: 'Small-craft advisory for the bay.' }), ctx),
};

describe('crew e-mails', () => {
  it.each(Object.entries(all))('%s: date and hours in the site zone, the site, the launch as meeting point, the page link', (_kind, mail) => {
    for (const body of [mail.text, mail.html]) {
      expect(body).toContain('Saturday, August 16, 2025, 7:30 AM – 11:30 AM EDT');
      expect(body).toContain('North Cove');
      expect(body).toContain('Cove Road launch');
      expect(body).toContain(page);
    }
    expect(mail.text).toContain('Hello Ana,');
  });

  it.each(Object.entries(all))('%s: carries the unsubscribe-from-reminders link, escaped in HTML', (_kind, mail) => {
    expect(mail.text).toContain(ctx.unsubscribeUrl);
    expect(mail.html).toContain('href="https://ebbroot.example/api/unsubscribe/reminders?u=abc&amp;t=xyz"');
  });

  it.each(Object.entries(all))('%s: never calls anything safe (DESIGN.md, Safety)', (_kind, mail) => {
    expect(`${mail.subject} ${mail.text} ${mail.html}`).not.toMatch(/\bsafe(ly|ty)?\b/i);
  });

  it.each(['confirmation', 'waitlist', 'promotion', 'reminder', 'change'] as const)('%s: lists the cautions and defers to local rules and the boat operator', (kind) => {
    const mail = all[kind];
    expect(mail.text).toMatch(/life jacket/);
    expect(mail.text).toMatch(/thunder or lightning, head for shore/);
    expect(mail.text).toMatch(/soft mud and sharp oyster shell/);
    expect(mail.text).toMatch(/float plan/);
    expect(mail.text).toMatch(/heat/);
    expect(mail.text).toContain("Local rules, permits and the boat operator's word come first.");
    expect(mail.html).toContain('Local rules, permits and the boat operator&#39;s word come first.');
  });

  it('cancellation: carries the coordinator message and no day-of cautions', () => {
    expect(all.cancellation.subject).toBe('Cancelled: Planting at North Cove, Sat, Aug 16');
    expect(all.cancellation.text).toContain('Message from the coordinator: Small-craft advisory for the bay.');
    expect(all.cancellation.text).not.toContain(CREW_CAUTIONS[0]);
  });

  it('waitlist: says the place in line', () => {
    expect(all.waitlist.subject).toBe('Waitlist, number 3: Planting at North Cove, Sat, Aug 16');
    expect(all.waitlist.text).toContain('number 3 in line');
  });

  it('reminder and change: subject with local start, change summary in the body', () => {
    expect(all.reminder.subject).toBe('Reminder: Planting at North Cove, Sat, Aug 16 at 7:30 AM EDT');
    expect(all.change.text).toContain('The start moved to 7:30 AM.');
  });

  it('escapes every value in HTML and keeps subject lines on one line', () => {
    const mail = confirmationMail(workday({ title: 'Plant <b>"big"</b> &\nmore', meetingPoint: '<script>x</script>', whatToBring: "Hat & 'gloves'" }), { ...ctx, recipientName: '<i>Ana</i>' }, 'Planter');
    expect(mail.html).not.toMatch(/<b>|<script>|<i>/);
    expect(mail.html).toContain('Plant &lt;b&gt;&quot;big&quot;&lt;/b&gt; &amp;');
    expect(mail.html).toContain('&lt;script&gt;x&lt;/script&gt;');
    expect(mail.html).toContain('Hat &amp; &#39;gloves&#39;');
    expect(mail.text).toContain('Meeting point: <script>x</script>');
    expect(mail.subject).toBe('You\'re on the crew: Plant <b>"big"</b> & more, Sat, Aug 16');
  });

  it('shows the meeting point when set, what to bring only when given', () => {
    const mail = reminderMail(workday({ meetingPoint: 'Boat ramp, north lot', whatToBring: '' }), ctx, 'Shore crew');
    expect(mail.text).toContain('Meeting point: Boat ramp, north lot');
    expect(mail.text).not.toContain('Bring:');
    expect(mail.text).toContain('Your role: Shore crew');
  });

  it('calendar description: details, cautions and the page link as plain text', () => {
    const text = calendarDescription({ ...workday(), description: 'Red mangrove pots, 40 trees.' }, ctx.appUrl);
    expect(text).toContain('Red mangrove pots, 40 trees.');
    expect(text).toContain('Meeting point: Cove Road launch');
    expect(text).toContain(CREW_CAUTIONS[1]);
    expect(text.endsWith(page)).toBe(true);
  });
});
