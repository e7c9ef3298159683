import { randomUUID } from 'node:crypto';
import { http, HttpResponse } from 'msw';
import type { ReadinessDto, TankDto, TreeDetail, TreeRow } from '@shared/schemas/nursery.schema';
import type { Site } from '@shared/schemas/site.schema';
import { server } from '../../setup/client-setup';

/** Invented nursery test data. */
export function buildTree(overrides: Partial<TreeRow> = {}): TreeRow {
  return {
    id: randomUUID(), tag: 'T-0001', stage: 'potted', tank: null, batchId: null, batchCode: 'B-001',
    heightCm: 32, leafCount: 6, potHeightCm: 15, potMassKg: 1.2, healthy: true, reservedWorkdayId: null,
    siteId: null, plantedOn: null, photoId: null, thumbUrl: null, updatedAt: '2025-03-01T12:00:00.000Z',
    ...overrides,
  };
}

export function buildTank(overrides: Partial<TankDto> = {}): TankDto {
  return {
    id: randomUUID(), name: 'Tank A', volumeLitres: 378.5, targetSiteId: null, targetSite: null, notes: '',
    createdAt: '2025-01-01T12:00:00.000Z', latestReading: null, treeCount: 0,
    ...overrides,
  };
}

export function buildTreeDetail(tree: TreeRow, overrides: Partial<TreeDetail> = {}): TreeDetail {
  return { tree: { ...tree, photoUrl: null, createdAt: '2025-01-10T12:00:00.000Z' }, history: [], measurements: [], ...overrides };
}

/** A tree judged for a site; not ready for want of height unless told otherwise. */
export function buildReadiness(tree: TreeRow, overrides: Partial<ReadinessDto> = {}): ReadinessDto {
  return {
    treeId: tree.id, tag: tree.tag, stage: tree.stage, tank: tree.tank, ready: false,
    reasons: [{ code: 'crown_low', message: 'needs 14 cm more height' }], cautions: [],
    crownSubmergedShare: 0.05, collarFloodedShare: 0.2, crownTopM: 0.7, requiredTopM: 0.84, heightShortfallCm: 14, heldDays: 3,
    ...overrides,
  };
}

/** Answers the ledger's start-up calls: tanks, today's tasks, sites and one page of trees (recording each query). */
export function mockNursery(opts: { trees?: TreeRow[]; tanks?: TankDto[]; sites?: Site[] } = {}): URLSearchParams[] {
  const queries: URLSearchParams[] = [];
  server.use(
    http.get('/api/sites', () => HttpResponse.json({ sites: opts.sites ?? [] })),
    http.get('/api/tanks', () => HttpResponse.json({ tanks: opts.tanks ?? [] })),
    http.get('/api/nursery/tasks', () => HttpResponse.json({ date: '2025-03-04', tasks: [], skipped: [] })),
    http.get('/api/trees', ({ request }) => {
      queries.push(new URL(request.url).searchParams);
      return HttpResponse.json({ trees: opts.trees ?? [], total: opts.trees?.length ?? 0 });
    }),
  );
  return queries;
}
