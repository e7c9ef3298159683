import { randomUUID } from 'node:crypto';
import { http, HttpResponse } from 'msw';
import type { RosterRow } from '@shared/schemas/roster.schema';
import type { WorkdayDto } from '@shared/schemas/workday.schema';
import { server } from '../../setup/client-setup';

/** Invented test data for the coordinator's workday pages. */
export function buildWorkdayDto(overrides: Partial<WorkdayDto> = {}): WorkdayDto {
  const siteId = overrides.siteId ?? randomUUID();
  return {
    id: randomUUID(),
    title: 'Planting at Heron Cove',
    kind: 'planting',
    siteId,
    // Tue 4 Mar 2025, 06:40–09:10 EST at the site.
    startsAt: '2025-03-04T11:40:00.000Z',
    endsAt: '2025-03-04T14:10:00.000Z',
    status: 'published',
    description: '',
    meetingPoint: 'Bayside ramp',
    whatToBring: '',
    minimumAge: 0,
    capacity: 12,
    cancelMessage: '',
    site: { id: siteId, name: 'Heron Cove', launchName: 'Bayside ramp', timeZone: 'America/New_York', latitude: 27.99, longitude: -82.69 },
    confirmed: 5,
    waitlisted: 1,
    roles: [
      { role: 'planter', capacity: 8, confirmed: 4, waitlisted: 1 },
      { role: 'operator', capacity: 1, confirmed: 1, waitlisted: 0 },
    ],
    roleCapped: true,
    ...overrides,
  };
}

export function buildRosterRow(overrides: Partial<RosterRow> = {}): RosterRow {
  return {
    signupId: randomUUID(),
    userId: randomUUID(),
    name: 'Ana Ruiz',
    email: `ana.${randomUUID().slice(0, 6)}@example.test`,
    emailVerified: true,
    role: 'planter',
    status: 'confirmed',
    position: null,
    waiverVersion: 2,
    waiverSignedName: 'Ana Ruiz',
    waiverSignedAt: '2025-02-20T15:00:00.000Z',
    isMinor: false,
    guardianName: null,
    ageNotGiven: false,
    skills: [],
    ownCraft: null,
    operatorQualification: '',
    emergencyContact: { name: 'Luis Ruiz', phone: '+1 727 555 0101' },
    phone: '+1 727 555 0100',
    note: '',
    checkedInAt: null,
    checkedOutAt: null,
    noShow: false,
    minutes: 0,
    minutesOverridden: false,
    ...overrides,
  };
}

/** Answers GET /api/workdays/:id with `workday` and its roster with `roster` (a function is called on each request). */
export function mockWorkdayAndRoster(workday: WorkdayDto, roster: RosterRow[] | (() => RosterRow[]) = []): void {
  server.use(
    http.get(`/api/workdays/${workday.id}`, () => HttpResponse.json({ workday })),
    http.get(`/api/workdays/${workday.id}/roster`, () => HttpResponse.json({ roster: typeof roster === 'function' ? roster() : roster })),
  );
}
