import { Router } from 'express';
import { CreateSiteBody, SiteIdParams, UpdateSiteBody } from '../../shared/schemas/site.schema.js';
import { requireAuth, requireRole } from '../middleware/auth.js';
import { toSiteDto, type SiteService } from '../services/site.service.js';

/** `/api/sites`: everyone signed in reads; coordinators and admins create and edit. */
export function siteRouter(deps: { sites: SiteService }): Router {
  const r = Router();
  const staff = requireRole('coordinator', 'admin');
  r.use(requireAuth);

  r.get('/', async (_req, res) => {
    res.json({ sites: await deps.sites.list() });
  });
  r.get('/:id', async (req, res) => {
    res.json({ site: toSiteDto(await deps.sites.get(SiteIdParams.parse(req.params).id)) });
  });
  r.post('/', staff, async (req, res) => {
    res.status(201).json({ site: await deps.sites.create(CreateSiteBody.parse(req.body)) });
  });
  r.patch('/:id', staff, async (req, res) => {
    const { id } = SiteIdParams.parse(req.params);
    res.json({ site: await deps.sites.update(id, UpdateSiteBody.parse(req.body)) });
  });
  return r;
}
