import { randomUUID } from 'node:crypto';
import { http, HttpResponse } from 'msw';
import type { TankDto, TreeDetail, TreeRow } from '@shared/schemas/nursery.schema';
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

/** Answers the ledger's start-up calls: tanks, today's tasks and one page of trees (recording each query). */
export function mockNursery(opts: { trees?: TreeRow[]; tanks?: TankDto[] } = {}): URLSearchParams[] {
  const queries: URLSearchParams[] = [];
  server.use(
    http.get('/api/tanks', () => HttpResponse.json({ tanks: opts.tanks ?? [] })),
    http.get('/api/nursery/tasks', () => HttpResponse.json({ date: '2025-03-04', tasks: [], skipped: [] })),
    http.get('/api/trees', ({ request }) => {
      queries.push(new URL(request.url).searchParams);
      return HttpResponse.json({ trees: opts.trees ?? [], total: opts.trees?.length ?? 0 });
    }),
  );
  return queries;
}
