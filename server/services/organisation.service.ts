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
});

export function createOrganisationService(deps: { db: DataSource }) {
  const repo = deps.db.getRepository(Organisation);
  const load = () => repo.findOneByOrFail({ id: 1 });
  return {
    async settings(): Promise<OrganisationSettings> {
      return toSettings(await load());
    },
    async publicView(): Promise<PublicOrganisation> {
      const { name, isDemo, units, timeZone } = toSettings(await load());
      return { name, isDemo, units, timeZone };
    },
    async update(body: UpdateOrganisationBody): Promise<OrganisationSettings> {
      await repo.update({ id: 1 }, body);
      return toSettings(await load());
    },
  };
}
export type OrganisationService = ReturnType<typeof createOrganisationService>;
