import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { OutboxMessage } from '../../server/db/entities/outbox-message.entity.js';
import { Tree } from '../../server/db/entities/tree.entity.js';
import { createTideStationDirectory } from '../../server/adapters/tide-stations.js';
import { createSponsorNewsService } from '../../server/services/sponsor-news.service.js';
import { buildDonation } from '../factories/donation.factory.js';
import { buildSite } from '../factories/site.factory.js';
import { buildTree } from '../factories/tree.factory.js';
import { createTestApp, type TestApp } from '../setup/test-app.js';
import { waitForMail } from '../setup/mail-inbox.js';

// Its own database: the job looks at every sponsored tree there is.
let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ ownDatabase: 'donation_planted' });
});
afterAll(() => t.close());

/** NOAA's published 2016 highs and lows for Safety Harbor (noaa/8726738), feet above MLLW; source S1 in the fixture. */
const noaa = JSON.parse(readFileSync(new URL('../fixtures/tide/safety-harbor-2016-hilo.json', import.meta.url), 'utf8')) as {
  extremes: { timeUtc: string; type: 'high' | 'low'; height: number }[];
};

/** `Low 2:27 AM EST, 1.3 ft` → minutes after local midnight, kind and height. */
function tidesIn(text: string) {
  return [...text.matchAll(/(Low|High) (\d{1,2}):(\d\d) (AM|PM) EST, (−?\d+\.\d) ft/g)].map((m) => ({
    type: m[1]!.toLowerCase(),
    minutes: ((Number(m[2]) % 12) + (m[4] === 'PM' ? 12 : 0)) * 60 + Number(m[3]),
    height: Number(m[5]!.replace('−', '-')),
  }));
}

describe('sponsor news: "your tree is planted"', () => {
  it('e-mails the donor once per planted tree with the site, the date and the day\'s tides, then marks the tree told', async () => {
    // The factory's site sits on the NOAA station Safety Harbor with no local offsets.
    const site = await buildSite(t.db, { name: `Heron test shore ${Date.now()}` });
    const gift = await buildDonation(t.db, { donorName: 'Petra Planted', treeCount: 3, dedicationKind: 'memory', dedicationName: 'Uncle Ike' });
    const planted = await buildTree(t.db, { stage: 'planted', siteId: site.id, plantedOn: '2016-01-01', sponsorDonationId: gift.id });
    const alive = await buildTree(t.db, { stage: 'alive', siteId: site.id, plantedOn: '2016-01-01', sponsorDonationId: gift.id });
    const lost = await buildTree(t.db, { stage: 'lost', siteId: site.id, plantedOn: '2016-01-01', sponsorDonationId: gift.id });
    const nursery = await buildTree(t.db, { stage: 'ready', sponsorDonationId: gift.id });
    const refundedGift = await buildDonation(t.db, { status: 'refunded', refundedAt: new Date() });
    const ofRefund = await buildTree(t.db, { stage: 'planted', siteId: site.id, plantedOn: '2016-01-01', sponsorDonationId: refundedGift.id });

    await t.background.runSponsorNews();
    const news = await t.db.getRepository(OutboxMessage).findBy({ kind: 'sponsor-planted', toAddress: gift.donorEmail });
    expect(news.map((m) => m.dedupeKey).sort()).toEqual([`planted:${planted.id}:${gift.id}`, `planted:${alive.id}:${gift.id}`].sort());
    const told = async (id: string) => (await t.db.getRepository(Tree).findOneByOrFail({ id })).sponsorToldPlantedAt;
    expect(await told(planted.id)).toBeInstanceOf(Date);
    expect(await told(alive.id)).toBeInstanceOf(Date);
    for (const id of [lost.id, nursery.id, ofRefund.id]) expect(await told(id)).toBeNull();

    // A second run (the job every ten minutes, or another instance) sends nothing new.
    const again = createSponsorNewsService({ db: t.db, stations: createTideStationDirectory(), clock: () => new Date(), appUrl: t.config.APP_URL });
    expect(await again.tellPlanted()).toBe(0);

    const mail = await waitForMail(t.config, gift.donorEmail, new RegExp(`Your tree ${planted.tag} is planted`));
    expect(mail.subject).toBe(`Your tree ${planted.tag} is planted at ${site.name}`);
    expect(mail.text).toContain(`was planted out at ${site.name} on Friday, January 1, 2016`);
    expect(mail.text).toContain('Dedication: In memory of Uncle Ike');
    expect(mail.text).toContain('heights above mean lower low water (MLLW)');

    // Check the tides against NOAA's published predictions for that local day (EST): within 10 minutes and 0.2 ft.
    const dayStart = Date.parse('2016-01-01T05:00:00Z');
    const published = noaa.extremes
      .filter((e) => Date.parse(e.timeUtc) >= dayStart && Date.parse(e.timeUtc) < dayStart + 86_400_000)
      .map((e) => ({ type: e.type, minutes: (Date.parse(e.timeUtc) - dayStart) / 60_000, height: e.height }));
    const inMail = tidesIn(mail.text);
    expect(published.length).toBeGreaterThanOrEqual(3);
    expect(inMail.map((x) => x.type)).toEqual(published.map((x) => x.type));
    inMail.forEach((x, i) => {
      expect(Math.abs(x.minutes - published[i]!.minutes)).toBeLessThanOrEqual(10);
      expect(Math.abs(x.height - published[i]!.height)).toBeLessThanOrEqual(0.2);
    });
  });
});

describe('sponsor news: gifts waiting for trees', () => {
  it('gives a gift whose tree died in the nursery the next free tree; a tree lost after planting stays the donor\'s', async () => {
    // Oldest first, so this gift is matched before any other waiting one.
    const gift = await buildDonation(t.db, { treeCount: 2, paidAt: new Date('2000-01-02T12:00:00Z') });
    const diedInNursery = await buildTree(t.db, { stage: 'lost', sponsorDonationId: gift.id });
    const site = await buildSite(t.db, { name: `Lost test shore ${Date.now()}` });
    const lostAfterPlanting = await buildTree(t.db, { stage: 'lost', siteId: site.id, plantedOn: '2016-01-01', sponsorDonationId: gift.id });
    const free = await buildTree(t.db, { stage: 'ready' });

    await t.background.runSponsorNews();
    const sponsorOf = async (id: string) => (await t.db.getRepository(Tree).findOneByOrFail({ id })).sponsorDonationId;
    expect(await sponsorOf(free.id)).toBe(gift.id);
    expect(await sponsorOf(diedInNursery.id)).toBeNull();
    expect(await sponsorOf(lostAfterPlanting.id)).toBe(gift.id);
  });
});
