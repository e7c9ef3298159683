import { Router, type Request } from 'express';
import { CampaignIdParams, CreateCampaignBody, UpdateCampaignBody } from '../../shared/schemas/campaign.schema.js';
import { requireRole } from '../middleware/auth.js';
import type { CampaignService } from '../services/campaign.service.js';

const idOf = (req: Request) => CampaignIdParams.parse(req.params).id;

/** `/api/campaigns`: anyone reads open campaigns and a campaign's page; admins run them. */
export function campaignRouter(deps: { campaigns: CampaignService }): Router {
  const r = Router();
  const admin = requireRole('admin');

  r.get('/', async (_req, res) => {
    res.json({ campaigns: await deps.campaigns.listOpen() });
  });
  // Before '/:id', which would otherwise take 'manage' for an id.
  r.get('/manage', admin, async (_req, res) => {
    res.json({ campaigns: await deps.campaigns.listAll() });
  });
  r.get('/:id', async (req, res) => {
    res.json(await deps.campaigns.page(idOf(req), req.user?.role === 'admin'));
  });
  r.post('/', admin, async (req, res) => {
    res.status(201).json({ campaign: await deps.campaigns.create(CreateCampaignBody.parse(req.body)) });
  });
  r.patch('/:id', admin, async (req, res) => {
    res.json({ campaign: await deps.campaigns.update(idOf(req), UpdateCampaignBody.parse(req.body)) });
  });
  return r;
}
