import { Router } from 'express';
import { z } from 'zod';
import { UpdateProfileBody } from '../../shared/schemas/profile.schema.js';
import { currentUser, requireAuth } from '../middleware/auth.js';
import type { MeService } from '../services/me.service.js';

const PeriodQuery = z.object({ from: z.iso.date().optional(), to: z.iso.date().optional() });

/** `/api/me`: the signed-in person's profile, workdays and hours. */
export function meRouter(deps: { me: MeService }): Router {
  const r = Router();
  r.use(requireAuth);
  r.get('/profile', async (req, res) => {
    res.json({ profile: await deps.me.profile(currentUser(req).id) });
  });
  r.patch('/profile', async (req, res) => {
    res.json({ profile: await deps.me.updateProfile(currentUser(req).id, UpdateProfileBody.parse(req.body)) });
  });
  r.get('/workdays', async (req, res) => {
    res.json({ workdays: await deps.me.workdays(currentUser(req).id) });
  });
  r.get('/hours', async (req, res) => {
    res.json(await deps.me.hours(currentUser(req).id, PeriodQuery.parse(req.query)));
  });
  return r;
}
