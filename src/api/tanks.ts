import { z } from 'zod';
import { BriningPlanDto, NurseryTasksDto, ReadingDto, TankDto, TreeRow, type CreateTankBody, type MeasurementRoundBody, type ReadingBody, type UpdateTankBody } from '@shared/schemas/nursery.schema';
import { get, patch, post, queryString } from './http';

const TanksResponse = z.object({ tanks: z.array(TankDto) });
const ReadingResponse = z.object({ reading: ReadingDto });
const ReadingsResponse = z.object({ readings: z.array(ReadingDto) });
const TankResponse = z.object({ tank: TankDto });
const RoundResponse = z.object({ recorded: z.number(), trees: z.array(TreeRow) });

const tankPath = (id: string) => `/api/tanks/${encodeURIComponent(id)}`;

/** Everyone signed in. */
export async function listTanks(): Promise<TankDto[]> {
  return (await get('/api/tanks', TanksResponse)).tanks;
}

/** Coordinators and admins: volume in litres (the form converts US gallons). */
export async function createTank(body: CreateTankBody): Promise<TankDto> {
  return (await post('/api/tanks', body, TankResponse)).tank;
}

/** Coordinators and admins: only the fields given change. */
export async function updateTank(id: string, body: UpdateTankBody): Promise<TankDto> {
  return (await patch(tankPath(id), body, TankResponse)).tank;
}

/** Coordinators and admins: one measurement per listed tree of the tank, all or none. */
export function recordMeasurementRound(tankId: string, body: MeasurementRoundBody): Promise<z.infer<typeof RoundResponse>> {
  return post(`${tankPath(tankId)}/measurement-round`, body, RoundResponse);
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
