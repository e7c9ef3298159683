import { Router, type Request } from 'express';
import { SignupBody } from '../../shared/schemas/crew.schema.js';
import { RecentSignupsQuery } from '../../shared/schemas/recent-signups.schema.js';
import { CheckInBody, HoursBody, SignupIdParams } from '../../shared/schemas/roster.schema.js';
import { WorkdayIdParams } from '../../shared/schemas/workday.schema.js';
import { currentUser, requireAuth, requireRole } from '../middleware/auth.js';
import type { AttendanceService } from '../services/attendance.service.js';
import type { RosterService } from '../services/roster.service.js';
import type { SignupService } from '../services/signup.service.js';
import type { WorkdayService } from '../services/workday.service.js';
import { rosterCsv } from './roster-csv.js';

const workdayId = (req: Request) => WorkdayIdParams.parse(req.params).id;
const signupId = (req: Request) => SignupIdParams.parse(req.params).id;

/** Sign-ups, roster and check-in, mounted at `/api`. */
export function crewRouter(deps: { signups: SignupService; roster: RosterService; attendance: AttendanceService; workdays: WorkdayService }): Router {
  const r = Router();
  const staff = requireRole('coordinator', 'admin');

  r.post('/workdays/:id/signups', requireAuth, async (req, res) => {
    const { result, created } = await deps.signups.signUp(currentUser(req).id, workdayId(req), SignupBody.parse(req.body));
    res.status(created ? 201 : 200).json(result);
  });
  r.get('/workdays/:id/signups/mine', requireAuth, async (req, res) => {
    res.json(await deps.signups.mine(currentUser(req).id, workdayId(req)));
  });
  r.delete('/workdays/:id/signups/mine', requireAuth, async (req, res) => {
    await deps.signups.cancelMine(currentUser(req).id, workdayId(req));
    res.status(204).end();
  });
  r.get('/workdays/:id/crew', requireAuth, async (req, res) => {
    const id = workdayId(req);
    await deps.workdays.find(id, false);
    res.json({ crew: await deps.roster.crew(id) });
  });
  r.get('/workdays/:id/roster', staff, async (req, res) => {
    const id = workdayId(req);
    const workday = await deps.workdays.find(id, true);
    const rows = await deps.roster.roster(id);
    if (req.query.format === 'csv') {
      res.attachment(`roster-${workday.startsAt.toISOString().slice(0, 10)}.csv`).type('text/csv').send(rosterCsv(rows));
      return;
    }
    res.json({ roster: rows });
  });
  r.get('/signups/recent', staff, async (req, res) => {
    res.json({ signups: await deps.roster.recent(RecentSignupsQuery.parse(req.query).limit) });
  });
  r.post('/signups/:id/check-in', staff, async (req, res) => {
    await deps.attendance.checkIn(currentUser(req).id, signupId(req), CheckInBody.parse(req.body ?? {}).at);
    res.status(204).end();
  });
  r.post('/signups/:id/check-out', staff, async (req, res) => {
    await deps.attendance.checkOut(currentUser(req).id, signupId(req), CheckInBody.parse(req.body ?? {}).at);
    res.status(204).end();
  });
  r.post('/signups/:id/no-show', staff, async (req, res) => {
    await deps.attendance.noShow(currentUser(req).id, signupId(req));
    res.status(204).end();
  });
  r.put('/signups/:id/hours', staff, async (req, res) => {
    const body = HoursBody.parse(req.body);
    await deps.attendance.setMinutes(currentUser(req).id, signupId(req), body.minutes, body.reason);
    res.status(204).end();
  });
  return r;
}
