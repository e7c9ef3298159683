import { z } from 'zod';
import { CrewRole } from './crew.schema.js';

/** One workday on my hours list: my role and minutes, and what the crew planted that day. */
export const HoursRow = z.object({
  workdayId: z.string(),
  title: z.string(),
  startsAt: z.string(),
  role: CrewRole,
  minutes: z.number(),
  noShow: z.boolean(),
  /** Trees the workday recorded as planted, when it was a planting day I was checked in at; else 0. */
  crewTreesPlanted: z.number().int().min(0),
});
export type HoursRow = z.infer<typeof HoursRow>;

/** `GET /api/me/hours`: my workdays in the period, newest first, with totals. */
export const MyHours = z.object({
  rows: z.array(HoursRow),
  totalMinutes: z.number(),
  totalHours: z.number(),
  workdaysAttended: z.number(),
  /** Trees planted by crews I was on (checked in) in the period: the rows' `crewTreesPlanted` summed. */
  crewTreesPlanted: z.number().int().min(0),
});
export type MyHours = z.infer<typeof MyHours>;
