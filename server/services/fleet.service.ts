import type { DataSource } from 'typeorm';
import type { Craft as CraftDto, CreateCraftBody, RuleOfThumb, UpdateCraftBody } from '../../shared/schemas/trips.schema.js';
import { Craft } from '../db/entities/craft.entity.js';
import { ruleOfThumbPersons } from '../domain/trips/index.js';
import { ConflictError, NotFoundError } from '../errors.js';

export function toCraftDto(c: Craft): CraftDto {
  const { createdAt, updatedAt, ...rest } = c;
  return { ...rest, createdAt: createdAt.toISOString(), updatedAt: updatedAt.toISOString() };
}

/** A suggestion for a small powerboat with no capacity plate, never a rating. */
export function ruleOfThumb(lengthFt: number, beamFt: number): RuleOfThumb {
  const persons = ruleOfThumbPersons(lengthFt, beamFt);
  return {
    persons,
    note:
      `Boater-education rule of thumb (boat-ed.com study guide, "Calculating your boat's capacity"): ` +
      `length × beam ÷ 15 = ${lengthFt} × ${beamFt} ÷ 15, rounded down, for a monohull under 20 ft in calm water. ` +
      'A suggestion only, not a rating: the capacity plate or the maker\'s figure always wins.',
  };
}

/** The organisation's craft: list, register, edit, retire (never deleted: plans refer to them). */
export function createFleetService(deps: { db: DataSource }) {
  const repo = deps.db.getRepository(Craft);

  async function checkNameFree(name: string | undefined, exceptId?: string): Promise<void> {
    if (name === undefined) return;
    const other = await repo.findOneBy({ name });
    if (other && other.id !== exceptId) throw new ConflictError('A craft with this name exists', { name: ['is already used by another craft'] });
  }
  async function get(id: string): Promise<Craft> {
    const craft = await repo.findOneBy({ id });
    if (!craft) throw new NotFoundError('Craft');
    return craft;
  }

  return {
    /** Active craft, for the planner. */
    active: () => repo.find({ where: { active: true }, order: { name: 'ASC' } }),
    async list(): Promise<CraftDto[]> {
      return (await repo.find({ order: { active: 'DESC', name: 'ASC' } })).map(toCraftDto);
    },
    async create(body: CreateCraftBody): Promise<CraftDto> {
      await checkNameFree(body.name);
      return toCraftDto(await repo.save(repo.create(body)));
    },
    async update(id: string, body: UpdateCraftBody): Promise<CraftDto> {
      const craft = await get(id);
      await checkNameFree(body.name, id);
      return toCraftDto(await repo.save(repo.merge(craft, body)));
    },
    async retire(id: string): Promise<CraftDto> {
      const craft = await get(id);
      craft.active = false;
      return toCraftDto(await repo.save(craft));
    },
  };
}
export type FleetService = ReturnType<typeof createFleetService>;
