import { Router, type Request } from 'express';
import { z } from 'zod';
import { LevelsQuery, StationSearchQuery, TideSpanQuery } from '../../shared/schemas/tide.schema.js';
import { SiteIdParams } from '../../shared/schemas/site.schema.js';
import { ValidationError } from '../errors.js';
import { requireAuth } from '../middleware/auth.js';
import type { OrganisationService } from '../services/organisation.service.js';
import type { SiteTideService } from '../services/site-tide.service.js';
import type { StationService } from '../services/station.service.js';
import type { WorkdayService } from '../services/workday.service.js';
import { WorkdayIdParams } from '../../shared/schemas/workday.schema.js';
import { localDate, zonedTimeToUtc } from '../domain/tide/time-zone.js';

const StationParams = z.object({ id: z.string().min(3).max(80) });
const UnitsQuery = z.object({ units: z.enum(['ft', 'm']).optional() });
const SortQuery = z.object({ sort: z.enum(['score', 'time']).default('score') });
const MAX_POINTS = 100_000;
const DAY_MS = 86_400_000;

function span(q: { from: string; to: string }, maxDays = 400) {
  const fromMs = Date.parse(q.from);
  const toMs = Date.parse(q.to);
  if (toMs - fromMs > maxDays * DAY_MS) throw new ValidationError('The span is too long', { to: [`the span may be at most ${maxDays} days`] });
  return { fromMs, toMs };
}

/** Tide stations (`/api/stations`) and sites' tide boards and windows; signed-in users only. */
export function tideRouter(deps: { stations: StationService; siteTide: SiteTideService; organisation: OrganisationService; workdays: WorkdayService }): Router {
  const r = Router();
  // Mounted at /api beside other routers, so auth is per route, not r.use().
  const units = async (req: Request) => UnitsQuery.parse(req.query).units ?? (await deps.organisation.publicView()).units;

  r.get('/stations', requireAuth, async (req, res) => {
    res.json({ stations: await deps.stations.search(StationSearchQuery.parse(req.query)) });
  });
  r.get('/stations/:id', requireAuth, async (req, res) => {
    const unit = await units(req);
    res.json({ station: await deps.stations.detail(StationParams.parse(req.params).id, unit), units: unit });
  });
  r.get('/stations/:id/extremes', requireAuth, async (req, res) => {
    const q = TideSpanQuery.parse(req.query);
    res.json(await deps.stations.extremes(StationParams.parse(req.params).id, span(q), await units(req), q.datum));
  });
  r.get('/stations/:id/levels', requireAuth, async (req, res) => {
    const q = LevelsQuery.parse(req.query);
    const s = span(q);
    if ((s.toMs - s.fromMs) / (q.step * 60_000) > MAX_POINTS) throw new ValidationError('Too many points', { step: [`use a larger step: at most ${MAX_POINTS} points per request`] });
    res.json(await deps.stations.levels(StationParams.parse(req.params).id, s, q.step, await units(req), q.datum));
  });
  r.get('/stations/:id/datums', requireAuth, async (req, res) => {
    res.json(await deps.stations.datums(StationParams.parse(req.params).id, span(TideSpanQuery.parse(req.query), 7000), await units(req)));
  });
  r.get('/sites/:id/tide', requireAuth, async (req, res) => {
    res.json(await deps.siteTide.board(SiteIdParams.parse(req.params).id, span(TideSpanQuery.parse(req.query), 14), await units(req)));
  });
  r.get('/sites/:id/windows', requireAuth, async (req, res) => {
    const { sort } = SortQuery.parse(req.query);
    res.json(await deps.siteTide.windows(SiteIdParams.parse(req.params).id, span(TideSpanQuery.parse(req.query)), await units(req), sort));
  });
  // Public, like the workday page itself: the tide on the workday's local day at its site.
  r.get('/workdays/:id/tide', async (req, res) => {
    const staff = req.user?.role === 'coordinator' || req.user?.role === 'admin';
    const w = await deps.workdays.detail(WorkdayIdParams.parse(req.params).id, staff);
    const [y, m, d] = localDate(Date.parse(w.startsAt), w.site.timeZone).split('-').map(Number) as [number, number, number];
    const fromMs = zonedTimeToUtc(w.site.timeZone, y, m, d);
    const toMs = zonedTimeToUtc(w.site.timeZone, y, m, d + 1);
    res.json(await deps.siteTide.day(w.siteId, { fromMs, toMs }, await units(req)));
  });
  r.get('/windows', requireAuth, async (req, res) => {
    res.json(await deps.siteTide.calendar(span(TideSpanQuery.parse(req.query), 62), await units(req)));
  });
  return r;
}
