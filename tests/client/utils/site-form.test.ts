import { describe, expect, it } from 'vitest';
import { CreateSiteBody, UpdateSiteBody } from '@shared/schemas/site.schema';
import {
  DEFAULTED_KEYS,
  emptySiteForm,
  formToCreateBody,
  formToUpdateBody,
  localiseLengthMessage,
  parseNumber,
  siteToForm,
  withSavedDefaults,
  type SiteForm,
} from '@/utils/site-form';
import { buildSite } from '../support/sites';

function filledForm(overrides: Partial<SiteForm> = {}): SiteForm {
  return {
    ...emptySiteForm('America/New_York', 'ft'),
    name: 'Heron Cove',
    latitude: '27.99',
    longitude: '-82.69',
    stationId: 'noaa/8726738',
    bedElevation: '0.5',
    routeElevation: '-1',
    launchDistance: '1.5',
    ...overrides,
  };
}

describe('site form', () => {
  it.each([
    ['', undefined],
    [' 1.5 ', 1.5],
    ['\u22121.5', -1.5],
    ['0,25', 0.25],
    ['.5', 0.5],
    ['1.5 ft', Number.NaN],
    ['abc', Number.NaN],
  ])('parseNumber("%s") is %s', (text, value) => {
    expect(parseNumber(text)).toEqual(value);
  });

  it('shows the schema defaults in feet for a new site', () => {
    const form = emptySiteForm('America/Chicago', 'ft');
    expect(form).toMatchObject({ timeZone: 'America/Chicago', workingDepth: '0.98', craftDraft: '0.49', draftMargin: '0.33', minWindowMinutes: '120' });
  });

  it('converts feet and nautical miles to metres for the create body, which the schema accepts', () => {
    const body = formToCreateBody(filledForm(), 'ft');

    expect(body.bedElevationM).toBeCloseTo(0.1524, 10);
    expect(body.routeElevationM).toBeCloseTo(-0.3048, 10);
    expect(body.launchDistanceM).toBeCloseTo(2778, 9);
    expect(body.workingDepthM).toBeCloseTo(0.98 * 0.3048, 10);
    expect(body).toMatchObject({ latitude: 27.99, longitude: -82.69, timeOffsetMinutes: 0, salinityPpt: null, includeCivilTwilight: false });
    expect(CreateSiteBody.safeParse(body).success).toBe(true);
  });

  it('leaves out empty required numbers so the schema names them', () => {
    const result = CreateSiteBody.safeParse(formToCreateBody(filledForm({ bedElevation: '', latitude: 'north' }), 'ft'));

    expect(result.success).toBe(false);
    const paths = result.error?.issues.map((i) => i.path.join('.'));
    expect(paths).toEqual(expect.arrayContaining(['bedElevationM', 'latitude']));
  });

  it('fills the form from a saved site in the display units', () => {
    const form = siteToForm(buildSite({ bedElevationM: 0.1524, launchDistanceM: 1852, salinityPpt: null, includeCivilTwilight: true }), 'ft');
    expect(form).toMatchObject({ bedElevation: '0.5', routeElevation: '-1', launchDistance: '1', salinityPpt: '', includeCivilTwilight: true });
    expect(siteToForm(buildSite({ launchDistanceM: 2500 }), 'm').launchDistance).toBe('2.5');
  });

  it('sends only what changed when editing, and a cleared number fails validation', () => {
    const initial = siteToForm(buildSite(), 'ft');
    const body = formToUpdateBody({ ...initial, name: 'Heron Cove North', bedElevation: '1' }, initial, 'ft');

    expect(Object.keys(body).sort()).toEqual(['bedElevationM', 'name']);
    expect(body.bedElevationM).toBeCloseTo(0.3048, 10);
    const cleared = UpdateSiteBody.safeParse(formToUpdateBody({ ...initial, routeElevation: '' }, initial, 'ft'));
    expect(cleared.error?.issues[0]?.path).toEqual(['routeElevationM']);
  });

  it('says metre limits in feet when the form is in feet', () => {
    expect(localiseLengthMessage('Must be at most 5 m', 'ft')).toBe('Must be at most 16.4 ft');
    expect(localiseLengthMessage('Must be at least -10 m', 'ft')).toBe('Must be at least \u221232.8 ft');
    expect(localiseLengthMessage('Must be at most 5 m', 'm')).toBe('Must be at most 5 m');
  });

  it('carries every field the update schema would fill with a default, at its saved value', () => {
    // Zod 4 applies .default() inside .partial(): whatever UpdateSiteBody fills in on its own must be sent.
    const filled = Object.keys(UpdateSiteBody.parse({}));
    expect(DEFAULTED_KEYS).toEqual(expect.arrayContaining(filled));

    const site = buildSite({ workingDepthM: 0.45, notes: 'North bar' });
    const body = withSavedDefaults({ name: 'New name', notes: 'South bar' }, site);
    expect(body).toMatchObject({ name: 'New name', notes: 'South bar', workingDepthM: 0.45 });
    expect(UpdateSiteBody.parse(body)).toEqual(body);
  });
});
