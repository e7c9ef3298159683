import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { Signup } from '../../server/db/entities/signup.entity.js';
import { buildWorkday } from '../factories/workday.factory.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const waiver = { accepted: true, signedName: 'Test Person' };
const signUp = async (workdayId: string, body: object = {}) => {
  const v = await authAgentFor(t, 'volunteer');
  const res = await v.agent.post(`/api/workdays/${workdayId}/signups`).set('X-CSRF-Token', v.token).send({ role: 'planter', waiver, ...body });
  return { ...v, res };
};

describe('POST /api/workdays/:id/signups', () => {
  it('confirms a place, records the waiver, and gives the same place on a second try', async () => {
    const w = await buildWorkday(t.db, { capacity: 3 });
    const { agent, token, user, res } = await signUp(w.id, { emergencyContact: { name: 'Kim Harbor', phone: '+1 727 555 0100' } });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ status: 'confirmed', role: 'planter' });
    const again = await agent.post(`/api/workdays/${w.id}/signups`).set('X-CSRF-Token', token).send({ role: 'planter', waiver });
    expect(again.status).toBe(200);
    expect(again.body.id).toBe(res.body.id);
    const stored = await t.db.getRepository(Signup).findOneByOrFail({ id: res.body.id });
    expect(stored).toMatchObject({ userId: user.id, waiverVersion: 1, waiverSignedName: 'Test Person' });
    expect(await t.db.getRepository(Signup).countBy({ workdayId: w.id, userId: user.id })).toBe(1);
    expect((await agent.get('/api/me/profile')).body.profile.emergencyContact).toEqual({ name: 'Kim Harbor', phone: '+1 727 555 0100' });
  });

  it('puts people on the waitlist in order once the crew is full', async () => {
    const w = await buildWorkday(t.db, { capacity: 1 });
    expect((await signUp(w.id)).res.body.status).toBe('confirmed');
    const second = await signUp(w.id);
    const third = await signUp(w.id);
    expect(second.res.status).toBe(201);
    expect(second.res.body).toMatchObject({ status: 'waitlisted', position: 1 });
    expect(third.res.body).toMatchObject({ status: 'waitlisted', position: 2 });
  });

  it('caps each role when the workday has role caps and refuses roles not offered', async () => {
    const w = await buildWorkday(t.db, { capacity: 5, roles: [{ role: 'seat', capacity: 1 }, { role: 'shore', capacity: 4 }] });
    expect((await signUp(w.id, { role: 'seat' })).res.body.status).toBe('confirmed');
    expect((await signUp(w.id, { role: 'seat' })).res.body).toMatchObject({ status: 'waitlisted', position: 1 });
    expect((await signUp(w.id, { role: 'shore' })).res.body.status).toBe('confirmed');
    const planter = await signUp(w.id, { role: 'planter' });
    expect(planter.res.status).toBe(400);
    expect(ErrorBody.parse(planter.res.body).error.fields).toHaveProperty('role');
  });

  it('asks an own-kayak paddler to describe the kayak', async () => {
    const w = await buildWorkday(t.db);
    const { res } = await signUp(w.id, { role: 'own-kayak' });
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('ownCraft');
    const ok = await signUp(w.id, { role: 'own-kayak', ownCraft: { kind: 'sit-on-top-kayak', seats: 1, maxLoadKg: 150 } });
    expect(ok.res.status).toBe(201);
  });

  it('refuses a missing or unaccepted waiver and stores nothing', async () => {
    const w = await buildWorkday(t.db);
    const { res } = await signUp(w.id, { waiver: { accepted: false, signedName: 'X Y' } });
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('waiver.accepted');
    expect(await t.db.getRepository(Signup).countBy({ workdayId: w.id })).toBe(0);
  });

  it('answers 404 for drafts and 409 once the workday has started', async () => {
    const draft = await buildWorkday(t.db, { status: 'draft' });
    expect((await signUp(draft.id)).res.status).toBe(404);
    const started = await buildWorkday(t.db, { startsAt: new Date(Date.now() - 3_600_000), endsAt: new Date(Date.now() + 3_600_000) });
    expect((await signUp(started.id)).res.status).toBe(409);
  });
});

describe('minors', () => {
  const day = (w: { startsAt: Date }) => w.startsAt.toISOString().slice(0, 10);
  const yearsBefore = (date: string, years: number) => `${Number(date.slice(0, 4)) - years}${date.slice(4)}`;

  it('needs a guardian for anyone under 18 on the day', async () => {
    const w = await buildWorkday(t.db);
    const dob = yearsBefore(day(w), 15);
    const alone = await signUp(w.id, { dateOfBirth: dob });
    expect(alone.res.status).toBe(400);
    expect(ErrorBody.parse(alone.res.body).error.fields).toHaveProperty('guardian');
    const guardian = { name: 'Pat Parent', phone: '727 555 0199', relationship: 'parent', signedName: 'Pat Parent' };
    const withGuardian = await signUp(w.id, { dateOfBirth: dob, guardian });
    expect(withGuardian.res.status).toBe(201);
    expect(await t.db.getRepository(Signup).findOneByOrFail({ id: withGuardian.res.body.id })).toMatchObject({ isMinor: true, guardian: { name: 'Pat Parent', signedName: 'Pat Parent' } });
  });

  it('accepts a guardian already on the crew, and refuses one who is not', async () => {
    const w = await buildWorkday(t.db);
    const parent = await signUp(w.id, { dateOfBirth: yearsBefore(day(w), 40) });
    const kid = await signUp(w.id, { dateOfBirth: yearsBefore(day(w), 12), guardian: { userId: parent.user.id } });
    expect(kid.res.status).toBe(201);
    const stranger = await signUp(w.id, { dateOfBirth: yearsBefore(day(w), 12), guardian: { userId: '00000000-0000-4000-8000-000000000000' } });
    expect(stranger.res.status).toBe(400);
  });

  it('refuses anyone under the minimum age', async () => {
    const w = await buildWorkday(t.db, { minimumAge: 14 });
    const guardian = { name: 'Pat Parent', phone: '727 555 0199', relationship: 'parent', signedName: 'Pat Parent' };
    const res = (await signUp(w.id, { dateOfBirth: yearsBefore(day(w), 13), guardian })).res;
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('dateOfBirth');
  });
});

describe('DELETE /api/workdays/:id/signups/mine', () => {
  it('frees the place and promotes the first in line', async () => {
    const w = await buildWorkday(t.db, { capacity: 1 });
    const first = await signUp(w.id);
    const waiting = await signUp(w.id);
    expect(waiting.res.body.status).toBe('waitlisted');
    const del = await first.agent.delete(`/api/workdays/${w.id}/signups/mine`).set('X-CSRF-Token', first.token);
    expect(del.status).toBe(204);
    expect((await waiting.agent.get(`/api/workdays/${w.id}/signups/mine`)).body).toMatchObject({ status: 'confirmed' });
    expect((await first.agent.get(`/api/workdays/${w.id}/signups/mine`)).status).toBe(404);
  });

  it('refuses once the workday has started', async () => {
    const w = await buildWorkday(t.db, { startsAt: new Date(Date.now() - 3_600_000), endsAt: new Date(Date.now() + 3_600_000) });
    const v = await authAgentFor(t, 'volunteer');
    await t.db.getRepository(Signup).insert({ workdayId: w.id, userId: v.user.id, role: 'planter', status: 'confirmed', queuedAt: new Date(), waiverVersion: 1, waiverSignedName: 'V', waiverSignedAt: new Date() });
    const res = await v.agent.delete(`/api/workdays/${w.id}/signups/mine`).set('X-CSRF-Token', v.token);
    expect(res.status).toBe(409);
    expect(await t.db.getRepository(Signup).countBy({ workdayId: w.id, status: 'confirmed' })).toBe(1);
  });
});
