import { z } from 'zod';
import { DayCapacity, type DayCapacityBody } from '@shared/schemas/trip-capacity.schema';
import { get, post } from './http';

const CapacityResponse = z.object({ capacity: DayCapacity });

/** Coordinators and admins: what a saved workday can plant and the crew per role it needs. */
export async function fetchWorkdayCapacity(workdayId: string): Promise<DayCapacity> {
  return (await get(`/api/workdays/${encodeURIComponent(workdayId)}/capacity`, CapacityResponse)).capacity;
}

/** Coordinators and admins: the same for a window and site still being planned. */
export async function estimateDayCapacity(body: DayCapacityBody): Promise<DayCapacity> {
  return (await post('/api/trip-plans/capacity', body, CapacityResponse)).capacity;
}
