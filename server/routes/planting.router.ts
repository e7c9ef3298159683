import { Router } from 'express';
import { PlantingParams, RecordPlantingsBody } from '../../shared/schemas/outcomes.schema.js';
import { WorkdayIdParams } from '../../shared/schemas/workday.schema.js';
import { currentUser, requireRole } from '../middleware/auth.js';
import type { PlantingService } from '../services/planting.service.js';

/** Planting records of a workday (mounted at `/api`; coordinators and admins). */
export function plantingRouter(deps: { plantings: PlantingService }): Router {
  const r = Router();
  const staff = requireRole('coordinator', 'admin');

  r.get('/workdays/:id/plantings', staff, async (req, res) => {
    res.json(await deps.plantings.list(WorkdayIdParams.parse(req.params).id));
  });
  r.post('/workdays/:id/plantings', staff, async (req, res) => {
    const id = WorkdayIdParams.parse(req.params).id;
    res.json(await deps.plantings.record(id, RecordPlantingsBody.parse(req.body), currentUser(req).id));
  });
  r.delete('/workdays/:id/plantings/:treeId', staff, async (req, res) => {
    const { id, treeId } = PlantingParams.parse(req.params);
    await deps.plantings.undo(id, treeId, currentUser(req).id);
    res.status(204).end();
  });
  return r;
}
