import { Router } from 'express';
import { CheckBody, CreateVisitBody, ListVisitsQuery, LookupQuery, VisitIdParams, VisitTreeParams } from '../../shared/schemas/outcomes.schema.js';
import { currentUser, requireRole } from '../middleware/auth.js';
import type { MonitoringDueService } from '../services/monitoring-due.service.js';
import type { MonitoringService } from '../services/monitoring.service.js';

/** Monitoring visits, per-tree checks and the checks due (mounted at `/api`; coordinators and admins). */
export function monitoringRouter(deps: { monitoring: MonitoringService; monitoringDue: MonitoringDueService }): Router {
  const r = Router();
  const staff = requireRole('coordinator', 'admin');

  r.get('/monitoring/due', staff, async (_req, res) => {
    res.json(await deps.monitoringDue.due());
  });
  r.post('/monitoring-visits', staff, async (req, res) => {
    res.status(201).json({ visit: await deps.monitoring.create(CreateVisitBody.parse(req.body), currentUser(req).id) });
  });
  r.get('/monitoring-visits', staff, async (req, res) => {
    res.json({ visits: await deps.monitoring.list(ListVisitsQuery.parse(req.query)) });
  });
  r.get('/monitoring-visits/:id', staff, async (req, res) => {
    res.json(await deps.monitoring.detail(VisitIdParams.parse(req.params).id));
  });
  r.get('/monitoring-visits/:id/lookup', staff, async (req, res) => {
    const id = VisitIdParams.parse(req.params).id;
    res.json({ tree: await deps.monitoring.lookup(id, LookupQuery.parse(req.query).tag) });
  });
  r.put('/monitoring-visits/:id/checks/:treeId', staff, async (req, res) => {
    const { id, treeId } = VisitTreeParams.parse(req.params);
    res.json(await deps.monitoring.check(id, treeId, CheckBody.parse(req.body), currentUser(req).id));
  });
  return r;
}
