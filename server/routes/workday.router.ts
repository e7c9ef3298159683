import { Router, type Request } from 'express';
import { CancelWorkdayBody, CreateWorkdayBody, ListWorkdaysQuery, UpdateWorkdayBody, WorkdayIdParams } from '../../shared/schemas/workday.schema.js';
import { currentUser, requireRole } from '../middleware/auth.js';
import type { WorkdayService } from '../services/workday.service.js';

const isStaff = (req: Request) => req.user?.role === 'coordinator' || req.user?.role === 'admin';
const idOf = (req: Request) => WorkdayIdParams.parse(req.params).id;

/** `/api/workdays`: anyone reads published workdays; coordinators and admins plan and run them. */
export function workdayRouter(deps: { workdays: WorkdayService }): Router {
  const r = Router();
  const staff = requireRole('coordinator', 'admin');

  r.get('/', async (req, res) => {
    res.json({ workdays: await deps.workdays.list(ListWorkdaysQuery.parse(req.query), isStaff(req)) });
  });
  r.get('/:id', async (req, res) => {
    res.json({ workday: await deps.workdays.detail(idOf(req), isStaff(req)) });
  });
  r.post('/', staff, async (req, res) => {
    res.status(201).json({ workday: await deps.workdays.create(CreateWorkdayBody.parse(req.body), currentUser(req).id) });
  });
  r.patch('/:id', staff, async (req, res) => {
    res.json({ workday: await deps.workdays.update(idOf(req), UpdateWorkdayBody.parse(req.body)) });
  });
  r.post('/:id/publish', staff, async (req, res) => {
    res.json({ workday: await deps.workdays.publish(idOf(req)) });
  });
  r.post('/:id/cancel', staff, async (req, res) => {
    res.json({ workday: await deps.workdays.cancel(idOf(req), CancelWorkdayBody.parse(req.body).message) });
  });
  r.post('/:id/complete', staff, async (req, res) => {
    res.json({ workday: await deps.workdays.complete(idOf(req)) });
  });
  return r;
}
