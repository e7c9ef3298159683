/**
 * Loads the records reports are computed from (never stored totals). Local dates are taken in
 * PostgreSQL: a workday's at its site's time zone, everything else at the organisation's.
 */
import type { EntityManager } from 'typeorm';
import type { LengthUnit } from '../../shared/schemas/organisation.schema.js';
import { Organisation } from '../db/entities/organisation.entity.js';
import { minutesWorked } from '../domain/crew/hours.js';
import type { AttendanceRecord, DonationRecord, NurseryRecord, PlantingRecord, ReportRange } from '../domain/outcomes/reports.js';
import type { CheckRecord, Condition } from '../domain/outcomes/survival.js';

export interface ReportOrganisation {
  name: string;
  isDemo: boolean;
  units: LengthUnit;
  timeZone: string;
  currency: string;
  hourValueCents: number;
  hourValueSource: string;
}

/** A planting record with where it went in, for the printed report. */
export interface PlantingDetail extends PlantingRecord {
  bedElevationM: number | null;
  stationId: string;
}

export async function reportOrganisation(tx: EntityManager): Promise<ReportOrganisation> {
  const o = await tx.getRepository(Organisation).findOneByOrFail({ id: 1 });
  return { name: o.name, isDemo: o.isDemo, units: o.units, timeZone: o.timeZone, currency: o.currency, hourValueCents: o.volunteerHourValueCents, hourValueSource: o.volunteerHourValueSource };
}

const site = (r: ReportRange) => r.siteId ?? null;

/** Confirmed places on published or completed workdays dated in the range, with minutes credited. */
export async function loadAttendance(tx: EntityManager, r: ReportRange): Promise<AttendanceRecord[]> {
  const rows: { user_id: string; name: string; site_id: string; day: string; checked_in_at: Date | null; checked_out_at: Date | null; minutes_override: number | null; no_show: boolean }[] = await tx.query(
    `SELECT s.user_id, u.name, w.site_id, to_char(w.starts_at AT TIME ZONE st.time_zone, 'YYYY-MM-DD') AS day,
            s.checked_in_at, s.checked_out_at, s.minutes_override, s.no_show
       FROM signup s JOIN workday w ON w.id = s.workday_id JOIN site st ON st.id = w.site_id JOIN app_user u ON u.id = s.user_id
      WHERE s.status = 'confirmed' AND w.status IN ('published', 'completed')
        AND (w.starts_at AT TIME ZONE st.time_zone)::date BETWEEN $1::date AND $2::date
        AND ($3::uuid IS NULL OR w.site_id = $3::uuid)`,
    [r.from, r.to, site(r)],
  );
  return rows.map((a) => ({
    userId: a.user_id, name: a.name, siteId: a.site_id, day: a.day,
    minutes: minutesWorked({ checkedInAt: a.checked_in_at, checkedOutAt: a.checked_out_at, minutesOverride: a.minutes_override, noShow: a.no_show }),
  }));
}

/** Trees planted in the range, each with its latest check on or before `asOf`. */
export async function loadPlantings(tx: EntityManager, r: ReportRange, asOf: string): Promise<PlantingDetail[]> {
  const rows: { id: string; site_id: string; site_name: string; station_id: string; planted_on: string; bed: number | null; stage: string; latest: Condition | null; has_check: boolean }[] = await tx.query(
    `SELECT t.id, t.site_id, st.name AS site_name, st.station_id, to_char(t.planted_on, 'YYYY-MM-DD') AS planted_on,
            t.planted_bed_elevation_m AS bed, t.stage,
            (SELECT c.condition FROM tree_check c JOIN monitoring_visit v ON v.id = c.visit_id
              WHERE c.tree_id = t.id AND v.visited_on <= $3::date ORDER BY v.visited_on DESC, c.created_at DESC LIMIT 1) AS latest,
            EXISTS (SELECT 1 FROM tree_check c WHERE c.tree_id = t.id) AS has_check
       FROM tree t JOIN site st ON st.id = t.site_id
      WHERE t.planted_on BETWEEN $1::date AND $2::date AND t.stage IN ('planted', 'alive', 'lost')
        AND ($4::uuid IS NULL OR t.site_id = $4::uuid)`,
    [r.from, r.to, asOf, site(r)],
  );
  return rows.map((t) => ({
    treeId: t.id, siteId: t.site_id, siteName: t.site_name, plantedOn: t.planted_on, latest: t.latest,
    lostWithoutCheck: t.stage === 'lost' && !t.has_check, bedElevationM: t.bed, stationId: t.station_id,
  }));
}

/** Every check of the given trees dated on or before `asOf`. */
export async function loadChecks(tx: EntityManager, treeIds: readonly string[], asOf: string): Promise<CheckRecord[]> {
  if (treeIds.length === 0) return [];
  const rows: { tree_id: string; visited_on: string; condition: Condition }[] = await tx.query(
    `SELECT c.tree_id, to_char(v.visited_on, 'YYYY-MM-DD') AS visited_on, c.condition
       FROM tree_check c JOIN monitoring_visit v ON v.id = c.visit_id
      WHERE c.tree_id = ANY($1::uuid[]) AND v.visited_on <= $2::date`,
    [treeIds, asOf],
  );
  return rows.map((c) => ({ treeId: c.tree_id, visitedOn: c.visited_on, condition: c.condition }));
}

/** Paid gifts (refunded ones are left out) paid in the range, with their campaign's name. */
export async function loadDonations(tx: EntityManager, r: ReportRange, timeZone: string): Promise<DonationRecord[]> {
  const rows: { campaign_id: string | null; campaign_name: string | null; amount_cents: number; tree_count: number; paid_on: string }[] = await tx.query(
    `SELECT d.campaign_id, c.name AS campaign_name, d.amount_cents, d.tree_count, to_char(d.paid_at AT TIME ZONE $3, 'YYYY-MM-DD') AS paid_on
       FROM donation d LEFT JOIN campaign c ON c.id = d.campaign_id
      WHERE d.status = 'paid' AND (d.paid_at AT TIME ZONE $3)::date BETWEEN $1::date AND $2::date`,
    [r.from, r.to, timeZone],
  );
  return rows.map((d) => ({ campaignId: d.campaign_id, campaignName: d.campaign_name, amountCents: d.amount_cents, treeCount: d.tree_count, paidOn: d.paid_on }));
}

/**
 * Nursery events in the range: trees collected (their batch's collection date, or the day they
 * entered the ledger when they have no batch) and trees moved into a grow-out pot (stage changes
 * to `potted` in their history).
 */
export async function loadNursery(tx: EntityManager, r: ReportRange, timeZone: string): Promise<{ collected: NurseryRecord[]; potted: NurseryRecord[] }> {
  const collected: { id: string; day: string }[] = await tx.query(
    `SELECT t.id, to_char(COALESCE(b.collected_on, (t.created_at AT TIME ZONE $3)::date), 'YYYY-MM-DD') AS day
       FROM tree t LEFT JOIN collection_batch b ON b.id = t.batch_id
      WHERE COALESCE(b.collected_on, (t.created_at AT TIME ZONE $3)::date) BETWEEN $1::date AND $2::date`,
    [r.from, r.to, timeZone],
  );
  const potted: { tree_id: string; day: string }[] = await tx.query(
    `SELECT e.tree_id, to_char(e.at AT TIME ZONE $3, 'YYYY-MM-DD') AS day
       FROM tree_event e
      WHERE e.kind = 'stage' AND e.to_stage = 'potted' AND (e.at AT TIME ZONE $3)::date BETWEEN $1::date AND $2::date`,
    [r.from, r.to, timeZone],
  );
  return { collected: collected.map((c) => ({ treeId: c.id, day: c.day })), potted: potted.map((p) => ({ treeId: p.tree_id, day: p.day })) };
}
