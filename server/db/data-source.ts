import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { AuthToken } from './entities/auth-token.entity.js';
import { Organisation } from './entities/organisation.entity.js';
import { Site } from './entities/site.entity.js';
import { Workday } from './entities/workday.entity.js';
import { WorkdayRole } from './entities/workday-role.entity.js';
import { Signup } from './entities/signup.entity.js';
import { VolunteerProfile } from './entities/volunteer-profile.entity.js';
import { WaiverVersion } from './entities/waiver-version.entity.js';
import { AuditLog } from './entities/audit-log.entity.js';
import { OutboxMessage } from './entities/outbox-message.entity.js';
import { Photo } from './entities/photo.entity.js';
import { CollectionBatch } from './entities/collection-batch.entity.js';
import { Tank } from './entities/tank.entity.js';
import { SalinityReading } from './entities/salinity-reading.entity.js';
import { Tree } from './entities/tree.entity.js';
import { TreeEvent } from './entities/tree-event.entity.js';
import { Craft } from './entities/craft.entity.js';
import { Campaign } from './entities/campaign.entity.js';
import { Donation } from './entities/donation.entity.js';
import { WebhookEvent } from './entities/webhook-event.entity.js';
import { MonitoringVisit } from './entities/monitoring-visit.entity.js';
import { TreeCheck } from './entities/tree-check.entity.js';
import { TripPlan } from './entities/trip-plan.entity.js';
import { User } from './entities/user.entity.js';
import { migrations } from './migrations/index.js';

export const entities = [User, AuthToken, Organisation, Site, Workday, WorkdayRole, Signup, VolunteerProfile, WaiverVersion, AuditLog, OutboxMessage,
  Photo, CollectionBatch, Tank, SalinityReading, Tree, TreeEvent, Craft, TripPlan,
  Campaign, Donation, WebhookEvent, MonitoringVisit, TreeCheck];

/** One DataSource per process; migrations run explicitly at start, never synchronize. */
export function createDataSource(url: string): DataSource {
  return new DataSource({
    type: 'postgres',
    url,
    entities,
    migrations,
    synchronize: false,
    migrationsRun: false,
    uuidExtension: 'pgcrypto',
    logging: ['error'],
    extra: { max: 10 },
  });
}
