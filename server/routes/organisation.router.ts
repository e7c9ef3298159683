import { Router } from 'express';
import { UpdateOrganisationBody } from '../../shared/schemas/organisation.schema.js';
import { requireRole } from '../middleware/auth.js';
import type { OrganisationService } from '../services/organisation.service.js';

/** `/api/organisation`: name and demo marker for everyone; settings for admins. */
export function organisationRouter(deps: { organisation: OrganisationService }): Router {
  const r = Router();
  r.get('/', async (_req, res) => {
    res.json({ organisation: await deps.organisation.publicView() });
  });
  r.get('/settings', requireRole('admin'), async (_req, res) => {
    res.json({ settings: await deps.organisation.settings() });
  });
  r.patch('/settings', requireRole('admin'), async (req, res) => {
    res.json({ settings: await deps.organisation.update(UpdateOrganisationBody.parse(req.body)) });
  });
  return r;
}
