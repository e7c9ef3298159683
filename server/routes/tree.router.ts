import { Router, type Request } from 'express';
import {
  BatchIdParams, BulkMoveBody, CreateBatchBody, ImportBatchBody, LabelsQuery, ListTreesQuery, MeasurementBody, TreeIdParams, UpdateTreeBody,
} from '../../shared/schemas/nursery.schema.js';
import { currentUser, requireAuth, requireRole } from '../middleware/auth.js';
import type { TreeBatchService } from '../services/tree-batch.service.js';
import type { TreeBulkService } from '../services/tree-bulk.service.js';
import type { TreeLabelService } from '../services/tree-labels.service.js';
import type { TreeService } from '../services/tree.service.js';

const treeId = (req: Request) => TreeIdParams.parse(req.params).id;

/** The nursery ledger, mounted at `/api`: everyone signed in reads; coordinators and admins write. */
export function treeRouter(deps: { batches: TreeBatchService; trees: TreeService; bulk: TreeBulkService; labels: TreeLabelService }): Router {
  const r = Router();
  const staff = requireRole('coordinator', 'admin');

  r.post('/batches', staff, async (req, res) => {
    res.status(201).json(await deps.batches.create(CreateBatchBody.parse(req.body), currentUser(req).id));
  });
  r.post('/batches/import', staff, async (req, res) => {
    const out = await deps.batches.importCsv(ImportBatchBody.parse(req.body), currentUser(req).id);
    if (out.committed) res.status(201).json(out.created);
    else res.json(out.preview);
  });
  r.get('/batches', requireAuth, async (_req, res) => {
    res.json({ batches: await deps.batches.list() });
  });
  r.get('/batches/:id', requireAuth, async (req, res) => {
    res.json(await deps.batches.get(BatchIdParams.parse(req.params).id));
  });

  r.get('/trees', requireAuth, async (req, res) => {
    res.json(await deps.trees.list(ListTreesQuery.parse(req.query)));
  });
  // Before '/trees/:id', which would otherwise take 'labels' for an id.
  r.get('/trees/labels', requireAuth, async (req, res) => {
    // Built before res.type(): an error must still go out as JSON.
    const html = await deps.labels.sheet(LabelsQuery.parse(req.query));
    res.type('html').send(html);
  });
  r.post('/trees/bulk/move', staff, async (req, res) => {
    res.json(await deps.bulk.move(BulkMoveBody.parse(req.body), currentUser(req).id));
  });
  r.get('/trees/:id', requireAuth, async (req, res) => {
    res.json(await deps.trees.detail(treeId(req)));
  });
  r.patch('/trees/:id', staff, async (req, res) => {
    res.json({ tree: await deps.trees.update(treeId(req), UpdateTreeBody.parse(req.body), currentUser(req).id) });
  });
  r.post('/trees/:id/measurements', staff, async (req, res) => {
    res.status(201).json({ tree: await deps.trees.measure(treeId(req), MeasurementBody.parse(req.body), currentUser(req).id) });
  });
  return r;
}
