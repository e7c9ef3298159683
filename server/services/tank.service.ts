import { In, type DataSource, type EntityManager } from 'typeorm';
import type { CreateTankBody, ReadingBody, ReadingDto, TankDto, UpdateTankBody } from '../../shared/schemas/nursery.schema.js';
import { SalinityReading } from '../db/entities/salinity-reading.entity.js';
import { Site } from '../db/entities/site.entity.js';
import { Tank } from '../db/entities/tank.entity.js';
import { Tree } from '../db/entities/tree.entity.js';
import { roundTo } from '../domain/nursery/format.js';
import { salinityFromSpecificGravity } from '../domain/nursery/seawater.js';
import { ConflictError, NotFoundError, ValidationError } from '../errors.js';
import { nurseryInput } from './nursery-context.js';
import { toReadingDto } from './tree-view.js';

/** Latest reading of each tank (DISTINCT ON keeps the first row per tank in this order). */
export async function latestReadings(db: DataSource | EntityManager, tankIds: readonly string[]): Promise<Map<string, SalinityReading>> {
  if (tankIds.length === 0) return new Map();
  const rows = await db
    .getRepository(SalinityReading)
    .createQueryBuilder('r')
    .distinctOn(['r.tank_id'])
    .where('r.tank_id IN (:...ids)', { ids: tankIds })
    .orderBy('r.tank_id')
    .addOrderBy('r.taken_at', 'DESC')
    .addOrderBy('r.created_at', 'DESC')
    .getMany();
  return new Map(rows.map((r) => [r.tankId, r]));
}

async function toTankDtos(db: DataSource | EntityManager, tanks: Tank[]): Promise<TankDto[]> {
  const ids = tanks.map((t) => t.id);
  const siteIds = [...new Set(tanks.flatMap((t) => (t.targetSiteId ? [t.targetSiteId] : [])))];
  const sites = new Map((siteIds.length ? await db.getRepository(Site).find({ where: { id: In(siteIds) } }) : []).map((s) => [s.id, s]));
  const latest = await latestReadings(db, ids);
  const counts: { tank_id: string; n: string }[] = ids.length
    ? await db.getRepository(Tree).createQueryBuilder('t').select('t.tank_id', 'tank_id').addSelect('COUNT(*)', 'n').where('t.tank_id IN (:...ids)', { ids }).groupBy('t.tank_id').getRawMany()
    : [];
  const count = new Map(counts.map((c) => [c.tank_id, Number(c.n)]));
  return tanks.map((t) => {
    const site = t.targetSiteId ? sites.get(t.targetSiteId) : undefined;
    const reading = latest.get(t.id);
    return {
      id: t.id, name: t.name, volumeLitres: t.volumeLitres, targetSiteId: t.targetSiteId, notes: t.notes, createdAt: t.createdAt.toISOString(),
      targetSite: site ? { id: site.id, name: site.name, salinityPpt: site.salinityPpt } : null,
      latestReading: reading ? toReadingDto(reading) : null,
      treeCount: count.get(t.id) ?? 0,
    };
  });
}

/** Tanks (and buckets) and their salinity log. */
export function createTankService(deps: { db: DataSource; clock: () => Date }) {
  const repo = deps.db.getRepository(Tank);

  async function get(id: string): Promise<Tank> {
    const tank = await repo.findOneBy({ id });
    if (!tank) throw new NotFoundError('Tank');
    return tank;
  }
  async function check(body: UpdateTankBody, exceptId?: string): Promise<void> {
    if (body.targetSiteId && !(await deps.db.getRepository(Site).existsBy({ id: body.targetSiteId }))) {
      throw new ValidationError('Unknown site', { targetSiteId: ['is not a site'] });
    }
    if (body.name === undefined) return;
    const same = await repo.createQueryBuilder('t').where('LOWER(t.name) = LOWER(:name)', { name: body.name }).getOne();
    if (same && same.id !== exceptId) throw new ConflictError('A tank with this name exists', { name: ['is already used by another tank'] });
  }
  const one = async (tank: Tank) => (await toTankDtos(deps.db, [tank]))[0]!;

  return {
    get,
    async list(): Promise<TankDto[]> {
      return toTankDtos(deps.db, await repo.find({ order: { name: 'ASC' } }));
    },
    async create(body: CreateTankBody): Promise<TankDto> {
      await check(body);
      return one(await repo.save(repo.create(body)));
    },
    async update(id: string, body: UpdateTankBody): Promise<TankDto> {
      const tank = await get(id);
      await check(body, id);
      return one(await repo.save(repo.merge(tank, body)));
    },

    /** Stores a reading; a hydrometer's SG (t/t) and temperature become ppt by EOS-80, to 0.1. */
    async addReading(tankId: string, body: ReadingBody, userId: string): Promise<ReadingDto> {
      await get(tankId);
      const now = deps.clock();
      const takenAt = body.takenAt ? new Date(body.takenAt) : now;
      if (takenAt.getTime() > now.getTime() + 5 * 60_000) throw new ValidationError('A reading cannot be in the future', { takenAt: ['cannot be in the future'] });
      const { specificGravity = null, temperatureC = null } = body;
      const hydrometer = body.salinityPpt === undefined && specificGravity !== null && temperatureC !== null;
      const salinityPpt = hydrometer ? roundTo(nurseryInput(() => salinityFromSpecificGravity(specificGravity, temperatureC)), 1) : (body.salinityPpt ?? 0);
      const r = deps.db.getRepository(SalinityReading);
      const saved = await r.save(r.create({
        tankId, takenAt, method: hydrometer ? 'hydrometer' : 'refractometer', salinityPpt,
        specificGravity: hydrometer ? specificGravity : null, temperatureC: hydrometer ? temperatureC : null, takenById: userId, note: body.note ?? '',
      }));
      return toReadingDto(saved);
    },

    async readings(tankId: string, limit: number): Promise<ReadingDto[]> {
      await get(tankId);
      const rows = await deps.db.getRepository(SalinityReading).find({ where: { tankId }, order: { takenAt: 'DESC', createdAt: 'DESC' }, take: limit });
      return rows.map(toReadingDto);
    },
  };
}
export type TankService = ReturnType<typeof createTankService>;
