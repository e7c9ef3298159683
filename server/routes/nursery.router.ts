import { Router } from 'express';
import { ReservedTreeParams, ReserveTreesBody, TreeIdParams, TreeReadinessQuery } from '../../shared/schemas/nursery.schema.js';
import { SiteIdParams } from '../../shared/schemas/site.schema.js';
import { WorkdayIdParams } from '../../shared/schemas/workday.schema.js';
import { currentUser, requireAuth, requireRole } from '../middleware/auth.js';
import type { ReadinessService } from '../services/readiness.service.js';
import type { TreeReservationService } from '../services/tree-reservation.service.js';

/** Readiness of trees for sites and trees reserved for workdays (mounted at `/api`). */
export function nurseryRouter(deps: { readiness: ReadinessService; reservations: TreeReservationService }): Router {
  const r = Router();
  const staff = requireRole('coordinator', 'admin');

  r.get('/sites/:id/readiness', requireAuth, async (req, res) => {
    res.json(await deps.readiness.forSite(SiteIdParams.parse(req.params).id));
  });
  r.get('/trees/:id/readiness', requireAuth, async (req, res) => {
    res.json(await deps.readiness.forTree(TreeIdParams.parse(req.params).id, TreeReadinessQuery.parse(req.query).siteId));
  });
  r.get('/workdays/:id/reserved-trees', requireAuth, async (req, res) => {
    res.json({ trees: await deps.reservations.list(WorkdayIdParams.parse(req.params).id) });
  });
  r.post('/workdays/:id/reserved-trees', staff, async (req, res) => {
    const trees = await deps.reservations.reserve(WorkdayIdParams.parse(req.params).id, ReserveTreesBody.parse(req.body).treeIds, currentUser(req).id);
    res.json({ trees });
  });
  r.delete('/workdays/:id/reserved-trees/:treeId', staff, async (req, res) => {
    const { id, treeId } = ReservedTreeParams.parse(req.params);
    await deps.reservations.release(id, treeId, currentUser(req).id);
    res.status(204).end();
  });
  return r;
}
