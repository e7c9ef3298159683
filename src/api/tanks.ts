import { z } from 'zod';
import { BriningPlanDto, NurseryTasksDto, ReadingDto, TankDto, type ReadingBody } from '@shared/schemas/nursery.schema';
import { get, post, queryString } from './http';

const TanksResponse = z.object({ tanks: z.array(TankDto) });
const ReadingResponse = z.object({ reading: ReadingDto });
const ReadingsResponse = z.object({ readings: z.array(ReadingDto) });

const tankPath = (id: string) => `/api/tanks/${encodeURIComponent(id)}`;

/** Everyone signed in. */
export async function listTanks(): Promise<TankDto[]> {
  return (await get('/api/tanks', TanksResponse)).tanks;
}

/** Coordinators and admins: refractometer ppt, or hydrometer SG (t/t) with °C; the answer carries salinityPpt. */
export async function addReading(tankId: string, body: ReadingBody): Promise<ReadingDto> {
  return (await post(`${tankPath(tankId)}/readings`, body, ReadingResponse)).reading;
}

/** Everyone signed in: newest first. */
export async function listReadings(tankId: string): Promise<ReadingDto[]> {
  return (await get(`${tankPath(tankId)}/readings`, ReadingsResponse)).readings;
}

export interface BriningPlanQuery {
  targetPpt?: number;
  stockPpt?: number;
  by?: string;
}

/** Everyone signed in: steps from the latest reading toward the target. */
export function fetchBriningPlan(tankId: string, query: BriningPlanQuery): Promise<BriningPlanDto> {
  const text = (n: number | undefined) => (n === undefined ? undefined : String(n));
  const qs = queryString({ targetPpt: text(query.targetPpt), stockPpt: text(query.stockPpt), by: query.by });
  return get(`${tankPath(tankId)}/brining-plan${qs}`, BriningPlanDto);
}

/** Everyone signed in: water swaps due on `date` (today when left out). */
export function fetchNurseryTasks(date?: string): Promise<NurseryTasksDto> {
  return get(`/api/nursery/tasks${queryString({ date })}`, NurseryTasksDto);
}
