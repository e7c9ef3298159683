import { Router } from 'express';
import { DayCapacityBody } from '../../shared/schemas/trip-capacity.schema.js';
import { BuildTripPlanBody, EditTripPlanBody, TripInstanceBody, WorkdayIdParams } from '../../shared/schemas/trips.schema.js';
import { currentUser, requireRole } from '../middleware/auth.js';
import type { TripPlanService } from '../services/trip-plan.service.js';

/** `/api/trip-plans/*`, `/api/workdays/:id/trip-plan` and `/api/workdays/:id/capacity`: coordinators and admins only. */
export function tripPlanRouter(deps: { tripPlans: TripPlanService }): Router {
  const r = Router();
  const staff = requireRole('coordinator', 'admin');

  r.post('/trip-plans/solve', staff, async (req, res) => {
    res.json({ plan: await deps.tripPlans.solve(TripInstanceBody.parse(req.body)) });
  });
  r.post('/trip-plans/capacity', staff, async (req, res) => {
    res.json({ capacity: await deps.tripPlans.capacity(DayCapacityBody.parse(req.body)) });
  });
  r.post('/workdays/:id/trip-plan', staff, async (req, res) => {
    const { id } = WorkdayIdParams.parse(req.params);
    res.status(201).json(await deps.tripPlans.build(id, BuildTripPlanBody.parse(req.body ?? {}), currentUser(req).id));
  });
  r.get('/workdays/:id/trip-plan', staff, async (req, res) => {
    res.json(await deps.tripPlans.get(WorkdayIdParams.parse(req.params).id));
  });
  r.put('/workdays/:id/trip-plan', staff, async (req, res) => {
    const { id } = WorkdayIdParams.parse(req.params);
    res.json(await deps.tripPlans.edit(id, EditTripPlanBody.parse(req.body), currentUser(req).id));
  });
  r.get('/workdays/:id/capacity', staff, async (req, res) => {
    res.json({ capacity: await deps.tripPlans.capacityOfWorkday(WorkdayIdParams.parse(req.params).id) });
  });
  return r;
}
