/** Why a hand edit of a trip plan was refused, in the coordinator's words and as data. */
import type { DataSource } from 'typeorm';
import type { TripViolationDto } from '../../shared/schemas/trips.schema.js';
import { Organisation } from '../db/entities/organisation.entity.js';
import { violationText, type TripInstanceJson, type TripRunJson, type TripViolation, type ViolationWords } from '../domain/trips/index.js';
import { craftName } from '../domain/trips/trip-sheet-format.js';
import { ValidationError } from '../errors.js';
import { loadCraft, loadPeople } from './trip-sheet-people.js';

/** A 400 `validation_failed` whose body also carries `violations`. */
export class TripPlanRefusedError extends ValidationError {
  constructor(
    message: string,
    fields: Record<string, string[]>,
    override readonly violations: TripViolationDto[],
  ) {
    super(message, fields, violations);
  }
}

/** Names, units and zone for the messages: people from the users, craft from the fleet (own kayaks by owner). */
async function wordsFor(db: DataSource, workdayId: string, instance: TripInstanceJson): Promise<ViolationWords> {
  const org = await db.getRepository(Organisation).findOneByOrFail({ id: 1 });
  const people = await loadPeople(db, workdayId, instance);
  const craft = await loadCraft(db, instance, people);
  const personNames = new Map(people.map((p) => [p.id, p.name]));
  const craftNames = new Map(craft.map((c) => [c.id, craftName(c)]));
  return {
    personName: (id) => personNames.get(id) ?? 'someone not on the crew',
    craftName: (id) => craftNames.get(id) ?? 'a craft not in the fleet',
    units: org.units,
    timeZone: org.timeZone,
  };
}

const isoOf = (ms: number) => new Date(ms).toISOString();

function toDto(v: TripViolation, message: string): TripViolationDto {
  const { at, by, ...figures } = v.facts ?? {};
  const facts = v.facts ? { ...figures, ...(at === undefined ? {} : { at: isoOf(at) }), ...(by === undefined ? {} : { by: isoOf(by) }) } : undefined;
  const where = { ...(v.craftId === undefined ? {} : { craftId: v.craftId }), ...(v.run === undefined ? {} : { run: v.run }) };
  return { rule: v.rule, ...where, ...(v.personIds ? { personIds: v.personIds } : {}), ...(facts ? { facts } : {}), message };
}

/** The body path a violation concerns: the run sent, the craft's first run sent, or the whole plan (`_`). */
function pathOf(v: TripViolation, runs: readonly TripRunJson[]): string {
  const i = runs.findIndex((r) => r.craftId === v.craftId && r.run === v.run);
  if (v.craftId !== undefined && v.run !== undefined && i >= 0) return `runs.${i}`;
  const first = runs.findIndex((r) => r.craftId === v.craftId);
  return v.craftId !== undefined && first >= 0 ? `runs.${first}.craftId` : '_';
}

/** The error for a refused edit: every message in `fields.runs` and under its own path, and the violations. */
export async function refusal(db: DataSource, workdayId: string, instance: TripInstanceJson, runs: readonly TripRunJson[], violations: readonly TripViolation[]) {
  const words = await wordsFor(db, workdayId, instance);
  const dtos = violations.map((v) => toDto(v, violationText(v, words)));
  const fields: Record<string, string[]> = { runs: dtos.map((d) => d.message) };
  violations.forEach((v, i) => (fields[pathOf(v, runs)] ??= []).push(dtos[i]?.message ?? v.message));
  return new TripPlanRefusedError('The edited plan breaks a rule', fields, dtos);
}
