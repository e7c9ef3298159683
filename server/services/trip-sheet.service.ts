import type { DataSource } from 'typeorm';
import { Organisation } from '../db/entities/organisation.entity.js';
import { TripPlan } from '../db/entities/trip-plan.entity.js';
import { VolunteerProfile } from '../db/entities/volunteer-profile.entity.js';
import { Workday } from '../db/entities/workday.entity.js';
import type { TripInstanceJson, TripPlanJson } from '../domain/trips/index.js';
import { buildFloatPlan } from '../domain/trips/trip-sheet-float.js';
import type { PrintableSheet, TripSheetInput } from '../domain/trips/trip-sheet-types.js';
import { buildTripSheet } from '../domain/trips/trip-sheet.js';
import { NotFoundError } from '../errors.js';
import { loadCraft, loadPeople } from './trip-sheet-people.js';
import { renderSheetPdf } from './trip-sheet-pdf.js';

/** The person asking for the sheet: the coordinator the shore contact calls first. */
export interface SheetRequester {
  id: string;
  name: string;
  email: string;
}

export interface SheetFile {
  fileName: string;
  pdf: Buffer;
}

/** Printable trip sheet and float plan for a workday's stored trip plan (coordinators only: private contacts). */
export function createTripSheetService(deps: { db: DataSource }) {
  async function input(workdayId: string, requester: SheetRequester): Promise<TripSheetInput> {
    const workday = await deps.db.getRepository(Workday).findOne({ where: { id: workdayId }, relations: { site: true } });
    if (!workday) throw new NotFoundError('Workday');
    const row = await deps.db.getRepository(TripPlan).findOneBy({ workdayId });
    if (!row) throw new NotFoundError('Trip plan');
    const instance = row.instance as unknown as TripInstanceJson;
    const plan = row.plan as unknown as TripPlanJson;
    const org = await deps.db.getRepository(Organisation).findOneByOrFail({ id: 1 });
    const phone = (await deps.db.getRepository(VolunteerProfile).findOneBy({ userId: requester.id }))?.phone ?? null;
    const people = await loadPeople(deps.db, workdayId, instance);
    return {
      organisation: { name: org.name, contactEmail: org.contactEmail, units: org.units, timeZone: org.timeZone },
      workday: { title: workday.title, siteName: workday.site.name, launchName: workday.site.launchName, meetingPoint: workday.meetingPoint },
      coordinator: { name: requester.name, email: requester.email, phone },
      instance,
      plan,
      source: row.source === 'edited' ? 'edited' : 'solver',
      planUpdatedAt: row.updatedAt.getTime(),
      craft: await loadCraft(deps.db, instance, people),
      people,
    };
  }

  async function render(sheet: PrintableSheet): Promise<SheetFile> {
    return { fileName: sheet.fileName, pdf: await renderSheetPdf(sheet) };
  }

  return {
    /** The coordinator's trip sheet: craft, runs, loads, what stays ashore. */
    tripSheet: async (workdayId: string, requester: SheetRequester) => render(buildTripSheet(await input(workdayId, requester))),
    /** The float plan for the shore contact, with emergency contacts. */
    floatPlan: async (workdayId: string, requester: SheetRequester) => render(buildFloatPlan(await input(workdayId, requester))),
  };
}
export type TripSheetService = ReturnType<typeof createTripSheetService>;
