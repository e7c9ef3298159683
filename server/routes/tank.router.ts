import { Router, type Request } from 'express';
import {
  BriningPlanQuery, CreateTankBody, MeasurementRoundBody, NurseryTasksQuery, ReadingBody, ReadingsQuery, TankIdParams, UpdateTankBody,
} from '../../shared/schemas/nursery.schema.js';
import { currentUser, requireAuth, requireRole } from '../middleware/auth.js';
import type { TankBriningService } from '../services/tank-brining.service.js';
import type { TankService } from '../services/tank.service.js';
import type { TreeBulkService } from '../services/tree-bulk.service.js';

const tankId = (req: Request) => TankIdParams.parse(req.params).id;

/** Tanks, their salinity log and brining (mounted at `/api`): everyone signed in reads; coordinators and admins write. */
export function tankRouter(deps: { tanks: TankService; brining: TankBriningService; bulk: TreeBulkService }): Router {
  const r = Router();
  const staff = requireRole('coordinator', 'admin');

  r.get('/tanks', requireAuth, async (_req, res) => {
    res.json({ tanks: await deps.tanks.list() });
  });
  r.post('/tanks', staff, async (req, res) => {
    res.status(201).json({ tank: await deps.tanks.create(CreateTankBody.parse(req.body)) });
  });
  r.patch('/tanks/:id', staff, async (req, res) => {
    res.json({ tank: await deps.tanks.update(tankId(req), UpdateTankBody.parse(req.body)) });
  });
  r.post('/tanks/:id/readings', staff, async (req, res) => {
    res.status(201).json({ reading: await deps.tanks.addReading(tankId(req), ReadingBody.parse(req.body), currentUser(req).id) });
  });
  r.get('/tanks/:id/readings', requireAuth, async (req, res) => {
    res.json({ readings: await deps.tanks.readings(tankId(req), ReadingsQuery.parse(req.query).limit) });
  });
  r.get('/tanks/:id/brining-plan', requireAuth, async (req, res) => {
    res.json(await deps.brining.plan(tankId(req), BriningPlanQuery.parse(req.query)));
  });
  r.post('/tanks/:id/measurement-round', staff, async (req, res) => {
    res.status(201).json(await deps.bulk.measurementRound(tankId(req), MeasurementRoundBody.parse(req.body), currentUser(req).id));
  });
  r.get('/nursery/tasks', requireAuth, async (req, res) => {
    res.json(await deps.brining.tasks(NurseryTasksQuery.parse(req.query).date));
  });
  return r;
}
