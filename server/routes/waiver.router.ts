import { Router } from 'express';
import { z } from 'zod';
import { currentUser, requireRole } from '../middleware/auth.js';
import type { WaiverService } from '../services/waiver.service.js';

const PublishWaiverBody = z
  .object({ text: z.string().trim().min(50, { message: 'a waiver needs more than a line' }).max(20_000), guardianText: z.string().trim().max(5000).default('') })
  .strict();

/** `/api/waiver`: the current text for everyone; admins publish a new version. */
export function waiverRouter(deps: { waivers: WaiverService }): Router {
  const r = Router();
  r.get('/', async (_req, res) => {
    res.json({ waiver: await deps.waivers.current() });
  });
  r.post('/', requireRole('admin'), async (req, res) => {
    const body = PublishWaiverBody.parse(req.body);
    res.status(201).json({ waiver: await deps.waivers.publish(body.text, body.guardianText, currentUser(req).id) });
  });
  return r;
}
