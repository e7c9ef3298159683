import { z } from 'zod';
import { Craft, RuleOfThumb, type CreateCraftBody, type UpdateCraftBody } from '@shared/schemas/trips.schema';
import { del, get, patch, post, queryString } from './http';

const FleetResponse = z.object({ craft: z.array(Craft) });
const CraftResponse = z.object({ craft: Craft });

function craftPath(id: string): string {
  return `/api/fleet/${encodeURIComponent(id)}`;
}

/** Every craft of the organisation, active ones first, by name. */
export async function listFleet(): Promise<Craft[]> {
  return (await get('/api/fleet', FleetResponse)).craft;
}

/** Coordinators and admins; 409 `conflict` (on `name`) when another craft has the name. */
export async function createCraft(body: CreateCraftBody): Promise<Craft> {
  return (await post('/api/fleet', body, CraftResponse)).craft;
}

/** Coordinators and admins; send only what changed. */
export async function updateCraft(id: string, body: UpdateCraftBody): Promise<Craft> {
  return (await patch(craftPath(id), body, CraftResponse)).craft;
}

/** Coordinators and admins: the craft stays on record (plans refer to it) but is no longer planned with. */
export async function retireCraft(id: string): Promise<Craft> {
  return (await del(craftPath(id), CraftResponse)).craft;
}

/** The boater-education persons rule of thumb for a small boat without a plate: a suggestion, never a rating. */
export async function fetchRuleOfThumb(lengthFt: number, beamFt: number): Promise<RuleOfThumb> {
  return get(`/api/fleet/rule-of-thumb${queryString({ lengthFt: String(lengthFt), beamFt: String(beamFt) })}`, RuleOfThumb);
}
