import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditLog } from '../../server/db/entities/audit-log.entity.js';
import { buildWorkday } from '../factories/workday.factory.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const waiver = { accepted: true, signedName: 'Crew Member' };

async function crewOf(workdayId: string, n: number) {
  const people = [];
  for (let i = 0; i < n; i++) {
    const v = await authAgentFor(t, 'volunteer');
    const res = await v.agent.post(`/api/workdays/${workdayId}/signups`).set('X-CSRF-Token', v.token)
      .send({ role: 'planter', waiver, emergencyContact: { name: `Contact ${i}`, phone: '727 555 0101' } });
    people.push({ ...v, signupId: res.body.id as string });
  }
  return people;
}

describe('GET /api/workdays/:id/roster', () => {
  it('shows coordinators every row with contact data, confirmed first then the waitlist in order', async () => {
    const w = await buildWorkday(t.db, { capacity: 2 });
    const people = await crewOf(w.id, 3);
    const { agent } = await authAgentFor(t, 'coordinator');
    const res = await agent.get(`/api/workdays/${w.id}/roster`);
    expect(res.status).toBe(200);
    const rows = res.body.roster as { userId: string; status: string; position: number | null; emergencyContact: unknown; waiverVersion: number }[];
    expect(rows.map((r) => r.status)).toEqual(['confirmed', 'confirmed', 'waitlisted']);
    expect(rows[2]).toMatchObject({ userId: people[2]!.user.id, position: 1 });
    expect(rows[0]).toMatchObject({ emergencyContact: { name: expect.stringMatching(/^Contact/) }, waiverVersion: 1 });
    const csv = await agent.get(`/api/workdays/${w.id}/roster`).query({ format: 'csv' });
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    expect(csv.text.split('\r\n')[0]).toMatch(/^Name,E-mail,Role,Status/);
    expect(csv.text.trim().split('\r\n')).toHaveLength(4);
  });

  it('keeps contact data from volunteers, who see first names only', async () => {
    const w = await buildWorkday(t.db);
    const [me] = await crewOf(w.id, 1);
    expect((await me!.agent.get(`/api/workdays/${w.id}/roster`)).status).toBe(403);
    const crew = await me!.agent.get(`/api/workdays/${w.id}/crew`);
    expect(crew.status).toBe(200);
    expect(crew.body.crew).toEqual([{ firstName: 'Test', role: 'planter' }]);
    expect(JSON.stringify(crew.body)).not.toContain('@');
  });
});

describe('check-in at the launch', () => {
  it('counts hours from check-in to check-out, and audits a correction with its reason', async () => {
    const w = await buildWorkday(t.db);
    const [person] = await crewOf(w.id, 1);
    const { agent, token } = await authAgentFor(t, 'coordinator');
    const id = person!.signupId;
    expect((await agent.post(`/api/signups/${id}/check-out`).set('X-CSRF-Token', token).send({})).status).toBe(409);
    await agent.post(`/api/signups/${id}/check-in`).set('X-CSRF-Token', token).send({ at: '2026-12-05T13:00:00Z' }).expect(204);
    await agent.post(`/api/signups/${id}/check-out`).set('X-CSRF-Token', token).send({ at: '2026-12-05T17:30:00Z' }).expect(204);
    const hours = await person!.agent.get('/api/me/hours');
    expect(hours.body).toMatchObject({ totalMinutes: 270, totalHours: 4.5, workdaysAttended: 1 });

    const noReason = await agent.put(`/api/signups/${id}/hours`).set('X-CSRF-Token', token).send({ minutes: 240 });
    expect(noReason.status).toBe(400);
    await agent.put(`/api/signups/${id}/hours`).set('X-CSRF-Token', token).send({ minutes: 240, reason: 'Left early to move the trailer' }).expect(204);
    expect((await person!.agent.get('/api/me/hours')).body.totalMinutes).toBe(240);
    const audit = await t.db.getRepository(AuditLog).find({ where: { entityId: id }, order: { createdAt: 'ASC' } });
    expect(audit.map((a) => a.action)).toEqual(['check-in', 'check-out', 'hours-corrected']);
    expect(audit[2]).toMatchObject({ reason: 'Left early to move the trailer', before: { minutes: 270 }, after: { minutes: 240 } });
  });

  it('marks a no-show, which counts no hours', async () => {
    const w = await buildWorkday(t.db);
    const [person] = await crewOf(w.id, 1);
    const { agent, token } = await authAgentFor(t, 'coordinator');
    await agent.post(`/api/signups/${person!.signupId}/no-show`).set('X-CSRF-Token', token).expect(204);
    const roster = (await agent.get(`/api/workdays/${w.id}/roster`)).body.roster;
    expect(roster[0]).toMatchObject({ noShow: true, minutes: 0 });
  });

  it('refuses check-in for volunteers', async () => {
    const w = await buildWorkday(t.db);
    const [person] = await crewOf(w.id, 1);
    expect((await person!.agent.post(`/api/signups/${person!.signupId}/check-in`).set('X-CSRF-Token', person!.token).send({})).status).toBe(403);
  });
});
