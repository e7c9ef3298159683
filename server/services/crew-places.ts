/**
 * Crew places under the workday's row lock: every sign-up, cancellation and cap change of a
 * workday takes `SELECT … FOR UPDATE` on its row first, so counts and decisions never race —
 * across processes too, since the lock lives in PostgreSQL.
 */
import type { EntityManager } from 'typeorm';
import type { CrewRole } from '../../shared/schemas/crew.schema.js';
import { Signup } from '../db/entities/signup.entity.js';
import { WorkdayRole } from '../db/entities/workday-role.entity.js';
import { Workday } from '../db/entities/workday.entity.js';
import { promotions, type CrewCaps, type CrewCounts } from '../domain/crew/places.js';
import { NotFoundError } from '../errors.js';
import type { CrewNotifier } from './crew-notifier.js';

export async function lockWorkday(tx: EntityManager, id: string): Promise<Workday> {
  const workday = await tx.getRepository(Workday).findOne({ where: { id }, lock: { mode: 'pessimistic_write' } });
  if (!workday) throw new NotFoundError('Workday');
  return workday;
}

export async function capsOf(tx: EntityManager, workday: Workday): Promise<CrewCaps> {
  const rows = await tx.getRepository(WorkdayRole).findBy({ workdayId: workday.id });
  return { total: workday.capacity, byRole: Object.fromEntries(rows.map((r) => [r.role, r.capacity])) };
}

export async function confirmedCounts(tx: EntityManager, workdayId: string): Promise<CrewCounts> {
  const rows: { role: CrewRole; n: string }[] = await tx
    .getRepository(Signup)
    .createQueryBuilder('s')
    .select('s.role', 'role')
    .addSelect('COUNT(*)', 'n')
    .where('s.workday_id = :workdayId AND s.status = :status', { workdayId, status: 'confirmed' })
    .groupBy('s.role')
    .getRawMany();
  const byRole = Object.fromEntries(rows.map((r) => [r.role, Number(r.n)]));
  return { total: rows.reduce((sum, r) => sum + Number(r.n), 0), byRole };
}

/** Moves people up from the waitlist while there is room; call with the workday locked. */
export async function promoteFromWaitlist(tx: EntityManager, workday: Workday, notifier: CrewNotifier): Promise<string[]> {
  const line = await tx.getRepository(Signup).find({
    where: { workdayId: workday.id, status: 'waitlisted' },
    order: { queuedAt: 'ASC', id: 'ASC' },
  });
  const ids = promotions(await capsOf(tx, workday), await confirmedCounts(tx, workday.id), line);
  for (const id of ids) {
    await tx.getRepository(Signup).update({ id }, { status: 'confirmed' });
    await notifier.signupPromoted(tx, id);
  }
  return ids;
}

/** 1-based place in line among the same workday's waitlisted sign-ups for the same role. */
export async function waitlistPosition(tx: EntityManager, signup: Signup): Promise<number> {
  const ahead = await tx
    .getRepository(Signup)
    .createQueryBuilder('s')
    .where('s.workday_id = :w AND s.role = :r AND s.status = :st', { w: signup.workdayId, r: signup.role, st: 'waitlisted' })
    .andWhere('(s.queued_at < :q OR (s.queued_at = :q AND s.id < :id))', { q: signup.queuedAt, id: signup.id })
    .getCount();
  return ahead + 1;
}
