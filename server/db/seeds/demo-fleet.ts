/**
 * The demo fleet and a boat day to plan with it: invented craft (sit-on-top and tandem kayaks,
 * two canoes, one skiff with a capacity plate), a published planting workday at Heron Reach on a
 * real low-water window with a crew that can go out (an operator, paddlers, a kayak owner,
 * planters, a parent with their child) and trees reserved for it, enough for several runs.
 * Idempotent on its own: craft are inserted by name, the workday only when no workday has its
 * title, trees only while none are reserved for it.
 */
import { In, IsNull, type DataSource, type EntityManager } from 'typeorm';
import type { CrewRole } from '../../../shared/schemas/crew.schema.js';
import type { TideStationDirectory } from '../../adapters/tide-stations.js';
import { siteWindows } from '../../domain/tide/site-windows.js';
import { Craft } from '../entities/craft.entity.js';
import { Signup } from '../entities/signup.entity.js';
import { Site } from '../entities/site.entity.js';
import { TreeEvent } from '../entities/tree-event.entity.js';
import { Tree } from '../entities/tree.entity.js';
import { User } from '../entities/user.entity.js';
import { Workday } from '../entities/workday.entity.js';
import { DEMO_DOMAIN } from './demo-people.js';

const DAY = 86_400_000;
export const DEMO_BOAT_DAY_TITLE = 'Boat day at Heron Reach';

/** Ratings are typical makers' figures (TRADE.md §1, low authority), converted from pounds (1 lb = 0.45359237 kg). */
const demoCraft: Partial<Craft>[] = [
  { name: 'Spoonbill', kind: 'sit-on-top-kayak', seats: 1, maxLoadKg: 158.76, potSlots: 1, draftM: 0.1, speedKmh: 4, notes: 'Demo craft. Yellow hull, rated 350 lb by the maker.' },
  { name: 'Ibis', kind: 'sit-on-top-kayak', seats: 1, maxLoadKg: 158.76, potSlots: 1, draftM: 0.1, speedKmh: 4, notes: 'Demo craft. Rated 350 lb by the maker.' },
  { name: 'Pelican', kind: 'tandem-kayak', seats: 2, maxLoadKg: 249.48, potSlots: 2, draftM: 0.12, speedKmh: 4.5, notes: 'Demo craft. Rated 550 lb by the maker.' },
  { name: 'Egret', kind: 'tandem-kayak', seats: 2, maxLoadKg: 249.48, potSlots: 2, draftM: 0.12, speedKmh: 4.5, notes: 'Demo craft. Rated 550 lb by the maker.' },
  { name: 'Tarpon', kind: 'canoe', seats: 3, maxLoadKg: 430.91, potSlots: 6, draftM: 0.13, speedKmh: 4, notes: 'Demo craft. 16 ft canoe rated 950 lb by the maker.' },
  { name: 'Snook', kind: 'canoe', seats: 3, maxLoadKg: 430.91, potSlots: 6, draftM: 0.13, speedKmh: 4, notes: 'Demo craft. 16 ft canoe rated 950 lb by the maker.' },
  {
    name: 'Skimmer', kind: 'skiff', seats: 5, maxLoadKg: 408.23, hasCapacityPlate: true, potSlots: 8, draftM: 0.3, speedKmh: 12, needsOperator: true,
    notes: 'Demo craft. 16 ft jon boat with a 15 hp outboard; capacity plate 900 lb.',
  },
];

/** Who signs up for the boat day, by demo name; `minorOf` names the adult a minor rides with. */
const crew: { name: string; role: CrewRole; minorOf?: string }[] = [
  { name: 'Silas Morrow', role: 'operator' },
  { name: 'Zara Idris', role: 'seat' },
  { name: 'Caleb Fenwick', role: 'seat' },
  { name: 'Felix Aranda', role: 'seat' },
  { name: 'Nico Castellan', role: 'seat' },
  { name: 'Ivy Tremaine', role: 'own-kayak' },
  { name: 'Rosalind Mbeki', role: 'planter' },
  { name: 'June Calloway', role: 'planter', minorOf: 'Rosalind Mbeki' },
  { name: 'Odette Fairweather', role: 'planter' },
  { name: 'Mateo Solano', role: 'planter' },
  { name: 'Ansel Hart', role: 'shore' },
];

/** The best-scoring window 2–16 days out that overlaps no other workday at the site. */
async function freeWindow(db: DataSource, stations: TideStationDirectory, site: Site, now: number) {
  const station = await stations.get(site.stationId);
  if (!station) return undefined;
  const taken = await db.getRepository(Workday).findBy({ siteId: site.id });
  const free = (w: { startMs: number; endMs: number }) => taken.every((t) => t.endsAt.getTime() <= w.startMs || t.startsAt.getTime() >= w.endMs);
  return siteWindows(station, site, { fromMs: now + 2 * DAY, toMs: now + 16 * DAY }).filter(free).sort((a, b) => b.score - a.score)[0];
}

async function addCrew(tx: EntityManager, workday: Workday, now: Date): Promise<void> {
  const users = await tx.getRepository(User).findBy({ name: In(crew.map((c) => c.name)) });
  const byName = new Map(users.filter((u) => u.email.endsWith(`@${DEMO_DOMAIN}`)).map((u) => [u.name, u]));
  const rows = crew.flatMap((c, i) => {
    const u = byName.get(c.name);
    if (!u) return [];
    const guardian = c.minorOf ? byName.get(c.minorOf) : undefined;
    return [tx.getRepository(Signup).create({
      workdayId: workday.id, userId: u.id, role: c.role, status: 'confirmed', queuedAt: new Date(now.getTime() - (crew.length - i) * 3_600_000),
      waiverVersion: 1, waiverSignedName: u.name, waiverSignedAt: now, isMinor: Boolean(guardian), guardianUserId: guardian?.id ?? null,
      ownCraft: c.role === 'own-kayak' ? { kind: 'sit-on-top-kayak', seats: 1, maxLoadKg: 147 } : null,
      operatorQualification: c.role === 'operator' ? 'State boater education card; runs the Trust’s skiff (demo)' : '',
    })];
  });
  await tx.getRepository(Signup).save(rows);
}

/** Up to 24 trees nobody has reserved (ready ones first, then brining), set aside for the boat day. */
async function reserveTrees(tx: EntityManager, workday: Workday, now: Date): Promise<number> {
  if ((await tx.getRepository(Tree).countBy({ reservedWorkdayId: workday.id })) > 0) return 0;
  const free = await tx.getRepository(Tree).find({ where: { stage: In(['ready', 'brining']), reservedWorkdayId: IsNull() }, order: { tag: 'ASC' } });
  const trees = [...free.filter((t) => t.stage === 'ready'), ...free.filter((t) => t.stage === 'brining')].slice(0, 24);
  if (trees.length === 0) return 0;
  await tx.getRepository(Tree).update(trees.map((t) => t.id), { reservedWorkdayId: workday.id });
  await tx.getRepository(TreeEvent).insert(trees.map((t) => ({ treeId: t.id, kind: 'reserve' as const, at: now, note: `Reserved for "${workday.title}" (demo)` })));
  return trees.length;
}

export async function seedDemoFleet(deps: { db: DataSource; stations?: TideStationDirectory; now: Date }): Promise<{ craft: number; workdays: number }> {
  const fleet = deps.db.getRepository(Craft);
  const present = new Set((await fleet.findBy({ name: In(demoCraft.map((c) => c.name)) })).map((c) => c.name));
  const missing = demoCraft.filter((c) => !present.has(c.name ?? ''));
  if (missing.length > 0) await fleet.createQueryBuilder().insert().values(missing).orIgnore().execute();
  const craft = missing.length;
  const site = await deps.db.getRepository(Site).findOneBy({ name: 'Heron Reach' });
  if (!site || !deps.stations) return { craft, workdays: 0 };
  let workday = await deps.db.getRepository(Workday).findOneBy({ title: DEMO_BOAT_DAY_TITLE });
  let workdays = 0;
  if (!workday) {
    const w = await freeWindow(deps.db, deps.stations, site, deps.now.getTime());
    if (!w) return { craft, workdays: 0 };
    workday = await deps.db.transaction(async (tx) => {
      const created = await tx.getRepository(Workday).save(tx.getRepository(Workday).create({
        title: DEMO_BOAT_DAY_TITLE, kind: 'planting', siteId: site.id, startsAt: new Date(w.startMs), endsAt: new Date(w.endMs), status: 'published', capacity: 14,
        description: 'Demo workday. The Trust’s kayaks, canoes and skiff ferry the reserved trees out; planters set them along the marked line.',
        meetingPoint: site.launchName, whatToBring: 'Water (2 L), hat, sun shirt, closed shoes that can get muddy, gloves, a snack.', publishedAt: deps.now,
      }));
      await addCrew(tx, created, deps.now);
      return created;
    });
    workdays = 1;
  }
  await deps.db.transaction((tx) => reserveTrees(tx, workday, deps.now));
  return { craft, workdays };
}
