import { Router, type Response } from 'express';
import { HoursReportQuery, ReportQuery } from '../../shared/schemas/report.schema.js';
import { donationsCsv, hoursCsv, summaryCsv, survivalCsv, treesCsv } from '../domain/outcomes/report-csv.js';
import { requireRole } from '../middleware/auth.js';
import type { ReportService } from '../services/report.service.js';

const sendCsv = (res: Response, name: string, q: { from: string; to: string }, text: string) => {
  res.attachment(`${name}-${q.from}-to-${q.to}.csv`).type('text/csv').send(text);
};

/** `/api/reports`: figures computed from the records; coordinators and admins only. */
export function reportRouter(deps: { reports: ReportService }): Router {
  const r = Router();
  r.use(requireRole('coordinator', 'admin'));

  r.get('/summary', async (req, res) => {
    res.json(await deps.reports.summary(ReportQuery.parse(req.query)));
  });
  r.get('/hours', async (req, res) => {
    res.json(await deps.reports.hours(HoursReportQuery.parse(req.query)));
  });
  r.get('/trees', async (req, res) => {
    res.json(await deps.reports.trees(ReportQuery.parse(req.query)));
  });
  r.get('/survival', async (req, res) => {
    res.json(await deps.reports.survival(ReportQuery.parse(req.query)));
  });
  r.get('/donations', async (req, res) => {
    res.json(await deps.reports.donations(ReportQuery.parse(req.query)));
  });
  r.get('/summary.csv', async (req, res) => {
    const q = ReportQuery.parse(req.query);
    sendCsv(res, 'summary', q, summaryCsv(await deps.reports.summary(q)));
  });
  r.get('/hours.csv', async (req, res) => {
    const q = HoursReportQuery.parse(req.query);
    sendCsv(res, 'volunteer-hours', q, hoursCsv(await deps.reports.hours(q)));
  });
  r.get('/trees.csv', async (req, res) => {
    const q = ReportQuery.parse(req.query);
    sendCsv(res, 'trees', q, treesCsv(await deps.reports.trees(q)));
  });
  r.get('/survival.csv', async (req, res) => {
    const q = ReportQuery.parse(req.query);
    sendCsv(res, 'survival', q, survivalCsv(await deps.reports.survival(q)));
  });
  r.get('/donations.csv', async (req, res) => {
    const q = ReportQuery.parse(req.query);
    sendCsv(res, 'donations', q, donationsCsv(await deps.reports.donations(q)));
  });
  r.get('/report.pdf', async (req, res) => {
    const q = ReportQuery.parse(req.query);
    const pdf = await deps.reports.pdf(q);
    res.attachment(`outcomes-report-${q.from}-to-${q.to}.pdf`).type('application/pdf').send(pdf);
  });
  return r;
}
