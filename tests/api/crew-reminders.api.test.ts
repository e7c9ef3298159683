/** Reminders 48 hours before a workday, and the unsubscribe-from-reminders link. */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { OutboxMessage } from '../../server/db/entities/outbox-message.entity.js';
import { VolunteerProfile } from '../../server/db/entities/volunteer-profile.entity.js';
import { reminderOptOutToken } from '../../server/services/reminder-opt-out.service.js';
import { buildSignup, setProfile } from '../factories/signup.factory.js';
import { buildUser } from '../factories/user.factory.js';
import { buildWorkday } from '../factories/workday.factory.js';
import { eventually, waitForMail } from '../setup/mail-inbox.js';
import { createTestApp, mailTo, type TestApp } from '../setup/test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const HOUR = 3_600_000;
const inHours = (h: number) => new Date(Math.ceil((Date.now() + h * HOUR) / 60_000) * 60_000);
const reminderRows = (workdayId: string, userId: string) => t.db.getRepository(OutboxMessage).findBy({ dedupeKey: `reminder:${workdayId}:${userId}` });
const optedOut = async (userId: string) => (await t.db.getRepository(VolunteerProfile).findOneBy({ userId }))?.remindersOptOut ?? false;

describe('reminder job', () => {
  it('sends exactly one reminder per confirmed person per workday, however often it runs', async () => {
    const workday = await buildWorkday(t.db, { title: 'Tomorrow planting', startsAt: inHours(24) });
    const user = await buildUser(t.db);
    await buildSignup(t.db, { workdayId: workday.id, userId: user.id });

    await Promise.all([t.background.runReminders(), t.background.runReminders()]);
    await t.background.runReminders();

    const mail = await waitForMail(t.config, user.email, /^Reminder: Tomorrow planting/);
    expect(mail.text).toContain('A reminder that you are on the crew');
    await eventually(async () => (await reminderRows(workday.id, user.id))[0]?.status === 'sent', 'the reminder marked sent');
    await t.background.runReminders();
    await t.background.drain();
    await new Promise((r) => setTimeout(r, 1000));
    expect(await reminderRows(workday.id, user.id)).toHaveLength(1);
    expect((await mailTo(t.config, user.email)).filter((m) => m.subject.startsWith('Reminder:'))).toHaveLength(1);
  });

  it('skips people who opted out, the waitlist, drafts, workdays further off and workdays already started', async () => {
    const soon = await buildWorkday(t.db, { startsAt: inHours(30) });
    const [optedOutUser, waiting] = [await buildUser(t.db), await buildUser(t.db)];
    await setProfile(t.db, optedOutUser.id, { remindersOptOut: true });
    await buildSignup(t.db, { workdayId: soon.id, userId: optedOutUser.id });
    await buildSignup(t.db, { workdayId: soon.id, userId: waiting.id, status: 'waitlisted' });

    const other = await buildUser(t.db);
    const draft = await buildWorkday(t.db, { status: 'draft', startsAt: inHours(20) });
    const later = await buildWorkday(t.db, { startsAt: inHours(49) });
    const started = await buildWorkday(t.db, { startsAt: inHours(-1), endsAt: inHours(3) });
    for (const w of [draft, later, started]) await buildSignup(t.db, { workdayId: w.id, userId: other.id });

    await t.background.runReminders();
    for (const [w, u] of [[soon, optedOutUser], [soon, waiting], [draft, other], [later, other], [started, other]] as const) {
      expect(await reminderRows(w.id, u.id)).toHaveLength(0);
    }
  });
});

describe('GET /api/unsubscribe/reminders', () => {
  it('turns reminders off from the link in a reminder e-mail; later reminders are not sent', async () => {
    const first = await buildWorkday(t.db, { title: 'Link source', startsAt: inHours(40) });
    const user = await buildUser(t.db);
    await buildSignup(t.db, { workdayId: first.id, userId: user.id });
    await t.background.runReminders();
    const mail = await waitForMail(t.config, user.email, /^Reminder: Link source/);
    const link = /http:\/\/127\.0\.0\.1:5180(\/api\/unsubscribe\/reminders\?u=[\w-]+&t=[\w-]+)/.exec(mail.text)?.[1];
    expect(link).toBeDefined();

    const res = await request(t.app).get(link!);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/html/);
    expect(res.text).toContain('Reminders turned off');
    expect(await optedOut(user.id)).toBe(true);

    const second = await buildWorkday(t.db, { startsAt: inHours(45) });
    await buildSignup(t.db, { workdayId: second.id, userId: user.id });
    await t.background.runReminders();
    expect(await reminderRows(second.id, user.id)).toHaveLength(0);
  });

  it('refuses a forged or borrowed token with a 400 page and changes nothing', async () => {
    const [victim, attacker] = [await buildUser(t.db), await buildUser(t.db)];
    const forged = reminderOptOutToken('not-the-session-secret', victim.id);
    const borrowed = reminderOptOutToken(t.config.SESSION_SECRET, attacker.id);
    for (const query of [{ u: victim.id, t: forged }, { u: victim.id, t: borrowed }, { u: victim.id }, { u: 'not-a-uuid', t: borrowed }]) {
      const res = await request(t.app).get('/api/unsubscribe/reminders').query(query);
      expect(res.status).toBe(400);
      expect(res.text).toContain('This link does not work');
    }
    expect(await optedOut(victim.id)).toBe(false);
  });
});
