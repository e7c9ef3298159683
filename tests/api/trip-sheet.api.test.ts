import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Response } from 'supertest';
import { ErrorBody } from '../../shared/errors.js';
import { Craft } from '../../server/db/entities/craft.entity.js';
import { Organisation } from '../../server/db/entities/organisation.entity.js';
import type { TripPlanJson } from '../../server/domain/trips/index.js';
import { buildCraft } from '../factories/craft.factory.js';
import { buildSignup, setProfile } from '../factories/signup.factory.js';
import { buildSite } from '../factories/site.factory.js';
import { buildTree } from '../factories/tree.factory.js';
import { buildUser } from '../factories/user.factory.js';
import { buildWorkday } from '../factories/workday.factory.js';
import { authAgentFor, createTestApp, type Agent, type TestApp } from '../setup/test-app.js';

let t: TestApp;
beforeAll(async () => {
  // Its own database: these tests set the organisation's units, and other files share the fleet.
  t = await createTestApp({ ownDatabase: 'trip_sheets' });
  await t.db.getRepository(Organisation).update({ id: 1 }, { name: 'Test Shoreline Trust', contactEmail: 'hello@shoreline.example', units: 'ft', timeZone: 'America/New_York' });
});
afterAll(() => t.close());

/** The PDF's text, page by page, read back with pdf.js. */
async function pdfText(body: Buffer): Promise<{ pages: string[]; sizes: number[][] }> {
  const pdfjs = await import('pdfjs-dist/legacy/build/pdf.mjs');
  const doc = await pdfjs.getDocument({ data: new Uint8Array(body) }).promise;
  const pages: string[] = [];
  const sizes: number[][] = [];
  for (let i = 1; i <= doc.numPages; i += 1) {
    const page = await doc.getPage(i);
    const content = await page.getTextContent();
    pages.push(content.items.map((item) => ('str' in item ? item.str : '')).join(' ').replace(/\s+/g, ' '));
    sizes.push(page.view.map(Math.round));
  }
  return { pages, sizes };
}

const getPdf = (agent: Agent, url: string) =>
  agent.get(url).buffer(true).parse((res, done) => {
    const chunks: Buffer[] = [];
    res.on('data', (c: Buffer) => chunks.push(c));
    res.on('end', () => done(null, Buffer.concat(chunks)));
  });

/** `9:51 AM` in New York, as an independent check of the sheet's clock. */
const nyClock = (iso: string) => new Intl.DateTimeFormat('en-US', { timeZone: 'America/New_York', hour: 'numeric', minute: '2-digit' }).format(new Date(iso)).replace(/\s/g, ' ');

/**
 * A planting day in April 2026 (EDT): canoe "Heron …" (2 seats, 350 kg maker's rating, 6 pot
 * slots), Ann paddles it with her daughter Mia (a minor), Kai brings his own kayak; 4 pots.
 */
async function plannedDay() {
  // Only this day's canoe is in the active fleet.
  await t.db.getRepository(Craft).update({ active: true }, { active: false });
  const site = await buildSite(t.db, { launchName: 'Mill Creek ramp', launchDistanceM: 800 });
  const workday = await buildWorkday(t.db, { title: 'Spring planting', siteId: site.id, startsAt: new Date('2026-04-10T13:00:00Z'), endsAt: new Date('2026-04-10T16:00:00Z') });
  // This canoe alone in the fleet: earlier tests' craft are retired, so the plan is the same every run.
  await t.db.createQueryBuilder().update(Craft).set({ active: false }).execute();
  const canoe = await buildCraft(t.db, { potSlots: 6, notes: 'green hull' });
  const ann = await buildUser(t.db, { name: 'Ann Ortiz' });
  const mia = await buildUser(t.db, { name: 'Mia Ortiz' });
  const kai = await buildUser(t.db, { name: 'Kai Reyes' });
  await buildSignup(t.db, { workdayId: workday.id, userId: ann.id, role: 'seat' });
  await buildSignup(t.db, { workdayId: workday.id, userId: mia.id, role: 'planter', isMinor: true, guardianUserId: ann.id });
  await buildSignup(t.db, { workdayId: workday.id, userId: kai.id, role: 'own-kayak', ownCraft: { kind: 'sit-on-top-kayak', seats: 1, maxLoadKg: 160 } });
  await setProfile(t.db, ann.id, { weightKg: 70, phone: '727-555-0111', emergencyContact: { name: 'Raul Ortiz', phone: '727-555-0112' } });
  await setProfile(t.db, mia.id, { weightKg: 40 });
  for (let i = 0; i < 4; i += 1) await buildTree(t.db, { reservedWorkdayId: workday.id });
  const coordinator = await authAgentFor(t, 'coordinator');
  await setProfile(t.db, coordinator.user.id, { phone: '727-555-0100' });
  const built = await coordinator.agent.post(`/api/workdays/${workday.id}/trip-plan`).set('X-CSRF-Token', coordinator.token).send({}).expect(201);
  return { workday, canoe, coordinator, plan: built.body.plan as TripPlanJson };
}

const expectPdf = (res: Response, fileName: string) => {
  expect(res.status).toBe(200);
  expect(res.headers['content-type']).toBe('application/pdf');
  expect(res.headers['content-disposition']).toBe(`inline; filename="${fileName}"`);
  expect(res.headers['cache-control']).toBe('private, no-store');
};

describe('GET /api/workdays/:id/trip-plan/sheet.pdf', () => {
  it('prints the day, each craft with its runs, people, pots and loads, on Letter pages with header and page numbers', async () => {
    const { workday, canoe, coordinator, plan } = await plannedDay();
    expect(plan.unplaced.pots).toBe(0);
    const res = await getPdf(coordinator.agent, `/api/workdays/${workday.id}/trip-plan/sheet.pdf`);
    expectPdf(res, 'trip-sheet-2026-04-10.pdf');
    const { pages, sizes } = await pdfText(res.body as Buffer);
    const text = pages.join(' ');
    // US Letter is 8.5 × 11 in = 612 × 792 pt.
    expect(sizes[0]).toEqual([0, 0, 612, 792]);
    pages.forEach((page, i) => {
      expect(page).toContain('Test Shoreline Trust');
      expect(page).toContain(`Page ${i + 1} of ${pages.length}`);
    });
    expect(text).toContain('Spring planting');
    expect(text).toContain('Mill Creek ramp');
    expect(text).toContain('9:00 AM – 12:00 PM EDT'); // 13:00–16:00 UTC, EDT = UTC−4
    expect(text).toContain('0.43 nmi'); // 800 m / 1852 m
    expect(text).toContain(canoe.name);
    expect(text).toContain("772 lb (maker's rating)"); // 350 kg / 0.45359237
    expect(text).toContain("Kai Reyes's own sit-on-top kayak");
    for (const name of ['Ann Ortiz', 'Mia Ortiz', 'Kai Reyes']) expect(text).toContain(name);
    const first = plan.runs.find((r) => r.craftId === canoe.id && r.run === 1)!;
    expect(text).toContain(nyClock(first.departAt));
    expect(text).toContain(`Last pot lands ${nyClock(plan.lastLandingAt!)} EDT`);
    expect(text).toContain(`${Math.round(first.loadShare * 100)}% of 772 lb`);
    expect(text).toContain('wearable life jacket');
  });

  it('answers 404 in the error shape when the workday has no plan, and for an unknown workday', async () => {
    const site = await buildSite(t.db);
    const workday = await buildWorkday(t.db, { siteId: site.id });
    const { agent } = await authAgentFor(t, 'admin');
    const res = await agent.get(`/api/workdays/${workday.id}/trip-plan/sheet.pdf`);
    expect(res.status).toBe(404);
    expect(ErrorBody.parse(res.body).error).toMatchObject({ code: 'not_found', message: 'Trip plan not found' });
    const unknown = await agent.get('/api/workdays/00000000-0000-4000-8000-000000000000/trip-plan/float-plan.pdf');
    expect(ErrorBody.parse(unknown.body).error).toMatchObject({ code: 'not_found', message: 'Workday not found' });
  });

  it('refuses volunteers, whose answer carries no PDF', async () => {
    const { workday } = await plannedDay();
    const { agent } = await authAgentFor(t, 'volunteer');
    for (const doc of ['sheet.pdf', 'float-plan.pdf']) {
      const res = await agent.get(`/api/workdays/${workday.id}/trip-plan/${doc}`);
      expect(res.status).toBe(403);
      expect(ErrorBody.parse(res.body).error.code).toBe('forbidden');
    }
  });
});

describe('GET /api/workdays/:id/trip-plan/float-plan.pdf', () => {
  it('gives the shore contact the craft, people with emergency contacts, route, times and what to do if overdue', async () => {
    const { workday, canoe, coordinator, plan } = await plannedDay();
    const res = await getPdf(coordinator.agent, `/api/workdays/${workday.id}/trip-plan/float-plan.pdf`);
    expectPdf(res, 'float-plan-2026-04-10.pdf');
    const text = (await pdfText(res.body as Buffer)).pages.join(' ');
    const lastBack = plan.runs.map((r) => r.returnAt).sort().at(-1)!;
    expect(text).toContain('Float plan');
    expect(text).toContain('not filed with the Coast Guard');
    expect(text).toContain('hello@shoreline.example');
    expect(text).toContain(`${coordinator.user.name}, phone 727-555-0100`);
    expect(text).toContain('from Mill Creek ramp to');
    expect(text).toContain(`Latest return ${nyClock(lastBack)} EDT`);
    expect(text).toMatch(/Call _+ if not back by _+\./);
    expect(text).toMatch(/Coast Guard or local emergency services on _+/);
    expect(text).toContain(`"${canoe.name}", canoe, 2 seats`);
    expect(text).toContain('(not recorded: fill in)');
    expect(text).toContain('Raul Ortiz, 727-555-0112');
    expect(text).toContain('Mia Ortiz (minor)');
    expect(text).toContain('guardian Ann Ortiz, 727-555-0111');
    for (const caution of ['wearable life jacket', 'first thunder', 'Heat', 'oyster shell', "licensed operator's judgement prevail"]) expect(text).toContain(caution);
  });

  it('works in kilograms and kilometres on A4 for an organisation in metres', async () => {
    const { workday, coordinator } = await plannedDay();
    await t.db.getRepository(Organisation).update({ id: 1 }, { units: 'm' });
    try {
      const sheet = await pdfText((await getPdf(coordinator.agent, `/api/workdays/${workday.id}/trip-plan/sheet.pdf`)).body as Buffer);
      // A4 is 210 × 297 mm = 595.28 × 841.89 pt.
      expect(sheet.sizes[0]).toEqual([0, 0, 595, 842]);
      const text = sheet.pages.join(' ');
      expect(text).toContain('0.80 km');
      expect(text).toContain("350 kg (maker's rating)");
      expect(text).not.toMatch(/\d lb\b|nmi/);
    } finally {
      await t.db.getRepository(Organisation).update({ id: 1 }, { units: 'ft' });
    }
  });
});
