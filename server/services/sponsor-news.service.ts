/**
 * Afterwards, for sponsors: one e-mail per sponsored tree once it is planted (site, date, the
 * day's tides), and matching trees to gifts the nursery was too short for when they were paid.
 * Both run from the background job (several instances may run them at once: rows are claimed
 * with SKIP LOCKED and every mail has a dedupe key) and can be run directly.
 */
import type { DataSource } from 'typeorm';
import type { TideStationDirectory } from '../adapters/tide-stations.js';
import { Donation } from '../db/entities/donation.entity.js';
import { Organisation } from '../db/entities/organisation.entity.js';
import { Site } from '../db/entities/site.entity.js';
import { Tree } from '../db/entities/tree.entity.js';
import { plantedMail, type PlantedTide } from '../domain/giving/planted-mail.js';
import { dedicationText } from '../domain/giving/receipt-mail.js';
import { predictExtremesMetres } from '../domain/tide/predict.js';
import { siteCorrection } from '../domain/tide/site-windows.js';
import { zonedTimeToUtc } from '../domain/tide/time-zone.js';
import { fromMetres } from '../domain/tide/units.js';
import { queueMails } from './crew-outbox.js';
import { linkTrees } from './sponsor-trees.js';

const BATCH = 200;
/** A tree that died in the nursery: lost, never planted. */
const LOST_IN_NURSERY = "(t.stage = 'lost' AND t.planted_on IS NULL)";

interface Due {
  treeId: string;
  tag: string;
  plantedOn: string;
  siteId: string;
  donationId: string;
}

export function createSponsorNewsService(deps: { db: DataSource; stations: TideStationDirectory; clock: () => Date; appUrl: string }) {
  const { db } = deps;
  const appUrl = deps.appUrl.replace(/\/+$/, '');

  async function tidesOn(site: Site, plantedOn: string, unit: 'ft' | 'm'): Promise<{ tides: PlantedTide[]; stationName: string }> {
    const station = await deps.stations.get(site.stationId);
    if (!station) return { tides: [], stationName: site.stationId };
    const [y, m, d] = plantedOn.split('-').map(Number) as [number, number, number];
    const span = { fromMs: zonedTimeToUtc(site.timeZone, y, m, d), toMs: zonedTimeToUtc(site.timeZone, y, m, d + 1), correction: siteCorrection(site) };
    const tides = predictExtremesMetres(station, span).map((e) => ({ timeMs: e.timeMs, height: fromMetres(e.height, unit), type: e.type }));
    return { tides, stationName: station.name };
  }

  async function dueTrees(): Promise<Due[]> {
    return db.query(
      `SELECT t.id AS "treeId", t.tag, to_char(t.planted_on, 'YYYY-MM-DD') AS "plantedOn", t.site_id AS "siteId", t.sponsor_donation_id AS "donationId"
         FROM tree t JOIN donation d ON d.id = t.sponsor_donation_id
        WHERE t.stage IN ('planted', 'alive') AND t.planted_on IS NOT NULL AND t.site_id IS NOT NULL
          AND t.sponsor_told_planted_at IS NULL AND d.status = 'paid'
        ORDER BY t.planted_on, t.tag LIMIT $1`,
      [BATCH],
    );
  }

  /** Queues the news of one tree and marks it told, unless another run got there first. */
  async function tell(due: Due, org: Organisation, site: Site): Promise<boolean> {
    const { tides, stationName } = await tidesOn(site, due.plantedOn, org.units);
    return db.transaction(async (tx) => {
      const claimed: unknown[] = await tx.query(
        `SELECT t.id FROM tree t JOIN donation d ON d.id = t.sponsor_donation_id
          WHERE t.id = $1 AND t.sponsor_donation_id = $2 AND t.sponsor_told_planted_at IS NULL AND d.status = 'paid'
          FOR UPDATE OF t SKIP LOCKED`,
        [due.treeId, due.donationId],
      );
      if (claimed.length === 0) return false;
      const d = await tx.getRepository(Donation).findOneByOrFail({ id: due.donationId });
      const dedication = d.dedicationKind && d.dedicationName ? dedicationText({ kind: d.dedicationKind, name: d.dedicationName }) : null;
      const content = plantedMail(
        { donorName: d.donorName, tag: due.tag, siteName: site.name, plantedOn: due.plantedOn, timeZone: site.timeZone, unit: org.units, tides, stationName, dedication, organisationName: org.name },
        { href: `${appUrl}/sponsor/thanks?session_id=${encodeURIComponent(d.checkoutSessionId)}`, label: 'See your gift and its trees' },
      );
      if (d.donorEmail) await queueMails(tx, [{ kind: 'sponsor-planted', to: d.donorEmail, content, dedupeKey: `planted:${due.treeId}:${d.id}` }]);
      await tx.getRepository(Tree).update({ id: due.treeId }, { sponsorToldPlantedAt: deps.clock() });
      return true;
    });
  }

  return {
    /** Queues "your tree is planted" for every sponsored tree planted and not yet told; returns how many. */
    async tellPlanted(): Promise<number> {
      const due = await dueTrees();
      if (due.length === 0) return 0;
      const org = await db.getRepository(Organisation).findOneByOrFail({ id: 1 });
      const sites = new Map((await db.getRepository(Site).find()).map((s) => [s.id, s]));
      let told = 0;
      for (const tree of due) {
        const site = sites.get(tree.siteId);
        if (site && (await tell(tree, org, site))) told += 1;
      }
      return told;
    },

    /**
     * Links free nursery trees to paid gifts that have fewer than they bought, oldest gift first;
     * returns trees linked. A sponsored tree lost before it was planted is let go first, so the
     * gift takes the next tree instead of holding a dead one for good.
     */
    async matchWaitingGifts(): Promise<number> {
      const waiting: { id: string }[] = await db.query(
        `SELECT d.id FROM donation d
          WHERE d.status = 'paid'
            AND d.tree_count > (SELECT COUNT(*) FROM tree t WHERE t.sponsor_donation_id = d.id AND NOT ${LOST_IN_NURSERY})
          ORDER BY d.paid_at, d.id LIMIT $1`,
        [BATCH],
      );
      let linked = 0;
      for (const { id } of waiting) {
        const got = await db.transaction(async (tx) => {
          const d = await tx.getRepository(Donation).findOne({ where: { id }, lock: { mode: 'pessimistic_write' } });
          if (!d || d.status !== 'paid') return null; // refunded meanwhile
          await tx.query(`UPDATE tree t SET sponsor_donation_id = NULL WHERE t.sponsor_donation_id = $1 AND ${LOST_IN_NURSERY}`, [id]);
          const have = await tx.getRepository(Tree).countBy({ sponsorDonationId: id });
          return (await linkTrees(tx, id, d.treeCount - have)).length;
        });
        if (got === 0) break; // the nursery has no free tree left
        linked += got ?? 0;
      }
      return linked;
    },
  };
}
export type SponsorNewsService = ReturnType<typeof createSponsorNewsService>;
