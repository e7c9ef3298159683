/** Loads who and what a stored trip plan names: people with their contacts, craft with their descriptions. */
import { In, Not, type DataSource } from 'typeorm';
import { Craft } from '../db/entities/craft.entity.js';
import { Signup } from '../db/entities/signup.entity.js';
import { User } from '../db/entities/user.entity.js';
import { VolunteerProfile } from '../db/entities/volunteer-profile.entity.js';
import type { TripInstanceJson } from '../domain/trips/index.js';
import type { SheetCraft, SheetPerson } from '../domain/trips/trip-sheet-types.js';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
// Own kayaks have ids like `own-<user id>`; only uuids can be looked up in uuid columns.
const uuids = (ids: Iterable<string>) => [...new Set(ids)].filter((id) => UUID.test(id));

export async function loadPeople(db: DataSource, workdayId: string, instance: TripInstanceJson): Promise<SheetPerson[]> {
  const signups = await db.getRepository(Signup).findBy({ workdayId, status: Not('cancelled') });
  const signupOf = new Map(signups.map((s) => [s.userId, s]));
  const ids = uuids([
    ...instance.people.map((p) => p.id),
    ...instance.craft.flatMap((c) => (c.ownerId ? [c.ownerId] : [])),
    ...signups.flatMap((s) => (s.guardianUserId ? [s.guardianUserId] : [])),
  ]);
  if (ids.length === 0) return [];
  const users = await db.getRepository(User).findBy({ id: In(ids) });
  const profiles = new Map((await db.getRepository(VolunteerProfile).findBy({ userId: In(ids) })).map((p) => [p.userId, p]));
  const nameOf = new Map(users.map((u) => [u.id, u.name]));
  return users.map((u) => {
    const s = signupOf.get(u.id);
    const guardianId = s?.guardianUserId;
    const guardian = guardianId
      ? { name: nameOf.get(guardianId) ?? 'guardian on the crew', phone: profiles.get(guardianId)?.phone ?? null }
      : s?.guardian ? { name: `${s.guardian.name} (${s.guardian.relationship})`, phone: s.guardian.phone } : null;
    const profile = profiles.get(u.id);
    return { id: u.id, name: u.name, phone: profile?.phone ?? null, emergencyContact: profile?.emergencyContact ?? null, minor: s?.isMinor ?? false, guardian };
  });
}

/** Every craft of the instance: fleet craft from the fleet table (retired ones too), own kayaks from the plan. */
export async function loadCraft(db: DataSource, instance: TripInstanceJson, people: SheetPerson[]): Promise<SheetCraft[]> {
  const ids = uuids(instance.craft.filter((c) => !c.ownerId).map((c) => c.id));
  const rows = new Map((ids.length ? await db.getRepository(Craft).findBy({ id: In(ids) }) : []).map((c) => [c.id, c]));
  const nameOf = new Map(people.map((p) => [p.id, p.name]));
  return instance.craft.flatMap((c): SheetCraft[] => {
    const row = rows.get(c.id);
    if (row) {
      const { id, name, kind, seats, maxLoadKg, hasCapacityPlate, potSlots, needsOperator, draftM, notes } = row;
      return [{ id, name, kind, seats, maxLoadKg, hasCapacityPlate, potSlots, needsOperator, draftM, notes, colour: null, ownerName: null }];
    }
    if (!c.ownerId) return [];
    const { id, kind, seats, maxLoadKg, potSlots, needsOperator } = c;
    // A volunteer's kayak carries the maker's figure they gave at sign-up.
    return [{ id, name: null, kind, seats, maxLoadKg, hasCapacityPlate: false, potSlots, needsOperator, draftM: c.draftM ?? null, notes: '', colour: null, ownerName: nameOf.get(c.ownerId) ?? null }];
  });
}
