import { In, IsNull, Not, type DataSource } from 'typeorm';
import type { BriningPlanDto, BriningPlanQuery, NurseryTasksDto } from '../../shared/schemas/nursery.schema.js';
import { SalinityReading } from '../db/entities/salinity-reading.entity.js';
import { Site } from '../db/entities/site.entity.js';
import { Tank } from '../db/entities/tank.entity.js';
import { BRINING_DEFAULTS, briningPlan } from '../domain/nursery/brining-plan.js';
import { tasksDueOn } from '../domain/nursery/brining-tasks.js';
import { addDays } from '../domain/nursery/dates.js';
import { NurseryInputError } from '../domain/nursery/errors.js';
import { NotFoundError, ValidationError } from '../errors.js';
import { dayIn, nurseryInput, nurserySettings } from './nursery-context.js';

/**
 * The first day the next swap may happen: a change of more than the plan's tolerance between two
 * readings means water was swapped by the later one, and the next swap waits the plan's interval
 * after it (else a plan recomputed each day would ask for a swap every day).
 */
export function nextStepDate(readings: readonly { date: string; ppt: number }[], today: string, intervalDays: number = BRINING_DEFAULTS.intervalDays): string {
  for (let i = 0; i + 1 < readings.length; i++) {
    if (Math.abs(readings[i]!.ppt - readings[i + 1]!.ppt) > BRINING_DEFAULTS.tolerancePpt) {
      const next = addDays(readings[i]!.date, intervalDays);
      return next > today ? next : today;
    }
  }
  return today;
}

/** Brining plans toward a site's salinity, and the day's water swaps across tanks. */
export function createTankBriningService(deps: { db: DataSource; clock: () => Date }) {
  /** The plan for one tank from its readings (newest first); throws NurseryInputError for input the plan cannot answer. */
  function planFor(tank: Tank, readings: SalinityReading[], timeZone: string, o: { targetPpt: number; stockPpt?: number; by?: string; holdDays: number }): BriningPlanDto {
    const today = dayIn(deps.clock(), timeZone);
    const dated = readings.map((r) => ({ date: dayIn(r.takenAt, timeZone), ppt: r.salinityPpt }));
    const startDate = nextStepDate(dated, today);
    const currentPpt = dated[0]!.ppt;
    const plan = briningPlan({ currentPpt, targetPpt: o.targetPpt, volumeLitres: tank.volumeLitres, stockPpt: o.stockPpt, startDate, by: o.by, holdDays: o.holdDays });
    return { tankId: tank.id, currentPpt, targetPpt: o.targetPpt, startDate, ...plan };
  }
  const recentReadings = (tankId: string) => deps.db.getRepository(SalinityReading).find({ where: { tankId }, order: { takenAt: 'DESC', createdAt: 'DESC' }, take: 20 });

  return {
    async plan(tankId: string, q: BriningPlanQuery): Promise<BriningPlanDto> {
      const tank = await deps.db.getRepository(Tank).findOneBy({ id: tankId });
      if (!tank) throw new NotFoundError('Tank');
      const site = tank.targetSiteId ? await deps.db.getRepository(Site).findOneBy({ id: tank.targetSiteId }) : null;
      const targetPpt = q.targetPpt ?? site?.salinityPpt ?? null;
      if (targetPpt === null) throw new ValidationError('No target salinity', { targetPpt: ["is required: give one, or set the tank's target site and the site's salinity"] });
      const readings = await recentReadings(tankId);
      if (readings.length === 0) throw new ValidationError('The tank has no salinity reading yet', { tankId: ['record a salinity reading for this tank first'] });
      const { rules, timeZone } = await nurserySettings(deps.db);
      return nurseryInput(() => planFor(tank, readings, timeZone, { targetPpt, stockPpt: q.stockPpt, by: q.by, holdDays: rules.holdDays }));
    },

    /** Swaps due on `date` (today by default) for every tank brining toward a site. */
    async tasks(date?: string): Promise<NurseryTasksDto> {
      const { rules, timeZone } = await nurserySettings(deps.db);
      const day = date ?? dayIn(deps.clock(), timeZone);
      const tanks = await deps.db.getRepository(Tank).find({ where: { targetSiteId: Not(IsNull()) }, order: { name: 'ASC' } });
      const siteIds = [...new Set(tanks.flatMap((t) => (t.targetSiteId ? [t.targetSiteId] : [])))];
      const sites = new Map((siteIds.length ? await deps.db.getRepository(Site).find({ where: { id: In(siteIds) } }) : []).map((s) => [s.id, s]));
      const out: NurseryTasksDto = { date: day, tasks: [], skipped: [] };
      for (const tank of tanks) {
        const site = sites.get(tank.targetSiteId ?? '');
        const skip = (reason: string) => out.skipped.push({ tankId: tank.id, tankName: tank.name, reason });
        if (!site || site.salinityPpt === null) {
          skip(site ? `Site ${site.name} has no salinity set.` : 'The target site no longer exists.');
          continue;
        }
        const readings = await recentReadings(tank.id);
        if (readings.length === 0) {
          skip('No salinity reading yet.');
          continue;
        }
        try {
          const plan = planFor(tank, readings, timeZone, { targetPpt: site.salinityPpt, holdDays: rules.holdDays });
          out.tasks.push(...tasksDueOn([{ tankName: tank.name, steps: plan.steps }], day).map((t) => ({ ...t, tankId: tank.id })));
        } catch (err) {
          if (!(err instanceof NurseryInputError)) throw err;
          skip(err.message);
        }
      }
      return out;
    },
  };
}
export type TankBriningService = ReturnType<typeof createTankBriningService>;
