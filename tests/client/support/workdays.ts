import { randomUUID } from 'node:crypto';
import { http, HttpResponse } from 'msw';
import type { SignupResult } from '@shared/schemas/crew.schema';
import type { Profile } from '@shared/schemas/profile.schema';
import type { WorkdayDto } from '@shared/schemas/workday.schema';
import type { Waiver } from '@/api/signups';
import type { WorkdayDayTide } from '@/api/tide';
import { server } from '../../setup/client-setup';
import { errorResponse } from './msw';
import { buildSite, buildTide } from './sites';

/** Invented test data for the volunteer's workday pages; the clock is 1 March 2025 (see useClock). */
export const HERON = { id: randomUUID(), name: 'Heron Cove', launchName: 'Bayside ramp', timeZone: 'America/New_York', latitude: 27.99, longitude: -82.69 };
export const PELICAN = { id: randomUUID(), name: 'Pelican Flats', launchName: 'North slip', timeZone: 'America/Los_Angeles', latitude: 33.7, longitude: -118.2 };

/** A published planting workday on Sat 15 Mar 2025, 07:30–11:00 EDT at Heron Cove, roles capped. */
export function buildWorkday(overrides: Partial<WorkdayDto> = {}): WorkdayDto {
  const site = overrides.site ?? HERON;
  return {
    id: randomUUID(),
    title: 'Spring planting at Heron Cove',
    kind: 'planting',
    siteId: site.id,
    startsAt: '2025-03-15T11:30:00.000Z',
    endsAt: '2025-03-15T15:00:00.000Z',
    status: 'published',
    description: 'We set forty potted trees along the north fringe.',
    meetingPoint: 'Bayside ramp, by the green shed',
    whatToBring: 'Water bottle\n- Hat and sunscreen\nClosed shoes for mud',
    minimumAge: 0,
    capacity: 10,
    cancelMessage: '',
    site,
    confirmed: 6,
    waitlisted: 1,
    roles: [
      { role: 'planter', capacity: 6, confirmed: 3, waitlisted: 0 },
      { role: 'own-kayak', capacity: 3, confirmed: 3, waitlisted: 1 },
      { role: 'operator', capacity: 1, confirmed: 0, waitlisted: 0 },
      { role: 'seat', capacity: 0, confirmed: 0, waitlisted: 0 },
    ],
    roleCapped: true,
    ...overrides,
  };
}

export function buildWaiver(overrides: Partial<Waiver> = {}): Waiver {
  return {
    version: 3,
    text: 'I take part of my own free will and know that work on tidal flats and in small craft carries risks.',
    guardianText: 'As parent or guardian I consent to this young person taking part.',
    createdAt: '2025-01-10T12:00:00.000Z',
    ...overrides,
  };
}

export function buildProfile(overrides: Partial<Profile> = {}): Profile {
  return { dateOfBirth: '1990-04-02', phone: null, emergencyContact: { name: 'Tomas Mendes', phone: '+1 727 555 0142' }, skills: ['paddler'], remindersOptOut: false, ...overrides };
}

/**
 * The tide at Heron Cove on Sat 15 Mar 2025 (EDT: local midnight is 04:00Z): a low at 08:40 and a high
 * at 15:10, and one low after the day, which the page must leave out.
 */
export function buildDayTide(): WorkdayDayTide {
  const from = Date.parse('2025-03-15T04:00:00.000Z');
  const levels = Array.from({ length: 145 }, (_, i) => ({
    time: new Date(from + i * 600_000).toISOString(),
    height: Math.round((0.85 + 1.35 * Math.cos((2 * Math.PI * (i - 93)) / 75)) * 100) / 100,
  }));
  return buildTide(buildSite({ id: HERON.id, name: HERON.name }), {
    levels,
    extremes: [
      { time: '2025-03-15T12:40:00.000Z', height: -0.5, type: 'low' },
      { time: '2025-03-15T19:10:00.000Z', height: 2.2, type: 'high' },
      { time: '2025-03-16T05:00:00.000Z', height: -0.1, type: 'low' },
    ],
    daylight: [{ date: '2025-03-15', civilDawn: '2025-03-15T10:58:00.000Z', sunrise: '2025-03-15T11:22:00.000Z', sunset: '2025-03-15T23:27:00.000Z', civilDusk: '2025-03-15T23:51:00.000Z' }],
    windows: [],
  });
}

/** What the workday page asked for and sent, for assertions. */
export interface PageRequests {
  tide: URL[];
  posted: unknown[];
  deleted: number;
}

/**
 * Answers everything the workday page of `workday` loads: the workday, and for signed-in people
 * my place (`mine`, null for none), the crew, the day's tide, the profile and the waiver.
 */
export function mockWorkdayPage(
  workday: WorkdayDto,
  options: { mine?: SignupResult | null; profile?: Profile; waiver?: Waiver; tide?: WorkdayDayTide; signup?: () => Response } = {},
): PageRequests {
  const seen: PageRequests = { tide: [], posted: [], deleted: 0 };
  const path = `/api/workdays/${workday.id}`;
  server.use(
    http.get(path, () => HttpResponse.json({ workday })),
    http.get(`${path}/signups/mine`, () => (options.mine ? HttpResponse.json(options.mine) : errorResponse(404, 'not_found', 'Sign-up not found'))),
    http.get(`${path}/crew`, () => HttpResponse.json({ crew: [{ firstName: 'Ana', role: 'planter' }, { firstName: 'Ben', role: 'planter' }, { firstName: 'Kai', role: 'own-kayak' }] })),
    http.get(`/api/workdays/${workday.id}/tide`, ({ request }) => {
      seen.tide.push(new URL(request.url));
      return HttpResponse.json(options.tide ?? buildDayTide());
    }),
    http.get('/api/me/profile', () => HttpResponse.json({ profile: options.profile ?? buildProfile() })),
    http.get('/api/waiver', () => HttpResponse.json({ waiver: options.waiver ?? buildWaiver() })),
    http.post(`${path}/signups`, async ({ request }) => {
      seen.posted.push(await request.json());
      return options.signup?.() ?? HttpResponse.json({ id: randomUUID(), status: 'confirmed', role: 'planter' }, { status: 201 });
    }),
    http.delete(`${path}/signups/mine`, () => {
      seen.deleted += 1;
      return new HttpResponse(null, { status: 204 });
    }),
  );
  return seen;
}
