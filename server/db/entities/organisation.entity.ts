import { Check, Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import type { NurseryRules } from '../../../shared/schemas/nursery.schema.js';
import type { GivingRules, LengthUnit, TripRules, WindowWeights } from '../../../shared/schemas/organisation.schema.js';

/** The one organisation an instance serves (single row, id 1). */
@Entity({ name: 'organisation' })
@Check('CHK_organisation_single_row', `"id" = 1`)
export class Organisation {
  @PrimaryColumn({ type: 'smallint', default: 1 })
  id: number;

  @Column({ type: 'varchar', length: 160 })
  name: string;

  /** Printed on donation receipts. */
  @Column({ type: 'varchar', length: 200, name: 'legal_name', default: '' })
  legalName: string;

  @Column({ type: 'varchar', length: 40, name: 'tax_id', default: '' })
  taxId: string;

  @Column({ type: 'varchar', length: 254, name: 'contact_email', default: '' })
  contactEmail: string;

  @Column({ type: 'varchar', length: 2, default: 'ft' })
  units: LengthUnit;

  @Column({ type: 'varchar', length: 64, name: 'time_zone', default: 'America/New_York' })
  timeZone: string;

  /** How low-water windows are ranked (see server/domain/tide/window-ranking.ts); default written as PostgreSQL prints jsonb. */
  @Column({ type: 'jsonb', name: 'window_weights', default: () => `'{"weekend": 0.25, "duration": 0.4, "lowWater": 0.2, "startHour": 0.15}'` })
  windowWeights: WindowWeights;

  /** How tree readiness for a site is judged (see server/domain/nursery/readiness.ts). */
  @Column({ type: 'jsonb', name: 'nursery_rules', default: () => `'{"holdDays": 21, "crownRule": "mhhw", "salinityTolerancePpt": 2, "maxCrownSubmergedShare": 0.02}'` })
  nurseryRules: NurseryRules;

  /** How trip plans are built (see server/domain/trips/); default written as PostgreSQL prints jsonb. */
  @Column({
    type: 'jsonb',
    name: 'trip_rules',
    default: () => `'{"potMassKg": 27, "loadMinutes": 10, "platedMargin": 1, "unloadMinutes": 5, "standardPersonKg": 84, "paddlecraftMargin": 0.7, "plantingMinutesPerTree": 20}'`,
  })
  tripRules: TripRules;

  /** ISO 4217 code, lower case as the payments API writes it; one currency per organisation. */
  @Column({ type: 'varchar', length: 3, default: 'usd' })
  currency: string;

  /** Card fee used for "cover the fees" (see shared/domain/fee-cover.ts). */
  @Column({ type: 'jsonb', name: 'giving_rules', default: () => `'{"cardFeePercent": 2.9, "cardFeeFixedCents": 30}'` })
  givingRules: GivingRules;

  /** Value of one volunteer hour in cents, for reports. */
  @Column({ type: 'integer', name: 'volunteer_hour_value_cents', default: 3180 })
  volunteerHourValueCents: number;

  /** Where the hourly value comes from, printed beside it in reports. */
  @Column({ type: 'varchar', length: 200, name: 'volunteer_hour_value_source', default: 'Independent Sector, national value of a volunteer hour, 2022' })
  volunteerHourValueSource: string;

  /** Marks seeded demo data, so the interface can say so plainly. */
  @Column({ type: 'boolean', name: 'is_demo', default: false })
  isDemo: boolean;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt: Date;
}
