/**
 * Demo workdays on real low-water windows of the demo sites (predicted from the sites' NOAA
 * stations), with invented crews: upcoming published days with sign-ups and a waitlist, a
 * draft, and a completed day with check-ins and hours. Seeded once: skipped when any demo
 * site already has a workday.
 */
import { In, type DataSource, type EntityManager } from 'typeorm';
import type { CrewRole } from '../../../shared/schemas/crew.schema.js';
import type { TideStationDirectory } from '../../adapters/tide-stations.js';
import { siteWindows } from '../../domain/tide/site-windows.js';
import { Signup } from '../entities/signup.entity.js';
import { Site } from '../entities/site.entity.js';
import { User } from '../entities/user.entity.js';
import { VolunteerProfile } from '../entities/volunteer-profile.entity.js';
import { Workday } from '../entities/workday.entity.js';
import { DEMO_DOMAIN } from './demo-people.js';
import { demoSites } from './demo-sites.js';

const DAY = 86_400_000;
const ROLES: CrewRole[] = ['planter', 'planter', 'shore', 'seat', 'planter', 'own-kayak'];

async function bestWindow(stations: TideStationDirectory, site: Site, fromMs: number, toMs: number) {
  const station = await stations.get(site.stationId);
  if (!station) return undefined;
  return siteWindows(station, site, { fromMs, toMs }).sort((a, b) => b.score - a.score)[0];
}

async function addCrew(tx: EntityManager, workday: Workday, people: User[], now: Date, past: boolean): Promise<void> {
  const rows = people.map((u, i) => {
    const confirmed = i < workday.capacity;
    const checkedIn = past && confirmed && i % 7 !== 6;
    return tx.getRepository(Signup).create({
      workdayId: workday.id, userId: u.id, role: ROLES[i % ROLES.length]!, status: confirmed ? 'confirmed' : 'waitlisted',
      queuedAt: new Date(now.getTime() - (people.length - i) * 3_600_000), waiverVersion: 1, waiverSignedName: u.name, waiverSignedAt: now,
      ownCraft: ROLES[i % ROLES.length] === 'own-kayak' ? { kind: 'sit-on-top-kayak', seats: 1, maxLoadKg: 147 } : null,
      checkedInAt: checkedIn ? new Date(workday.startsAt.getTime() - 15 * 60_000) : null,
      checkedOutAt: checkedIn ? new Date(workday.endsAt.getTime() + (i % 3) * 10 * 60_000) : null,
      noShow: past && confirmed && !checkedIn,
    });
  });
  await tx.getRepository(Signup).save(rows);
}

export async function seedDemoWorkdays(deps: { db: DataSource; stations: TideStationDirectory; now: Date }): Promise<number> {
  const sites = await deps.db.getRepository(Site).findBy({ name: In(demoSites.map((s) => s.name)) });
  if (sites.length === 0 || (await deps.db.getRepository(Workday).countBy({ siteId: In(sites.map((s) => s.id)) })) > 0) return 0;
  const volunteers = (await deps.db.getRepository(User).find({ where: { role: 'volunteer' }, order: { name: 'ASC' } })).filter((u) => u.email.endsWith(`@${DEMO_DOMAIN}`));
  const now = deps.now.getTime();
  const plans = [
    { site: sites[0], from: now + 3 * DAY, to: now + 12 * DAY, capacity: 8, crew: 11, status: 'published' as const },
    { site: sites[1], from: now + 8 * DAY, to: now + 20 * DAY, capacity: 12, crew: 7, status: 'published' as const },
    { site: sites[2], from: now + 15 * DAY, to: now + 30 * DAY, capacity: 14, crew: 0, status: 'draft' as const },
    { site: sites[0], from: now - 40 * DAY, to: now - 25 * DAY, capacity: 12, crew: 12, status: 'completed' as const },
  ];
  let created = 0;
  await deps.db.transaction(async (tx) => {
    for (const [i, p] of plans.entries()) {
      if (!p.site) continue;
      const w = await bestWindow(deps.stations, p.site, p.from, p.to);
      if (!w) continue;
      const workday = await tx.getRepository(Workday).save(tx.getRepository(Workday).create({
        title: p.status === 'completed' ? `Planting at ${p.site.name} (spring cohort)` : `Planting at ${p.site.name}`,
        kind: 'planting', siteId: p.site.id, startsAt: new Date(w.startMs), endsAt: new Date(w.endMs), status: p.status, capacity: p.capacity,
        description: 'Demo workday. We ferry potted red mangroves from the launch and set them along the marked line on the flat.',
        whatToBring: 'Water (2 L), hat, sun shirt, closed shoes that can get muddy, gloves, a snack.',
        publishedAt: p.status === 'draft' ? null : deps.now,
      }));
      await addCrew(tx, workday, volunteers.slice(i * 5, i * 5 + p.crew), deps.now, p.status === 'completed');
      created += 1;
    }
    // Profiles (skills, emergency contact, birth date) for the first twelve, as the roster shows them.
    await tx.getRepository(VolunteerProfile).save(volunteers.slice(0, 12).map((u, i) => ({
      userId: u.id, skills: i % 3 === 0 ? ['paddler' as const] : ['planting' as const],
      emergencyContact: { name: `Contact for ${u.name.split(' ')[0]}`, phone: `727-555-01${String(10 + i)}` },
      dateOfBirth: `${1970 + i * 3}-0${(i % 9) + 1}-15`,
    })));
  });
  return created;
}
