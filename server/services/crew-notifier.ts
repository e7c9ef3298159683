import type { EntityManager } from 'typeorm';

/**
 * What the crew services tell people. Each call runs inside the caller's transaction and only
 * writes to the mail outbox, so a message exists exactly when the change it reports committed;
 * `flush` (after commit) wakes the sender.
 */
export interface CrewNotifier {
  signupConfirmed(tx: EntityManager, signupId: string): Promise<void>;
  signupWaitlisted(tx: EntityManager, signupId: string): Promise<void>;
  /** Someone moved from the waitlist into a place. */
  signupPromoted(tx: EntityManager, signupId: string): Promise<void>;
  /** Time, place or details moved; goes to everyone confirmed or waitlisted. */
  workdayChanged(tx: EntityManager, workdayId: string, summary: string): Promise<void>;
  /** Goes to everyone confirmed or waitlisted, with the coordinator's message. */
  workdayCancelled(tx: EntityManager, workdayId: string): Promise<void>;
  flush(): Promise<void>;
}
