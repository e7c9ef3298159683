import type { DataSource } from 'typeorm';
import type { CreateSiteBody, Site as SiteDto, UpdateSiteBody } from '../../shared/schemas/site.schema.js';
import { Site } from '../db/entities/site.entity.js';
import { ConflictError, NotFoundError, ValidationError } from '../errors.js';

/** What the site service needs to know about tide stations. */
export interface StationLookup {
  exists(stationId: string): Promise<boolean>;
}

export function toSiteDto(s: Site): SiteDto {
  const { createdAt, updatedAt, ...rest } = s;
  return { ...rest, createdAt: createdAt.toISOString(), updatedAt: updatedAt.toISOString() };
}

export function createSiteService(deps: { db: DataSource; stations: StationLookup }) {
  const repo = deps.db.getRepository(Site);

  async function checkStation(stationId: string | undefined): Promise<void> {
    if (stationId !== undefined && !(await deps.stations.exists(stationId))) {
      throw new ValidationError('Unknown tide station', { stationId: ['is not a station in the tide dataset'] });
    }
  }
  async function checkNameFree(name: string | undefined, exceptId?: string): Promise<void> {
    if (name === undefined) return;
    const other = await repo.findOneBy({ name });
    if (other && other.id !== exceptId) throw new ConflictError('A site with this name exists', { name: ['is already used by another site'] });
  }

  return {
    entities: () => repo.find({ order: { name: 'ASC' } }),
    async list(): Promise<SiteDto[]> {
      return (await repo.find({ order: { name: 'ASC' } })).map(toSiteDto);
    },
    async get(id: string): Promise<Site> {
      const site = await repo.findOneBy({ id });
      if (!site) throw new NotFoundError('Site');
      return site;
    },
    async create(body: CreateSiteBody): Promise<SiteDto> {
      await checkStation(body.stationId);
      await checkNameFree(body.name);
      return toSiteDto(await repo.save(repo.create(body)));
    },
    async update(id: string, body: UpdateSiteBody): Promise<SiteDto> {
      const site = await this.get(id);
      await checkStation(body.stationId);
      await checkNameFree(body.name, id);
      return toSiteDto(await repo.save(repo.merge(site, body)));
    },
  };
}
export type SiteService = ReturnType<typeof createSiteService>;
