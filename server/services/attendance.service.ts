import type { DataSource } from 'typeorm';
import { AuditLog } from '../db/entities/audit-log.entity.js';
import { Signup } from '../db/entities/signup.entity.js';
import { minutesWorked } from '../domain/crew/hours.js';
import { AppError, NotFoundError } from '../errors.js';

const snapshot = (s: Signup): Record<string, unknown> => ({
  checkedInAt: s.checkedInAt?.toISOString() ?? null,
  checkedOutAt: s.checkedOutAt?.toISOString() ?? null,
  noShow: s.noShow,
  minutesOverride: s.minutesOverride,
  minutes: minutesWorked(s),
});

/** Check-in at the launch, check-out, no-shows and hour corrections (each correction audited). */
export function createAttendanceService(deps: { db: DataSource; clock: () => Date }) {
  async function change(actorId: string, signupId: string, action: string, apply: (s: Signup) => void, reason = ''): Promise<Signup> {
    return deps.db.transaction(async (tx) => {
      const s = await tx.getRepository(Signup).findOne({ where: { id: signupId }, lock: { mode: 'pessimistic_write' } });
      if (!s) throw new NotFoundError('Sign-up');
      if (s.status !== 'confirmed') throw new AppError(409, 'conflict', 'Only confirmed crew can be checked in');
      const before = snapshot(s);
      apply(s);
      const saved = await tx.getRepository(Signup).save(s);
      await tx.getRepository(AuditLog).save(tx.getRepository(AuditLog).create({ actorId, action, entityType: 'signup', entityId: s.id, before, after: snapshot(saved), reason }));
      return saved;
    });
  }

  return {
    checkIn: (actorId: string, id: string, at?: string) =>
      change(actorId, id, 'check-in', (s) => Object.assign(s, { checkedInAt: at ? new Date(at) : deps.clock(), checkedOutAt: null, noShow: false })),

    checkOut: (actorId: string, id: string, at?: string) =>
      change(actorId, id, 'check-out', (s) => {
        if (!s.checkedInAt) throw new AppError(409, 'conflict', 'Check the person in first');
        const out = at ? new Date(at) : deps.clock();
        if (out < s.checkedInAt) throw new AppError(400, 'validation_failed', 'Check-out must be after check-in', { at: ['is before the check-in'] });
        s.checkedOutAt = out;
      }),

    noShow: (actorId: string, id: string) =>
      change(actorId, id, 'no-show', (s) => Object.assign(s, { noShow: true, checkedInAt: null, checkedOutAt: null })),

    setMinutes: (actorId: string, id: string, minutes: number, reason: string) =>
      change(actorId, id, 'hours-corrected', (s) => Object.assign(s, { minutesOverride: minutes, noShow: false }), reason),
  };
}
export type AttendanceService = ReturnType<typeof createAttendanceService>;
