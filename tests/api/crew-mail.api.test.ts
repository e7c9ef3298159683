/**
 * Crew e-mails through the outbox: the notifier writes rows inside the caller's transaction,
 * the pg-boss sender delivers them to the SMTP fake. Workdays and sign-ups are inserted with
 * factories; the notifier is called the way the crew services call it.
 */
import type { EntityManager } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createSmtpMailer } from '../../server/adapters/email.js';
import { OutboxMessage } from '../../server/db/entities/outbox-message.entity.js';
import { Signup } from '../../server/db/entities/signup.entity.js';
import { Workday } from '../../server/db/entities/workday.entity.js';
import { createOutboxSender } from '../../server/services/outbox-sender.service.js';
import { queueMails } from '../../server/services/crew-outbox.js';
import { buildSignup } from '../factories/signup.factory.js';
import { buildSite } from '../factories/site.factory.js';
import { buildUser } from '../factories/user.factory.js';
import { buildWorkday } from '../factories/workday.factory.js';
import { parseCalendar } from '../setup/ics.js';
import { attachmentText, eventually, waitForMail } from '../setup/mail-inbox.js';
import { createTestApp, mailTo, type TestApp } from '../setup/test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const outbox = () => t.db.getRepository(OutboxMessage);
const notify = <T>(fn: (tx: EntityManager) => Promise<T>) => t.db.transaction(fn);

describe('confirmation e-mail', () => {
  it('reaches the SMTP fake with a workday-<id>.ics that parses as one RFC 5545 VEVENT in UTC', async () => {
    const site = await buildSite(t.db, { timeZone: 'America/New_York', launchName: 'Cove Road launch' });
    const workday = await buildWorkday(t.db, { siteId: site.id, title: 'Planting at the cove', startsAt: new Date('2031-08-16T11:30:00Z'), endsAt: new Date('2031-08-16T15:30:00Z'), sequence: 2 });
    const user = await buildUser(t.db, { name: 'Ana Volunteer' });
    const signup = await buildSignup(t.db, { workdayId: workday.id, userId: user.id, role: 'planter' });

    await notify((tx) => t.background.notifier.signupConfirmed(tx, signup.id));
    await t.background.notifier.flush();

    const mail = await waitForMail(t.config, user.email, /^You're on the crew: Planting at the cove/);
    expect(mail.text).toContain('Saturday, August 16, 2031, 7:30 AM – 11:30 AM EDT');
    expect(mail.text).toContain('Meeting point: Cove Road launch');
    expect(mail.text).toContain(`http://127.0.0.1:5180/workdays/${workday.id}`);
    expect(mail.text).toMatch(/http:\/\/127\.0\.0\.1:5180\/api\/unsubscribe\/reminders\?u=[\w-]+&t=[\w-]+/);
    expect(mail.html).toContain('Open the workday page');
    expect(mail.attachments).toEqual([`workday-${workday.id}.ics`]);

    const ics = await attachmentText(t.config.MAIL_INSPECT_URL, mail.id);
    expect(ics.contentType).toMatch(/^text\/calendar/);
    const { events } = parseCalendar(ics.text);
    expect(events).toHaveLength(1);
    expect(events[0]).toMatchObject({ uid: `workday-${workday.id}@127.0.0.1`, sequence: 2, status: 'CONFIRMED', summary: 'Planting at the cove', allUtc: true });
    expect(events[0]!.start.toISOString()).toBe('2031-08-16T11:30:00.000Z');
    expect(events[0]!.end.toISOString()).toBe('2031-08-16T15:30:00.000Z');
    expect(ics.text).toMatch(/\r\nDTSTART:20310816T113000Z\r\n/);

    const row = await eventually(async () => {
      const r = await outbox().findOneByOrFail({ dedupeKey: `confirmed:${signup.id}` });
      return r.status === 'sent' ? r : undefined;
    }, 'the row marked sent');
    expect(row).toMatchObject({ kind: 'signup-confirmed', attempts: 1, lastError: '' });
    expect(row.sentAt).toBeInstanceOf(Date);
  });

  it('writes one row however often the notifier is called for the same sign-up', async () => {
    const workday = await buildWorkday(t.db);
    const user = await buildUser(t.db);
    const signup = await buildSignup(t.db, { workdayId: workday.id, userId: user.id });
    await notify(async (tx) => {
      await t.background.notifier.signupConfirmed(tx, signup.id);
      await t.background.notifier.signupConfirmed(tx, signup.id);
    });
    await notify((tx) => t.background.notifier.signupConfirmed(tx, signup.id));
    expect(await outbox().countBy({ toAddress: user.email })).toBe(1);
  });

  it('writes nothing when the caller rolls back', async () => {
    const workday = await buildWorkday(t.db);
    const user = await buildUser(t.db);
    const signup = await buildSignup(t.db, { workdayId: workday.id, userId: user.id });
    await expect(notify(async (tx) => {
      await t.background.notifier.signupConfirmed(tx, signup.id);
      throw new Error('the sign-up failed after all');
    })).rejects.toThrow('the sign-up failed after all');
    expect(await outbox().countBy({ toAddress: user.email })).toBe(0);
  });
});

describe('waitlist and promotion e-mails', () => {
  it('tells each waitlisted person their place among the same role, then the promoted one gets a calendar file', async () => {
    const workday = await buildWorkday(t.db, { roles: [{ role: 'planter', capacity: 1 }, { role: 'shore', capacity: 1 }] });
    const [first, second, shore] = [await buildUser(t.db), await buildUser(t.db), await buildUser(t.db)];
    const base = Date.now();
    const s1 = await buildSignup(t.db, { workdayId: workday.id, userId: first.id, status: 'waitlisted', queuedAt: new Date(base) });
    const s2 = await buildSignup(t.db, { workdayId: workday.id, userId: second.id, status: 'waitlisted', queuedAt: new Date(base + 1000) });
    const s3 = await buildSignup(t.db, { workdayId: workday.id, userId: shore.id, role: 'shore', status: 'waitlisted', queuedAt: new Date(base + 2000) });
    await notify(async (tx) => {
      for (const s of [s1, s2, s3]) await t.background.notifier.signupWaitlisted(tx, s.id);
    });
    await t.background.notifier.flush();
    expect((await waitForMail(t.config, first.email, /^Waitlist/)).subject).toMatch(/^Waitlist, number 1: /);
    const notice = await waitForMail(t.config, second.email, /^Waitlist/);
    expect(notice.subject).toMatch(/^Waitlist, number 2: /);
    expect(notice.attachments).toEqual([]);
    expect((await waitForMail(t.config, shore.email, /^Waitlist/)).subject).toMatch(/^Waitlist, number 1: /);

    await t.db.getRepository(Signup).update({ id: s1.id }, { status: 'confirmed' });
    await notify((tx) => t.background.notifier.signupPromoted(tx, s1.id));
    await t.background.notifier.flush();
    const promoted = await waitForMail(t.config, first.email, /^A place opened up/);
    expect(promoted.attachments).toEqual([`workday-${workday.id}.ics`]);
  });
});

describe('change and cancellation notices', () => {
  it('go to the confirmed and waitlisted crew, keyed by SEQUENCE, with the new times and the coordinator message', async () => {
    const workday = await buildWorkday(t.db, { title: 'Nursery day' });
    const [onCrew, waiting, left] = [await buildUser(t.db), await buildUser(t.db), await buildUser(t.db)];
    await buildSignup(t.db, { workdayId: workday.id, userId: onCrew.id });
    await buildSignup(t.db, { workdayId: workday.id, userId: waiting.id, status: 'waitlisted' });
    await buildSignup(t.db, { workdayId: workday.id, userId: left.id, status: 'cancelled', cancelledAt: new Date() });

    const moved = new Date(workday.startsAt.getTime() + 3_600_000);
    await notify(async (tx) => {
      await tx.getRepository(Workday).update({ id: workday.id }, { startsAt: moved, sequence: workday.sequence + 1 });
      await t.background.notifier.workdayChanged(tx, workday.id, 'The start moved one hour later.');
      await t.background.notifier.workdayChanged(tx, workday.id, 'The start moved one hour later.');
    });
    await t.background.notifier.flush();
    const change = await waitForMail(t.config, onCrew.email, /^Changed: Nursery day/);
    expect(change.text).toContain('The start moved one hour later.');
    const { events } = parseCalendar((await attachmentText(t.config.MAIL_INSPECT_URL, change.id)).text);
    expect(events[0]).toMatchObject({ sequence: workday.sequence + 1 });
    expect(events[0]!.start.toISOString()).toBe(moved.toISOString());
    await waitForMail(t.config, waiting.email, /^Changed: Nursery day/);
    expect(await outbox().countBy({ toAddress: onCrew.email, kind: 'workday-changed' })).toBe(1);

    await notify(async (tx) => {
      await tx.getRepository(Workday).update({ id: workday.id }, { status: 'cancelled', cancelMessage: 'Lightning forecast all morning.', sequence: workday.sequence + 2 });
      await t.background.notifier.workdayCancelled(tx, workday.id);
    });
    await t.background.notifier.flush();
    const cancel = await waitForMail(t.config, waiting.email, /^Cancelled: Nursery day/);
    expect(cancel.text).toContain('Message from the coordinator: Lightning forecast all morning.');
    await waitForMail(t.config, onCrew.email, /^Cancelled: Nursery day/);
    expect(await outbox().countBy({ toAddress: left.email })).toBe(0);
  });
});

describe('outbox sending', () => {
  it('delivers a pending row that was never queued (a crash between commit and enqueue) on the next sweep', async () => {
    const to = `sweep.${Date.now()}@test.ebbroot.test`;
    await queueMails(t.db.manager, [{ kind: 'test', to, content: { subject: 'Left behind', text: 'hello', html: '' }, dedupeKey: `test:${to}` }]);
    await t.background.drain();
    expect((await waitForMail(t.config, to, /^Left behind$/)).text).toContain('hello');
  });

  it('sends a row once even when several senders race for it', async () => {
    const to = `race.${Date.now()}@test.ebbroot.test`;
    await queueMails(t.db.manager, [{ kind: 'test', to, content: { subject: 'Only once', text: 'x', html: '' }, dedupeKey: `test:${to}` }]);
    const row = await outbox().findOneByOrFail({ toAddress: to });
    const mailer = createSmtpMailer({ host: t.config.SMTP_HOST, port: t.config.SMTP_PORT, from: t.config.MAIL_FROM });
    const sender = createOutboxSender({ db: t.db, mailer, clock: () => new Date(), log: () => undefined });
    const outcomes = await Promise.all(Array.from({ length: 6 }, () => sender.send(row.id)));
    mailer.close();
    expect(outcomes.filter((o) => o === 'sent')).toHaveLength(1);
    await t.background.drain();
    await new Promise((r) => setTimeout(r, 1500));
    expect(await mailTo(t.config, to)).toHaveLength(1);
  });

  it('schedules the sweeper every minute and the reminders hourly in pg-boss', async () => {
    const rows: { name: string; cron: string }[] = await t.db.query(`SELECT name, cron FROM pgboss.schedule WHERE name IN ('outbox-sweep', 'crew-reminders') ORDER BY name`);
    expect(rows).toEqual([{ name: 'crew-reminders', cron: '7 * * * *' }, { name: 'outbox-sweep', cron: '* * * * *' }]);
  });
});
