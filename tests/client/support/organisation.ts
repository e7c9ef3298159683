import { http, HttpResponse } from 'msw';
import { DEFAULT_NURSERY_RULES } from '@shared/schemas/nursery.schema';
import { DEFAULT_GIVING_RULES, DEFAULT_TRIP_RULES, type OrganisationSettings, type PublicOrganisation } from '@shared/schemas/organisation.schema';
import { DEFAULT_ORGANISATION, server } from '../../setup/client-setup';
import { errorResponse } from './msw';

export function buildOrganisation(overrides: Partial<PublicOrganisation> = {}): PublicOrganisation {
  return { ...DEFAULT_ORGANISATION, ...overrides };
}

export function buildSettings(overrides: Partial<OrganisationSettings> = {}): OrganisationSettings {
  return {
    ...DEFAULT_ORGANISATION,
    legalName: 'Harbour Fringe Restoration Inc.',
    taxId: '12-3456789',
    contactEmail: 'hello@harbour-fringe.example.test',
    windowWeights: { duration: 1, lowWater: 1, weekend: 0.5, startHour: 0.5 },
    nurseryRules: DEFAULT_NURSERY_RULES,
    tripRules: DEFAULT_TRIP_RULES,
    givingRules: DEFAULT_GIVING_RULES,
    volunteerHourValueCents: 3180,
    volunteerHourValueSource: 'Independent Sector, national value of a volunteer hour, 2022',
    ...overrides,
  };
}

/** Answers GET /api/organisation with `organisation`, or with a 500 when given 'error'. */
export function mockOrganisation(organisation: PublicOrganisation | 'error'): void {
  server.use(
    http.get('/api/organisation', () =>
      organisation === 'error'
        ? errorResponse(500, 'internal_error', 'boom')
        : HttpResponse.json({ organisation }),
    ),
  );
}
