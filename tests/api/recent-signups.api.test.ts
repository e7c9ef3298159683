import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Signup } from '../../server/db/entities/signup.entity.js';
import { buildSignup } from '../factories/signup.factory.js';
import { buildUser } from '../factories/user.factory.js';
import { buildWorkday } from '../factories/workday.factory.js';
import { authAgentFor, createTestApp, type Agent, type TestApp } from '../setup/test-app.js';

const now = new Date('2026-05-04T15:00:00Z');
const HOUR = 3_600_000;
const ago = (hours: number) => new Date(now.getTime() - hours * HOUR);

let t: TestApp;
let coordinator: Agent;
beforeAll(async () => {
  // Its own database: the list spans every upcoming workday, so other files' sign-ups would mix in.
  t = await createTestApp({ ownDatabase: 'recent_signups', clock: () => now });
  coordinator = (await authAgentFor(t, 'coordinator')).agent;
});
afterAll(() => t.close());

/** A sign-up taken `takenHoursAgo`, cancelled `cancelledHoursAgo` when given. */
async function place(workdayId: string, name: string, fields: Partial<Signup> & { takenHoursAgo: number; cancelledHoursAgo?: number }) {
  const { takenHoursAgo, cancelledHoursAgo, ...rest } = fields;
  const user = await buildUser(t.db, { name });
  const s = await buildSignup(t.db, { workdayId, userId: user.id, ...rest, ...(cancelledHoursAgo !== undefined && { status: 'cancelled', cancelledAt: ago(cancelledHoursAgo) }) });
  await t.db.query('UPDATE signup SET created_at = $2 WHERE id = $1', [s.id, ago(takenHoursAgo)]);
  return s;
}

describe('GET /api/signups/recent', () => {
  it('lists sign-ups and cancellations of upcoming workdays, newest first, with the workday', async () => {
    const upcoming = await buildWorkday(t.db, { title: 'Kayak planting', startsAt: new Date(now.getTime() + 3 * 24 * HOUR) });
    const ongoing = await buildWorkday(t.db, { title: 'Under way', startsAt: ago(1), endsAt: new Date(now.getTime() + 2 * HOUR) });
    const past = await buildWorkday(t.db, { title: 'Last week', startsAt: ago(7 * 24), endsAt: ago(7 * 24 - 4) });
    const draft = await buildWorkday(t.db, { title: 'Draft day', status: 'draft', startsAt: new Date(now.getTime() + 5 * 24 * HOUR) });
    await place(upcoming.id, 'Mara Quill', { takenHoursAgo: 30, role: 'planter' });
    await place(upcoming.id, 'Oren Vale', { takenHoursAgo: 50, cancelledHoursAgo: 1, role: 'seat' });
    await place(ongoing.id, 'Pia Lune', { takenHoursAgo: 5, role: 'shore', status: 'waitlisted' });
    await place(past.id, 'Quinn Roe', { takenHoursAgo: 0.5 });
    await place(draft.id, 'Rhea Sol', { takenHoursAgo: 0.2 });

    const res = await coordinator.get('/api/signups/recent');

    expect(res.status).toBe(200);
    expect(res.body.signups).toEqual([
      expect.objectContaining({ name: 'Oren Vale', role: 'seat', status: 'cancelled', at: ago(1).toISOString(), workday: { id: upcoming.id, title: 'Kayak planting', startsAt: upcoming.startsAt.toISOString() } }),
      expect.objectContaining({ name: 'Pia Lune', role: 'shore', status: 'waitlisted', at: ago(5).toISOString(), workday: expect.objectContaining({ id: ongoing.id }) }),
      expect.objectContaining({ name: 'Mara Quill', role: 'planter', status: 'confirmed', at: ago(30).toISOString() }),
    ]);

    const two = await coordinator.get('/api/signups/recent?limit=2');
    expect(two.body.signups.map((s: { name: string }) => s.name)).toEqual(['Oren Vale', 'Pia Lune']);
  });

  it.each(['0', '51', 'ten'])('refuses limit=%s with the field named', async (limit) => {
    const res = await coordinator.get(`/api/signups/recent?limit=${limit}`);
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'validation_failed', fields: { limit: expect.any(Array) } });
  });
});
