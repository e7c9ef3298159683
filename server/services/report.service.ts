import type { DataSource, EntityManager } from 'typeorm';
import type { DonationsReport, HoursReport, HoursReportQuery, ReportQuery, ReportSummary, SurvivalReport, TreesReport } from '../../shared/schemas/report.schema.js';
import { Site } from '../db/entities/site.entity.js';
import { hoursFromMinutes } from '../domain/crew/hours.js';
import { plantingDays, type PlantingDayRow } from '../domain/outcomes/planting-summary.js';
import { formatMoney } from '../domain/outcomes/report-format.js';
import { donationsTable, hoursTable, summaryFigures, treesTable, volunteerValueCents, type ReportRange } from '../domain/outcomes/reports.js';
import { survivalTable } from '../domain/outcomes/survival.js';
import { localDate } from '../domain/tide/time-zone.js';
import { NotFoundError } from '../errors.js';
import { renderReportPdf } from './report-pdf.js';
import { loadAttendance, loadChecks, loadDonations, loadNursery, loadPlantings, reportOrganisation, type ReportOrganisation } from './report-data.js';

const rangeOf = (q: ReportQuery): ReportRange => ({ from: q.from, to: q.to, ...(q.siteId && { siteId: q.siteId }) });
const echo = (q: ReportQuery) => ({ from: q.from, to: q.to, siteId: q.siteId ?? null });
const DONATIONS_NOTE = 'Donations belong to no site, so the site filter does not apply to them.';

/** Everything the printed report shows. */
export interface ReportPdfData {
  organisation: ReportOrganisation;
  summary: ReportSummary;
  plantingDays: PlantingDayRow[];
  survival: SurvivalReport;
  trees: TreesReport;
  siteName: string | null;
}

/**
 * Report tables, computed from the records on every request. Each request reads in one
 * REPEATABLE READ transaction, so all figures of an answer come from the same snapshot.
 */
export function createReportService(deps: { db: DataSource; clock: () => Date }) {
  const read = <T>(q: ReportQuery, fn: (tx: EntityManager, org: ReportOrganisation, asOf: (to: string) => string) => Promise<T>) =>
    deps.db.transaction('REPEATABLE READ', async (tx) => {
      if (q.siteId && !(await tx.getRepository(Site).existsBy({ id: q.siteId }))) throw new NotFoundError('Site');
      const org = await reportOrganisation(tx);
      const today = localDate(deps.clock().getTime(), org.timeZone);
      return fn(tx, org, (to) => (to < today ? to : today));
    });

  function summaryNotes(q: ReportQuery, org: ReportOrganisation, asOf: string, notChecked: number): string[] {
    return [
      `Volunteer hours are the minutes credited at check-in and check-out (or as corrected by a coordinator) on workdays dated ${q.from} to ${q.to}, valued at ${formatMoney(org.hourValueCents, org.currency)} an hour (${org.hourValueSource}).`,
      `Trees alive are the trees planted in the range that were neither lost nor missing at their latest check up to ${asOf}; ${notChecked} not yet checked count as alive. Missing trees count as not alive.`,
      `Donations are paid gifts, less any refunded, paid ${q.from} to ${q.to}.${q.siteId ? ` ${DONATIONS_NOTE}` : ''}`,
    ];
  }

  async function summaryIn(tx: EntityManager, org: ReportOrganisation, q: ReportQuery, asOf: string): Promise<ReportSummary> {
    const r = rangeOf(q);
    const [attendance, plantings, donations] = [await loadAttendance(tx, r), await loadPlantings(tx, r, asOf), await loadDonations(tx, r, org.timeZone)];
    const figures = summaryFigures({ attendance, plantings, donations }, r, org.hourValueCents);
    return {
      ...echo(q), asOf, ...figures,
      volunteerHourValueCents: org.hourValueCents, volunteerHourValueSource: org.hourValueSource, currency: org.currency,
      notes: summaryNotes(q, org, asOf, figures.treesNotChecked),
    };
  }

  async function survivalIn(tx: EntityManager, q: ReportQuery, asOf: string): Promise<SurvivalReport> {
    const plantings = (await loadPlantings(tx, rangeOf(q), asOf)).filter((p) => p.plantedOn <= asOf);
    const names = new Map(plantings.map((p) => [p.siteId, p.siteName]));
    const checks = await loadChecks(tx, plantings.map((p) => p.treeId), asOf);
    const table = survivalTable(plantings.map((p) => ({ id: p.treeId, siteId: p.siteId, plantedOn: p.plantedOn })), checks, { asOf });
    const named = <T extends { siteId: string }>(rows: T[]) => rows.map((row) => ({ ...row, siteName: names.get(row.siteId) ?? '' })).sort((a, b) => a.siteName.localeCompare(b.siteName));
    return { ...echo(q), ...table, cohorts: named(table.cohorts), sites: named(table.sites) };
  }

  async function treesIn(tx: EntityManager, org: ReportOrganisation, q: ReportQuery, asOf: string): Promise<TreesReport> {
    const r = rangeOf(q);
    const nursery = await loadNursery(tx, r, org.timeZone);
    return { ...echo(q), asOf, rows: treesTable({ ...nursery, plantings: await loadPlantings(tx, r, asOf) }, r) };
  }

  /** Everything for the printed report, from one snapshot. */
  function pdfData(q: ReportQuery): Promise<ReportPdfData> {
    return read(q, async (tx, org, asOf) => {
      const at = asOf(q.to);
      const plantings = await loadPlantings(tx, rangeOf(q), at);
      const siteName = q.siteId ? ((await tx.getRepository(Site).findOneBy({ id: q.siteId }))?.name ?? null) : null;
      return {
        organisation: org, siteName,
        summary: await summaryIn(tx, org, q, at),
        plantingDays: plantingDays(plantings),
        survival: await survivalIn(tx, q, at),
        trees: await treesIn(tx, org, q, at),
      };
    });
  }

  return {
    summary: (q: ReportQuery) => read(q, (tx, org, asOf) => summaryIn(tx, org, q, asOf(q.to))),

    hours: (q: HoursReportQuery): Promise<HoursReport> =>
      read(q, async (tx, org) => {
        const rows = hoursTable(await loadAttendance(tx, rangeOf(q)), rangeOf(q), q.period, org.hourValueCents);
        const minutes = rows.reduce((sum, row) => sum + row.minutes, 0);
        const totals = { volunteers: new Set(rows.map((row) => row.userId)).size, minutes, hours: hoursFromMinutes(minutes), valueCents: volunteerValueCents(minutes, org.hourValueCents) };
        return { ...echo(q), period: q.period, currency: org.currency, rows, totals };
      }),

    trees: (q: ReportQuery) => read(q, (tx, org, asOf) => treesIn(tx, org, q, asOf(q.to))),

    survival: (q: ReportQuery) => read(q, (tx, _org, asOf) => survivalIn(tx, q, asOf(q.to))),

    donations: (q: ReportQuery): Promise<DonationsReport> =>
      read(q, async (tx, org) => ({
        ...echo(q), currency: org.currency,
        rows: donationsTable(await loadDonations(tx, rangeOf(q), org.timeZone), rangeOf(q)),
        notes: ['Paid gifts, less any refunded, by the date they were paid; amounts are what donors paid, including any card fee they chose to cover.', DONATIONS_NOTE],
      })),

    /** The printed report (PDF bytes). */
    async pdf(q: ReportQuery): Promise<Buffer> {
      const data = await pdfData(q);
      return renderReportPdf(data, localDate(deps.clock().getTime(), data.organisation.timeZone));
    },
  };
}
export type ReportService = ReturnType<typeof createReportService>;
