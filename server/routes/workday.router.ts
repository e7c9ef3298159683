import { Router } from 'express';
import { CreateWorkdayBody, ListWorkdaysQuery } from '../../shared/schemas/workday.schema.js';
import { currentUser, requireRole } from '../middleware/auth.js';
import type { WorkdayService } from '../services/workday.service.js';

/** `/api/workdays`: coordinators and admins create drafts and list workdays. */
export function workdayRouter(deps: { workdays: WorkdayService }): Router {
  const r = Router();
  r.use(requireRole('coordinator', 'admin'));
  r.get('/', async (req, res) => {
    res.json({ workdays: await deps.workdays.list(ListWorkdaysQuery.parse(req.query)) });
  });
  r.post('/', async (req, res) => {
    const workday = await deps.workdays.createDraft(CreateWorkdayBody.parse(req.body), currentUser(req).id);
    res.status(201).json({ workday });
  });
  return r;
}
