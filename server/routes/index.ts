/** Mounts every API router; order matters where paths overlap (noted inline). */
import type { Express } from 'express';
import type { DataSource } from 'typeorm';
import type { PassportInstance } from '../adapters/google-auth.js';
import type { Config } from '../config.js';
import { apiNotFound } from '../middleware/error-handler.js';
import type { Services } from '../services/index.js';
import { authRouter } from './auth.router.js';
import { campaignRouter } from './campaign.router.js';
import { calendarRouter } from './calendar.router.js';
import { crewRouter } from './crew.router.js';
import { donationRouter } from './donation.router.js';
import { fleetRouter } from './fleet.router.js';
import { healthRouter } from './health.router.js';
import { meRouter } from './me.router.js';
import { monitoringRouter } from './monitoring.router.js';
import { nurseryRouter } from './nursery.router.js';
import { organisationRouter } from './organisation.router.js';
import { photoRouter } from './photo.router.js';
import { plantingRouter } from './planting.router.js';
import { reportRouter } from './report.router.js';
import { siteRouter } from './site.router.js';
import { tankRouter } from './tank.router.js';
import { tideRouter } from './tide.router.js';
import { treeRouter } from './tree.router.js';
import { tripPlanRouter } from './trip-plan.router.js';
import { tripSheetRouter } from './trip-sheet.router.js';
import { userRouter, volunteerRouter } from './user.router.js';
import { waiverRouter } from './waiver.router.js';
import { workdayRouter } from './workday.router.js';

export function mountApi(app: Express, s: Services, deps: { db: DataSource; passport: PassportInstance; config: Config }): void {
  app.use('/api/health', healthRouter({ db: deps.db }));
  app.use('/api/auth', authRouter({ auth: s.auth, passport: deps.passport }));
  app.use('/api/organisation', organisationRouter({ organisation: s.organisation }));
  app.use('/api', tideRouter({ stations: s.stations, siteTide: s.siteTide, organisation: s.organisation, workdays: s.workdays }));
  app.use('/api/sites', siteRouter({ sites: s.sites }));
  // Before the workday router, whose '/:id' would otherwise catch '<id>.ics'.
  app.use('/api', calendarRouter({ calendar: s.calendar, optOut: s.optOut, appUrl: deps.config.APP_URL }));
  app.use('/api', crewRouter({ signups: s.signups, roster: s.roster, attendance: s.attendance, workdays: s.workdays }));
  app.use('/api/workdays', workdayRouter({ workdays: s.workdays }));
  app.use('/api/waiver', waiverRouter({ waivers: s.waivers }));
  app.use('/api/me', meRouter({ me: s.me }));
  app.use('/api/users', userRouter({ users: s.users }));
  app.use('/api/volunteers', volunteerRouter({ users: s.users }));
  app.use('/api', treeRouter({ batches: s.batches, trees: s.trees, bulk: s.treeBulk, labels: s.treeLabels }));
  app.use('/api', tankRouter({ tanks: s.tanks, brining: s.brining, bulk: s.treeBulk }));
  app.use('/api', nurseryRouter({ readiness: s.readiness, reservations: s.reservations }));
  // '/workdays/:id/plantings' has two segments, so the workday router's '/:id' never catches it.
  app.use('/api', plantingRouter({ plantings: s.plantings }));
  app.use('/api', monitoringRouter({ monitoring: s.monitoring, monitoringDue: s.monitoringDue }));
  app.use('/api/reports', reportRouter({ reports: s.reports }));
  app.use('/api/photos', photoRouter({ photos: s.photos }));
  app.use('/api/fleet', fleetRouter({ fleet: s.fleet }));
  app.use('/api', tripPlanRouter({ tripPlans: s.tripPlans }));
  app.use('/api', tripSheetRouter({ tripSheets: s.tripSheets }));
  app.use('/api/campaigns', campaignRouter({ campaigns: s.campaigns }));
  app.use('/api/donations', donationRouter({ checkout: s.donationCheckout, admin: s.donationAdmin }));
  app.use('/api', apiNotFound);
}
