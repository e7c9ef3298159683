import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MonitoringDueDto } from '../../shared/schemas/outcomes.schema.js';
import { ReportSummary, SurvivalReport } from '../../shared/schemas/report.schema.js';
import { Tree } from '../../server/db/entities/tree.entity.js';
import { seedDemoOutcomes } from '../../server/db/seeds/demo-outcomes.js';
import { seedDemo } from '../../server/db/seeds/demo.seed.js';
import { createPasswordHasher } from '../../server/services/password-hasher.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

const now = new Date('2026-11-20T15:00:00Z');
let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ ownDatabase: 'reports_demo', clock: () => now });
  // Without tide stations the demo has no scheduled workdays; the outcomes seed makes its own.
  await seedDemo({ db: t.db, hasher: createPasswordHasher(10), now });
});
afterAll(() => t.close());

describe('demo outcomes', () => {
  it('plants two cohorts at Heron Reach with monitoring, once', async () => {
    expect(await seedDemoOutcomes({ db: t.db, now })).toBe(0);
    const planted = await t.db.getRepository(Tree).createQueryBuilder('t').where('t.planted_workday_id IS NOT NULL').getMany();
    expect(planted).toHaveLength(20);
    expect(planted.filter((x) => x.stage === 'lost')).toHaveLength(4);
  });

  it('gives the reports and the due list something to show', async () => {
    const staff = await authAgentFor(t, 'coordinator');
    const range = { from: '2025-11-21', to: '2026-11-20' };
    const summary = ReportSummary.parse((await staff.agent.get('/api/reports/summary').query(range)).body);
    expect(summary.treesPlanted).toBeGreaterThanOrEqual(20);
    expect(summary.volunteers).toBeGreaterThanOrEqual(6);
    const survival = SurvivalReport.parse((await staff.agent.get('/api/reports/survival').query(range)).body);
    // Winter cohort: 11 of 12 alive at 1 month, 9 of 12 at 3 (one missing, two lost), 9 of 12 at 6.
    const winter = survival.cohorts.find((c) => c.planted === 12)!;
    expect(winter.cells.slice(0, 3).map((c) => [c.alive, c.checked])).toEqual([[11, 12], [9, 12], [9, 12]]);
    const due = MonitoringDueDto.parse((await staff.agent.get('/api/monitoring/due')).body);
    expect(due.sites.map((s) => s.siteName)).toContain('Heron Reach');
    const pdf = await staff.agent.get('/api/reports/report.pdf').query(range);
    expect(pdf.status).toBe(200);
  });
});
