import { In, type DataSource } from 'typeorm';
import type { ReadinessDto, SiteReadinessDto } from '../../shared/schemas/nursery.schema.js';
import { SalinityReading } from '../db/entities/salinity-reading.entity.js';
import type { Site } from '../db/entities/site.entity.js';
import { TreeEvent } from '../db/entities/tree-event.entity.js';
import { Tree } from '../db/entities/tree.entity.js';
import { crownClearance, type SiteTide } from '../domain/nursery/crown-clearance.js';
import { addDays } from '../domain/nursery/dates.js';
import { roundTo } from '../domain/nursery/format.js';
import { growthForecast, type HeightMeasurement } from '../domain/nursery/growth.js';
import { readinessSettingsFrom, treeReadiness, type Readiness } from '../domain/nursery/readiness.js';
import { predictExtremesMetres, predictLevelsMetres } from '../domain/tide/predict.js';
import { siteCorrection } from '../domain/tide/site-windows.js';
import { NotFoundError, ValidationError } from '../errors.js';
import { dayIn, nurserySettings, type NurserySettings } from './nursery-context.js';
import type { SiteService } from './site.service.js';
import type { StationService } from './station.service.js';

const YEAR_MS = 365 * 86_400_000;
/** Stages the per-site list judges: trees still in the nursery that are potted or further. */
const JUDGED: Tree['stage'][] = ['potted', 'brining', 'ready'];

type Judged = Omit<ReadinessDto, 'readyBy'> & { readyBy?: string };

/** "Ready by": today when ready; else the latest of the growth forecast and the hold's end, when every reason has one. */
function readyBy(r: Readiness, tree: Tree, heights: HeightMeasurement[], today: string, requiredDays: number): string | undefined {
  if (r.ready) return today;
  let date = today;
  for (const reason of r.reasons) {
    if (reason.code === 'salinity_hold') date = [date, addDays(today, requiredDays - r.heldDays)].sort()[1]!;
    else if (reason.code === 'crown_submerged' && tree.heightCm !== null) {
      const forecast = growthForecast({ measurements: heights, neededHeightCm: tree.heightCm + r.heightShortfallCm });
      if (!forecast.readyOn) return undefined;
      date = [date, forecast.readyOn].sort()[1]!;
    } else return undefined;
  }
  return date;
}

/** Readiness of nursery trees for planting sites (DESIGN.md "Readiness"). */
export function createReadinessService(deps: { db: DataSource; clock: () => Date; sites: SiteService; stations: StationService }) {
  /** The site's predicted tide over the coming year, computed once per request. */
  async function yearOfTide(site: Site): Promise<SiteTide> {
    const station = await deps.stations.get(site.stationId);
    const fromMs = deps.clock().getTime();
    const span = { fromMs, toMs: fromMs + YEAR_MS, correction: siteCorrection(site) };
    return { series: predictLevelsMetres(station, { ...span, stepMinutes: 30 }), extremes: predictExtremesMetres(station, span) };
  }

  async function judge(site: Site, trees: Tree[], settings: NurserySettings): Promise<Omit<SiteReadinessDto, 'site'>> {
    const tide = await yearOfTide(site);
    const today = dayIn(deps.clock(), settings.timeZone);
    const datum = crownClearance({ bedElevationM: site.bedElevationM, potHeightCm: 0, heightCm: 0, tide, threshold: { kind: 'mhhw' } });
    const tankIds = [...new Set(trees.flatMap((t) => (t.tankId ? [t.tankId] : [])))];
    const readings = tankIds.length ? await deps.db.getRepository(SalinityReading).find({ where: { tankId: In(tankIds) }, order: { takenAt: 'ASC', createdAt: 'ASC' } }) : [];
    const events = trees.length ? await deps.db.getRepository(TreeEvent).find({ where: { treeId: In(trees.map((t) => t.id)), kind: 'measurement' }, order: { at: 'ASC' } }) : [];
    const ruleSettings = readinessSettingsFrom(settings.rules);
    const judged = trees.map((tree): Judged => {
      const own = readings.filter((r) => r.tankId === tree.tankId).map((r) => ({ date: dayIn(r.takenAt, settings.timeZone), ppt: r.salinityPpt }));
      const r = treeReadiness({
        tree: { stage: tree.stage, heightCm: tree.heightCm ?? 0, potHeightCm: tree.potHeightCm ?? 0, healthy: tree.healthy },
        site: { bedElevationM: site.bedElevationM, salinityPpt: site.salinityPpt ?? 0 },
        tide, salinityReadings: own, today, settings: ruleSettings,
      });
      const extra = [
        ...(tree.heightCm === null ? [{ code: 'height_unknown', message: 'No height measured yet.' }] : []),
        ...(tree.potHeightCm === null ? [{ code: 'pot_unknown', message: 'Pot height not recorded.' }] : []),
        ...(site.salinityPpt === null ? [{ code: 'site_salinity_unknown', message: `Site ${site.name} has no salinity set, so the hold cannot be judged.` }] : []),
      ];
      const reasons = [...r.reasons.filter((x) => site.salinityPpt !== null || !x.code.startsWith('salinity_')), ...extra];
      const heights = events.filter((e) => e.treeId === tree.id && e.heightCm !== null).map((e) => ({ date: dayIn(e.at, settings.timeZone), heightCm: e.heightCm ?? 0 }));
      const by = extra.length ? undefined : readyBy(r, tree, heights, today, ruleSettings.requiredDays ?? 21);
      return {
        treeId: tree.id, tag: tree.tag, stage: tree.stage, tank: tree.tank ? { id: tree.tank.id, name: tree.tank.name } : null,
        ready: reasons.length === 0, reasons, cautions: r.cautions,
        crownSubmergedShare: roundTo(r.crownSubmergedShare, 4), collarFloodedShare: roundTo(r.collarFloodedShare, 4),
        crownTopM: roundTo(r.crownTopM, 3), requiredTopM: roundTo(r.requiredTopM, 3), heightShortfallCm: r.heightShortfallCm, heldDays: r.heldDays,
        ...(by && { readyBy: by }),
      };
    });
    return { today, mhhwM: roundTo(datum.mhhwM, 3), mslM: roundTo(datum.mslM, 3), trees: judged };
  }

  const siteInfo = (s: Site) => ({ id: s.id, name: s.name, salinityPpt: s.salinityPpt });

  return {
    /** Every potted, brining or ready tree judged for the site. */
    async forSite(siteId: string): Promise<SiteReadinessDto> {
      const site = await deps.sites.get(siteId);
      const trees = await deps.db.getRepository(Tree).find({ where: { stage: In(JUDGED) }, relations: { tank: true }, order: { tag: 'ASC' } });
      return { site: siteInfo(site), ...(await judge(site, trees, await nurserySettings(deps.db))) };
    },

    /** One tree for a site (by default its tank's target site). */
    async forTree(treeId: string, siteId: string | undefined) {
      const tree = await deps.db.getRepository(Tree).findOne({ where: { id: treeId }, relations: { tank: true } });
      if (!tree) throw new NotFoundError('Tree');
      const id = siteId ?? tree.tank?.targetSiteId;
      if (!id) throw new ValidationError('Which site?', { siteId: ["is required when the tree's tank has no target site"] });
      const site = await deps.sites.get(id);
      const { trees, ...rest } = await judge(site, [tree], await nurserySettings(deps.db));
      return { site: siteInfo(site), ...rest, tree: trees[0]! };
    },
  };
}
export type ReadinessService = ReturnType<typeof createReadinessService>;
