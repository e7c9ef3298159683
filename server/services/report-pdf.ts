/** The printed outcomes report for a funder or the permitting agency (PDF, drawn with pdfkit). */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import PDFDocument from 'pdfkit';
import { milestoneLabel, formatElevation, formatMoney, formatRate, stationLabel } from '../domain/outcomes/report-format.js';
import type { PlantingDayRow } from '../domain/outcomes/planting-summary.js';
import { barChart, chartRoom, figures, FONT, footers, heading, MUTED, PALETTE, paragraph, table } from './report-pdf-draw.js';
import type { ReportPdfData } from './report.service.js';

const require = createRequire(import.meta.url);
const fontFile = (weight: number) => readFileSync(require.resolve(`@fontsource/nunito/files/nunito-latin-${weight}-normal.woff`));
/** Nunito as the app ships it, read once per process. */
let fonts: { regular: Buffer; bold: Buffer } | undefined;
const loadFonts = () => (fonts ??= { regular: fontFile(400), bold: fontFile(800) });
type Doc = InstanceType<typeof PDFDocument>;

function elevationText(row: PlantingDayRow, d: ReportPdfData): string {
  const u = d.organisation.units;
  if (row.meanM === null || row.minM === null || row.maxM === null) return 'not recorded';
  if (row.minM === row.maxM) return formatElevation(row.meanM, u);
  return `${formatElevation(row.meanM, u)} mean, ${formatElevation(row.minM, u).split(' ')[0]}–${formatElevation(row.maxM, u)}`;
}

function summarySection(doc: Doc, d: ReportPdfData): void {
  const s = d.summary;
  const money = (c: number) => formatMoney(c, s.currency);
  heading(doc, 'Summary');
  figures(doc, [
    ['Volunteers', String(s.volunteers)],
    ['Volunteer hours', s.volunteerHours.toFixed(2)],
    ['Value of volunteer time', money(s.volunteerValueCents)],
    ['Trees planted', String(s.treesPlanted)],
    ['Trees alive', `${s.treesAlive} (${s.treesNotChecked} not yet checked)`],
    ['Survival (alive ÷ planted)', formatRate(s.survivalRate)],
    ['Donations', `${money(s.donationsCents)} from ${s.donationsCount} gift${s.donationsCount === 1 ? '' : 's'}`],
  ]);
}

function plantingSection(doc: Doc, d: ReportPdfData): void {
  heading(doc, 'Planting by site');
  paragraph(doc, `Bed elevations are in ${d.organisation.units === 'ft' ? 'feet' : 'metres'} above mean lower low water (MLLW) at each site's tide station.`, { size: 9, color: MUTED });
  if (d.plantingDays.length === 0) return paragraph(doc, 'No trees were planted in this range.');
  table(doc, [
    { header: 'Site', share: 0.21 }, { header: 'Planted on', share: 0.14 }, { header: 'Trees', share: 0.08, align: 'right' },
    { header: 'Bed elevation', share: 0.28 }, { header: 'Datum', share: 0.29 },
  ], d.plantingDays.map((r) => [r.siteName, r.plantedOn, String(r.trees), elevationText(r, d), `MLLW, ${stationLabel(r.stationId)}`]));
}

function survivalSection(doc: Doc, d: ReportPdfData): void {
  const sv = d.survival;
  heading(doc, 'Survival');
  if (sv.sites.length === 0) return paragraph(doc, 'No trees planted in this range to follow yet.');
  const shown = sv.milestones.slice(0, 6);
  const cell = (c: { survivalRate: number | null; alive: number; checked: number; reached: number } | undefined) =>
    !c || c.reached === 0 ? 'not yet' : c.checked === 0 ? 'no check' : `${formatRate(c.survivalRate)} (${c.alive}/${c.checked})`;
  const columns = [{ header: 'Site and cohort', share: 0.22 }, { header: 'Planted', share: 0.1, align: 'right' as const }, ...shown.map((m) => ({ header: milestoneLabel(m), share: 0.68 / shown.length }))];
  const rows = sv.sites.flatMap((site) => [
    [`${site.siteName}, all`, String(site.planted), ...shown.map((_, i) => cell(site.cells[i]))],
    ...sv.cohorts.filter((c) => c.siteId === site.siteId).map((c) => [`  planted ${c.cohort}`, String(c.planted), ...shown.map((_, i) => cell(c.cells[i]))]),
  ]);
  paragraph(doc, `Alive ÷ checked at each time after planting (alive/checked), with checks up to ${sv.asOf}.`, { size: 9, color: MUTED });
  table(doc, columns, rows);
}

function chartSection(doc: Doc, d: ReportPdfData): void {
  const months = new Map<string, [number, number]>();
  for (const r of d.trees.rows) {
    if (r.siteId === null) continue;
    const [planted, alive] = months.get(r.month) ?? [0, 0];
    months.set(r.month, [planted + r.planted, alive + r.alive]);
  }
  heading(doc, 'Trees planted and alive, by planting month', months.size === 0 ? 40 : chartRoom(170));
  if (months.size === 0) return paragraph(doc, 'No trees were planted in this range.');
  const groups = [...months.entries()].sort(([a], [b]) => (a < b ? -1 : 1)).slice(-24).map(([label, values]) => ({ label, values }));
  barChart(doc, groups, [{ name: 'Planted', color: PALETTE.green }, { name: 'Alive at latest check', color: PALETTE.teal }]);
}

function methodsSection(doc: Doc, d: ReportPdfData): void {
  const s = d.summary;
  heading(doc, 'Methods');
  for (const text of [
    'Every figure is computed from Ebbroot\'s records when the report is made; no total is stored, so each can be traced to the check-ins, planting records, monitoring checks and gifts behind it.',
    `Volunteer hours: minutes between check-in and check-out at the launch (or a coordinator's correction, kept with its reason in the audit log) on published or completed workdays dated ${s.from} to ${s.to}; no-shows count zero. Volunteers: the distinct people with hours.`,
    `Value of volunteer time: hours × ${formatMoney(s.volunteerHourValueCents, s.currency)} an hour, the value set by the organisation (source: ${s.volunteerHourValueSource}), rounded to the cent once, at the end. On audited financial statements only specialised-skill services may be recorded as in-kind gifts.`,
    'Trees planted: trees whose recorded planting date falls in the range, with the site, date and bed elevation recorded for each planting workday. Elevations are relative to MLLW at the site\'s tide station.',
    `Survival: trees are grouped in cohorts by site and planting month and checked 1, 3, 6 and 12 months after planting, then yearly (common practice). At each milestone a tree counts by its first check from 14 days before the milestone date until the next milestone's window opens; a tree found lost stays lost. Survival rate = alive ÷ checked. Missing trees count as not alive (a conservative common practice). Checks up to ${s.asOf} are used.`,
    `Trees alive in the summary: trees planted in the range that were neither lost nor missing at their latest check; ${s.treesNotChecked} not yet checked count as alive. Summary survival = alive ÷ planted.`,
    'Donations: paid gifts, less any refunded, by the date they were paid, in the amounts donors paid. Gifts belong to no site, so a site filter does not apply to them.',
  ]) paragraph(doc, text, { size: 9 });
}

/** The report as PDF bytes. `generatedOn` is the local date it was made. */
export function renderReportPdf(d: ReportPdfData, generatedOn: string): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'LETTER', margin: 54, bufferPages: true, info: { Title: `Outcomes report ${d.summary.from} to ${d.summary.to}`, Author: d.organisation.name } });
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  doc.registerFont(FONT.regular, loadFonts().regular);
  doc.registerFont(FONT.bold, loadFonts().bold);
  doc.font(FONT.bold).fontSize(20).fillColor(PALETTE.green).text('Outcomes report');
  doc.font(FONT.bold).fontSize(12).fillColor('#1d2b25').text(d.organisation.name);
  paragraph(doc, `${d.summary.from} to ${d.summary.to} · ${d.siteName ? `Site: ${d.siteName}` : 'All sites'} · made ${generatedOn}`, { color: MUTED });
  if (d.organisation.isDemo) paragraph(doc, 'Demo data: an invented organisation, people and figures.', { color: PALETTE.mud });
  summarySection(doc, d);
  plantingSection(doc, d);
  survivalSection(doc, d);
  chartSection(doc, d);
  methodsSection(doc, d);
  footers(doc, `${d.organisation.name} · Outcomes report ${d.summary.from} to ${d.summary.to}`);
  doc.end();
  return done;
}
