import type { DataSource, EntityManager } from 'typeorm';
import { WaiverVersion } from '../db/entities/waiver-version.entity.js';
import { NotFoundError } from '../errors.js';

export interface WaiverDto {
  version: number;
  text: string;
  guardianText: string;
  createdAt: string;
}

const toDto = (w: WaiverVersion): WaiverDto => ({ version: w.version, text: w.text, guardianText: w.guardianText, createdAt: w.createdAt.toISOString() });

/** Versioned waiver texts: a new text is a new version; sign-ups keep the version they accepted. */
export function createWaiverService(deps: { db: DataSource }) {
  async function currentIn(tx: EntityManager): Promise<WaiverVersion> {
    const [latest] = await tx.getRepository(WaiverVersion).find({ order: { version: 'DESC' }, take: 1 });
    if (!latest) throw new NotFoundError('Waiver');
    return latest;
  }
  return {
    currentIn,
    current: async () => toDto(await currentIn(deps.db.manager)),
    async publish(text: string, guardianText: string, createdById: string): Promise<WaiverDto> {
      return deps.db.transaction(async (tx) => {
        // Serialise publishers so two admins cannot take the same version number.
        await tx.query('LOCK TABLE "waiver_version" IN SHARE ROW EXCLUSIVE MODE');
        const next = (await currentIn(tx)).version + 1;
        const saved = await tx.getRepository(WaiverVersion).save({ version: next, text, guardianText, createdById });
        return toDto(await tx.getRepository(WaiverVersion).findOneByOrFail({ version: saved.version }));
      });
    },
  };
}
export type WaiverService = ReturnType<typeof createWaiverService>;
