import { Router } from 'express';
import { CraftIdParams, CreateCraftBody, RuleOfThumbQuery, UpdateCraftBody } from '../../shared/schemas/trips.schema.js';
import { requireAuth, requireRole } from '../middleware/auth.js';
import { ruleOfThumb, type FleetService } from '../services/fleet.service.js';

/** `/api/fleet`: everyone signed in reads; coordinators and admins register, edit and retire craft. */
export function fleetRouter(deps: { fleet: FleetService }): Router {
  const r = Router();
  const staff = requireRole('coordinator', 'admin');
  r.use(requireAuth);

  r.get('/', async (_req, res) => {
    res.json({ craft: await deps.fleet.list() });
  });
  r.get('/rule-of-thumb', (req, res) => {
    const { lengthFt, beamFt } = RuleOfThumbQuery.parse(req.query);
    res.json(ruleOfThumb(lengthFt, beamFt));
  });
  r.post('/', staff, async (req, res) => {
    res.status(201).json({ craft: await deps.fleet.create(CreateCraftBody.parse(req.body)) });
  });
  r.patch('/:id', staff, async (req, res) => {
    const { id } = CraftIdParams.parse(req.params);
    res.json({ craft: await deps.fleet.update(id, UpdateCraftBody.parse(req.body)) });
  });
  r.delete('/:id', staff, async (req, res) => {
    res.json({ craft: await deps.fleet.retire(CraftIdParams.parse(req.params).id) });
  });
  return r;
}
