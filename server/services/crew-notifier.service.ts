import { In, type EntityManager } from 'typeorm';
import { CREW_ROLE_LABELS } from '../../shared/schemas/crew.schema.js';
import { Signup } from '../db/entities/signup.entity.js';
import type { User } from '../db/entities/user.entity.js';
import type { Workday } from '../db/entities/workday.entity.js';
import { cancellationMail, changeMail, confirmationMail, promotionMail, waitlistMail } from '../domain/crew-mails.js';
import { crewMailWorkday, workdayAttachment } from './calendar-ics.js';
import type { CrewNotifier } from './crew-notifier.js';
import { loadWorkday, mailContext, organisationName, queueMails, type CrewMailSettings } from './crew-outbox.js';
import { waitlistPosition } from './crew-places.js';

async function loadSignup(tx: EntityManager, signupId: string): Promise<Signup> {
  const s = await tx.getRepository(Signup).findOne({ where: { id: signupId }, relations: { user: true, workday: { site: true } } });
  if (!s) throw new Error(`Signup ${signupId} not found`);
  return s;
}

/** People on the crew or its waitlist, one row each. */
async function crewOf(tx: EntityManager, workdayId: string): Promise<User[]> {
  const signups = await tx.getRepository(Signup).find({ where: { workdayId, status: In(['confirmed', 'waitlisted']) }, relations: { user: true } });
  return signups.map((s) => s.user);
}

/**
 * The crew e-mails as outbox rows, written in the caller's transaction (so a message exists
 * exactly when its change commits); `flush` after the commit asks the sender to go now.
 * Dedupe keys make a repeated call harmless: `confirmed:<signup>`, `waitlisted:<signup>`,
 * `promoted:<signup>`, `changed:<workday>:<sequence>:<user>`, `cancelled:<workday>:<user>`.
 */
export function createCrewNotifier(deps: CrewMailSettings & { clock: () => Date; flush: () => Promise<void> }): CrewNotifier {
  const settings: CrewMailSettings = { appUrl: deps.appUrl, secret: deps.secret };
  const ics = (w: Workday) => workdayAttachment(settings.appUrl, deps.clock(), w, w.site);

  async function aboutSignup(tx: EntityManager, signupId: string, kind: 'confirmed' | 'waitlisted' | 'promoted') {
    const s = await loadSignup(tx, signupId);
    const ctx = mailContext(settings, await organisationName(tx), s.user);
    const view = crewMailWorkday(s.workday, s.workday.site);
    const role = CREW_ROLE_LABELS[s.role];
    const content =
      kind === 'confirmed' ? confirmationMail(view, ctx, role)
      : kind === 'promoted' ? promotionMail(view, ctx, role)
      : waitlistMail(view, ctx, role, await waitlistPosition(tx, s));
    const attachments = kind === 'waitlisted' ? [] : [ics(s.workday)];
    await queueMails(tx, [{ kind: `signup-${kind}`, to: s.user.email, content, attachments, dedupeKey: `${kind}:${s.id}` }]);
  }

  return {
    signupConfirmed: (tx, signupId) => aboutSignup(tx, signupId, 'confirmed'),
    signupWaitlisted: (tx, signupId) => aboutSignup(tx, signupId, 'waitlisted'),
    signupPromoted: (tx, signupId) => aboutSignup(tx, signupId, 'promoted'),

    async workdayChanged(tx, workdayId, summary) {
      const w = await loadWorkday(tx, workdayId);
      const org = await organisationName(tx);
      const attachment = ics(w);
      const mails = (await crewOf(tx, workdayId)).map((user) => ({
        kind: 'workday-changed',
        to: user.email,
        content: changeMail(crewMailWorkday(w, w.site), mailContext(settings, org, user), summary),
        attachments: [attachment],
        dedupeKey: `changed:${w.id}:${w.sequence}:${user.id}`,
      }));
      await queueMails(tx, mails);
    },

    async workdayCancelled(tx, workdayId) {
      const w = await loadWorkday(tx, workdayId);
      const org = await organisationName(tx);
      const mails = (await crewOf(tx, workdayId)).map((user) => ({
        kind: 'workday-cancelled',
        to: user.email,
        content: cancellationMail(crewMailWorkday(w, w.site), mailContext(settings, org, user)),
        dedupeKey: `cancelled:${w.id}:${user.id}`,
      }));
      await queueMails(tx, mails);
    },

    flush: () => deps.flush(),
  };
}
