/** Calendar files and feeds, parsed with ical.js as a calendar client would (RFC 5545). */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Workday } from '../../server/db/entities/workday.entity.js';
import { buildSignup } from '../factories/signup.factory.js';
import { buildUser } from '../factories/user.factory.js';
import { buildWorkday } from '../factories/workday.factory.js';
import { parseCalendar } from '../setup/ics.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const DAY = 86_400_000;
const uid = (id: string) => `workday-${id}@127.0.0.1`;
const pathOf = (url: string) => new URL(url).pathname;
const get = (path: string) => request(t.app).get(path);
const eventsAt = async (path: string) => {
  const res = await get(path);
  expect(res.status).toBe(200);
  expect(res.headers['content-type']).toBe('text/calendar; charset=utf-8');
  // RFC 5545 §3.7.3 shows PRODID as a formal public identifier starting with a single "-//".
  expect(res.text).toMatch(/^PRODID:-\/\/Ebbroot\/\/Workdays\/\/EN\r?$/m);
  return parseCalendar(res.text).events;
};

describe('GET /api/workdays/:id.ics', () => {
  it('gives anyone a published workday as one VEVENT: stable UID, SEQUENCE, UTC times, URL', async () => {
    const w = await buildWorkday(t.db, { title: 'Shore planting', sequence: 4 });
    for (const path of [`/api/workdays/${w.id}.ics`, `/api/calendar/workdays/${w.id}.ics`]) {
      const events = await eventsAt(path);
      expect(events).toHaveLength(1);
      expect(events[0]).toMatchObject({ uid: uid(w.id), sequence: 4, status: 'CONFIRMED', summary: 'Shore planting', url: `http://127.0.0.1:5180/workdays/${w.id}`, allUtc: true });
      expect(events[0]!.start.toISOString()).toBe(w.startsAt.toISOString());
      expect(events[0]!.end.toISOString()).toBe(w.endsAt.toISOString());
      expect(events[0]!.location).toContain('Test launch');
      expect(events[0]!.description).toContain('life jacket');
    }
  });

  it('hides drafts from everyone but coordinators and admins', async () => {
    const draft = await buildWorkday(t.db, { status: 'draft' });
    expect((await get(`/api/workdays/${draft.id}.ics`)).status).toBe(404);
    const volunteer = await authAgentFor(t, 'volunteer');
    expect((await volunteer.agent.get(`/api/workdays/${draft.id}.ics`)).status).toBe(404);
    const coordinator = await authAgentFor(t, 'coordinator');
    const res = await coordinator.agent.get(`/api/workdays/${draft.id}.ics`);
    expect(res.status).toBe(200);
    expect(res.text).toContain(`UID:${uid(draft.id)}`);
  });

  it('reflects an edit with a raised SEQUENCE under the same UID, and a cancellation as STATUS:CANCELLED', async () => {
    const w = await buildWorkday(t.db, { sequence: 1 });
    const moved = new Date(w.startsAt.getTime() + 2 * 3_600_000);
    await t.db.getRepository(Workday).update({ id: w.id }, { startsAt: moved, endsAt: new Date(moved.getTime() + 3_600_000), sequence: 2 });
    const [edited] = await eventsAt(`/api/workdays/${w.id}.ics`);
    expect(edited).toMatchObject({ uid: uid(w.id), sequence: 2 });
    expect(edited!.start.toISOString()).toBe(moved.toISOString());

    await t.db.getRepository(Workday).update({ id: w.id }, { status: 'cancelled', cancelMessage: 'High wind', sequence: 3 });
    const [cancelled] = await eventsAt(`/api/workdays/${w.id}.ics`);
    expect(cancelled).toMatchObject({ uid: uid(w.id), sequence: 3, status: 'CANCELLED' });
    expect(cancelled!.description).toContain('High wind');
  });
});

describe('GET /api/calendar/organisation.ics', () => {
  it('lists published, cancelled and recently completed workdays, not drafts or old ones', async () => {
    const published = await buildWorkday(t.db);
    const cancelled = await buildWorkday(t.db, { status: 'cancelled' });
    const completed = await buildWorkday(t.db, { status: 'completed', startsAt: new Date(Date.now() - 10 * DAY) });
    const draft = await buildWorkday(t.db, { status: 'draft' });
    const old = await buildWorkday(t.db, { status: 'completed', startsAt: new Date(Date.now() - 90 * DAY) });
    const events = await eventsAt('/api/calendar/organisation.ics');
    const byUid = new Map(events.map((e) => [e.uid, e]));
    expect(byUid.get(uid(published.id))?.status).toBe('CONFIRMED');
    expect(byUid.get(uid(cancelled.id))?.status).toBe('CANCELLED');
    expect(byUid.has(uid(completed.id))).toBe(true);
    expect(byUid.has(uid(draft.id))).toBe(false);
    expect(byUid.has(uid(old.id))).toBe(false);
    expect(events.every((e) => e.allUtc)).toBe(true);
  });
});

describe('personal calendar feed', () => {
  it('lists my confirmed workdays and my waitlisted ones as TENTATIVE, behind a secret URL', async () => {
    const me = await authAgentFor(t, 'volunteer');
    const someoneElse = await buildUser(t.db);
    const [onCrew, waiting, withdrawn, notMine] = [await buildWorkday(t.db), await buildWorkday(t.db), await buildWorkday(t.db), await buildWorkday(t.db)];
    await buildSignup(t.db, { workdayId: onCrew.id, userId: me.user.id });
    await buildSignup(t.db, { workdayId: waiting.id, userId: me.user.id, status: 'waitlisted' });
    await buildSignup(t.db, { workdayId: withdrawn.id, userId: me.user.id, status: 'cancelled', cancelledAt: new Date() });
    await buildSignup(t.db, { workdayId: notMine.id, userId: someoneElse.id });

    expect((await me.agent.get('/api/me/calendar-token')).body).toEqual({ url: null });
    const created = await me.agent.post('/api/me/calendar-token').set('X-CSRF-Token', me.token);
    expect(created.status).toBe(200);
    const url = (created.body as { url: string }).url;
    expect(url).toMatch(/^http:\/\/127\.0\.0\.1:5180\/api\/calendar\/personal\/[\w-]{43}\.ics$/);
    expect((await me.agent.get('/api/me/calendar-token')).body).toEqual({ url });

    const events = await eventsAt(pathOf(url));
    const byUid = new Map(events.map((e) => [e.uid, e]));
    expect(byUid.get(uid(onCrew.id))?.status).toBe('CONFIRMED');
    expect(byUid.get(uid(waiting.id))).toMatchObject({ status: 'TENTATIVE', summary: expect.stringMatching(/^Waitlist: /) });
    expect(byUid.has(uid(withdrawn.id))).toBe(false);
    expect(byUid.has(uid(notMine.id))).toBe(false);
    expect(events).toHaveLength(2);
  });

  it('stops answering the old URL when rotated, and any URL when deleted', async () => {
    const me = await authAgentFor(t, 'volunteer');
    const first = (await me.agent.post('/api/me/calendar-token').set('X-CSRF-Token', me.token)).body.url as string;
    const second = (await me.agent.post('/api/me/calendar-token').set('X-CSRF-Token', me.token)).body.url as string;
    expect(second).not.toBe(first);
    expect((await get(pathOf(first))).status).toBe(404);
    expect((await get(pathOf(second))).status).toBe(200);

    expect((await me.agent.delete('/api/me/calendar-token').set('X-CSRF-Token', me.token)).status).toBe(204);
    expect((await get(pathOf(second))).status).toBe(404);
    expect((await me.agent.get('/api/me/calendar-token')).body).toEqual({ url: null });
  });

  it('answers 404 for a made-up token', async () => {
    expect((await get(`/api/calendar/personal/${'A'.repeat(43)}.ics`)).status).toBe(404);
    expect((await get('/api/calendar/personal/short.ics')).status).toBe(404);
  });
});
