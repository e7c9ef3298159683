import type { DataSource } from 'typeorm';
import type { OrganisationSettings, PublicOrganisation, UpdateOrganisationBody } from '../../shared/schemas/organisation.schema.js';
import { Organisation } from '../db/entities/organisation.entity.js';

const toSettings = (o: Organisation): OrganisationSettings => ({
  name: o.name,
  isDemo: o.isDemo,
  units: o.units,
  timeZone: o.timeZone,
  legalName: o.legalName,
  taxId: o.taxId,
  contactEmail: o.contactEmail,
  windowWeights: o.windowWeights,
  nurseryRules: o.nurseryRules,
  tripRules: o.tripRules,
  currency: o.currency,
  givingRules: o.givingRules,
  volunteerHourValueCents: o.volunteerHourValueCents,
  volunteerHourValueSource: o.volunteerHourValueSource,
});

export function createOrganisationService(deps: { db: DataSource }) {
  const repo = deps.db.getRepository(Organisation);
  const load = () => repo.findOneByOrFail({ id: 1 });
  return {
    async settings(): Promise<OrganisationSettings> {
      return toSettings(await load());
    },
    async publicView(): Promise<PublicOrganisation> {
      const { name, isDemo, units, timeZone, currency } = toSettings(await load());
      return { name, isDemo, units, timeZone, currency };
    },
    async update(body: UpdateOrganisationBody): Promise<OrganisationSettings> {
      await repo.update({ id: 1 }, body);
      return toSettings(await load());
    },
  };
}
export type OrganisationService = ReturnType<typeof createOrganisationService>;
