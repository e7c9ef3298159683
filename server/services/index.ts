/** Wires every service from the app's dependencies (plain factories, no container). */
import type { DataSource } from 'typeorm';
import type { Mailer } from '../adapters/email.js';
import { createPhotoStore } from '../adapters/photo-store.js';
import { createTideStationDirectory, type TideStationDirectory } from '../adapters/tide-stations.js';
import type { Config } from '../config.js';
import { createAttendanceService } from './attendance.service.js';
import { createAuthTokenService } from './auth-token.service.js';
import { createAuthService } from './auth.service.js';
import { createCalendarService } from './calendar.service.js';
import { createGivingServices } from './donation-services.js';
import { createFleetService } from './fleet.service.js';
import type { CrewNotifier } from './crew-notifier.js';
import { createMeService } from './me.service.js';
import { createMonitoringDueService } from './monitoring-due.service.js';
import { createMonitoringService } from './monitoring.service.js';
import { createOrganisationService } from './organisation.service.js';
import { createPasswordHasher } from './password-hasher.js';
import { createPhotoService } from './photo.service.js';
import { createPlantingService } from './planting.service.js';
import { createReadinessService } from './readiness.service.js';
import { createReminderOptOutService } from './reminder-opt-out.service.js';
import { createReportService } from './report.service.js';
import { createRosterService } from './roster.service.js';
import { createSignupService } from './signup.service.js';
import { createSiteTideService } from './site-tide.service.js';
import { createSiteService } from './site.service.js';
import { createStationService } from './station.service.js';
import { createTankBriningService } from './tank-brining.service.js';
import { createTankService } from './tank.service.js';
import { createTreeBatchService } from './tree-batch.service.js';
import { createTreeBulkService } from './tree-bulk.service.js';
import { createTreeLabelService } from './tree-labels.service.js';
import { createTreeReservationService } from './tree-reservation.service.js';
import { createTreeService } from './tree.service.js';
import { createTripSolver } from './trip-plan-solver.js';
import { createTripPlanService } from './trip-plan.service.js';
import { createTripSheetService } from './trip-sheet.service.js';
import { createUserService } from './user.service.js';
import { createWaiverService } from './waiver.service.js';
import { createWorkdayService } from './workday.service.js';

export interface ServiceDeps {
  config: Config;
  db: DataSource;
  mailer: Mailer;
  notifier: CrewNotifier;
  clock: () => Date;
  log: (line: string) => void;
  tideStations?: TideStationDirectory;
}

export function createServices(deps: ServiceDeps) {
  const { config, db, notifier, clock } = deps;
  const users = createUserService({ db });
  const organisation = createOrganisationService({ db });
  const stations = createStationService({ stations: deps.tideStations ?? createTideStationDirectory() });
  const sites = createSiteService({ db, stations });
  const waivers = createWaiverService({ db });
  const tokens = createAuthTokenService({ db, clock });
  const hasher = createPasswordHasher(config.PASSWORD_SCRYPT_LOG_N);
  const photos = createPhotoService({ db, store: createPhotoStore(config.UPLOADS_DIR) });
  const fleet = createFleetService({ db });
  return {
    users,
    organisation,
    stations,
    sites,
    waivers,
    auth: createAuthService({ db, hasher, tokens, mailer: deps.mailer, appUrl: config.APP_URL, clock, log: deps.log }),
    siteTide: createSiteTideService({ sites, stations, organisation }),
    workdays: createWorkdayService({ db, sites, notifier, clock }),
    signups: createSignupService({ db, sites, waivers, notifier, clock }),
    roster: createRosterService({ db, clock }),
    attendance: createAttendanceService({ db, clock }),
    me: createMeService({ db }),
    calendar: createCalendarService({ db, appUrl: config.APP_URL, clock }),
    optOut: createReminderOptOutService({ db, secret: config.SESSION_SECRET }),
    photos,
    batches: createTreeBatchService({ db, clock, photos }),
    trees: createTreeService({ db, clock, photos }),
    treeBulk: createTreeBulkService({ db, clock }),
    treeLabels: createTreeLabelService({ db, appUrl: config.APP_URL }),
    reservations: createTreeReservationService({ db, clock }),
    tanks: createTankService({ db, clock }),
    brining: createTankBriningService({ db, clock }),
    readiness: createReadinessService({ db, clock, sites, stations }),
    plantings: createPlantingService({ db, clock }),
    monitoring: createMonitoringService({ db, clock, photos }),
    monitoringDue: createMonitoringDueService({ db, clock }),
    reports: createReportService({ db, clock }),
    ...createGivingServices(deps),
    fleet,
    tripPlans: createTripPlanService({ db, fleet, solver: createTripSolver() }),
    tripSheets: createTripSheetService({ db }),
  };
}
export type Services = ReturnType<typeof createServices>;
