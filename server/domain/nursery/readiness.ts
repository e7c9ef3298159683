/**
 * Whether a tree can go to a site, and if not, why — each reason spelled out for the coordinator.
 * Blocks: (a) crown clearance against the site's tides, (b) salinity hold at the site's salinity,
 * (c) stage and health. Cautions never block: (d) root collar flooded more than the published
 * guidance, and a bed below mean sea level.
 */
import type { NurseryRules, TreeStage } from '../../../shared/schemas/nursery.schema.js';
import { crownClearance, type CrownClearance, type CrownThreshold, type SiteTide } from './crown-clearance.js';
import { formatMetres, formatPpt, formatShare } from './format.js';
import { salinityHold, type SalinityReading } from './salinity-hold.js';


/** Stages from which a tree may go out to a site. */
export const PLANTABLE_STAGES: readonly TreeStage[] = ['brining', 'ready'];

/**
 * Defaults. Crown above MHHW, ±2 ppt for 21 days: the settings. Collar caution at 30%:
 * Lewis 2005 (Ecol. Eng. 24:403–418) — established mangroves flood no more than about 30% of the
 * time (TRADE.md §3 [PUB]).
 */
export const READINESS_DEFAULTS: Readonly<ReadinessSettings> = {
  crownThreshold: { kind: 'mhhw' },
  tolerancePpt: 2,
  requiredDays: 21,
  collarCautionShare: 0.3,
};

/** Readiness settings (the organisation's, or the defaults). */
export interface ReadinessSettings {
  crownThreshold: CrownThreshold;
  /** ± ppt around the site's salinity that counts as held. */
  tolerancePpt: number;
  /** Days the hold must last. */
  requiredDays: number;
  /** Share of time above which a flooded root collar earns a caution. */
  collarCautionShare: number;
}

/**
 * Readiness settings from the organisation's stored nursery rules.
 * @example readinessSettingsFrom(DEFAULT_NURSERY_RULES) // { crownThreshold: { kind: 'mhhw' }, tolerancePpt: 2, requiredDays: 21 }
 */
export function readinessSettingsFrom(rules: NurseryRules): Partial<ReadinessSettings> {
  const crownThreshold: CrownThreshold = rules.crownRule === 'share' ? { kind: 'share', maxShare: rules.maxCrownSubmergedShare } : { kind: 'mhhw' };
  return { crownThreshold, tolerancePpt: rules.salinityTolerancePpt, requiredDays: rules.holdDays };
}

export interface ReadinessInput {
  tree: { stage: TreeStage; heightCm: number; potHeightCm: number; /** From the latest health note; absent = no note. */ healthy?: boolean };
  /** Bed elevation in metres above the station's MLLW (the tide's datum). */
  site: { bedElevationM: number; salinityPpt: number };
  tide: SiteTide;
  salinityReadings: readonly SalinityReading[];
  today: string;
  settings?: Partial<ReadinessSettings>;
}

export type ReasonCode = 'crown_submerged' | 'salinity_unknown' | 'salinity_off' | 'salinity_hold' | 'stage' | 'unhealthy';
export type CautionCode = 'collar_flooded' | 'bed_below_msl';

export interface Readiness {
  ready: boolean;
  reasons: { code: ReasonCode; message: string }[];
  cautions: { code: CautionCode; message: string }[];
  crownSubmergedShare: number;
  collarFloodedShare: number;
  crownTopM: number;
  requiredTopM: number;
  heightShortfallCm: number;
  heldDays: number;
  mhhwM: number;
  mslM: number;
}

type Reason = Readiness['reasons'][number];

function crownMessage(c: CrownClearance, threshold: CrownThreshold): string {
  const detail =
    threshold.kind === 'mhhw'
      ? `its top is ${formatMetres(c.topM)} above MLLW, under MHHW (${formatMetres(c.mhhwM)})`
      : `its top would be under water ${formatShare(c.crownSubmergedShare)} of the time (at most ${formatShare(threshold.maxShare)} allowed)`;
  return `Needs ${c.shortfallCm} cm more height: ${detail}.`;
}

function salinityReason(input: ReadinessInput, s: ReadinessSettings): { reason?: Reason; heldDays: number } {
  const site = input.site.salinityPpt;
  const hold = salinityHold(input.salinityReadings, site, s.tolerancePpt, input.today);
  if (hold.latestPpt === null) return { heldDays: 0, reason: { code: 'salinity_unknown', message: `No salinity reading for its tank yet; site is ${formatPpt(site)}.` } };
  if (hold.holdStart === null) return { heldDays: 0, reason: { code: 'salinity_off', message: `Tank is at ${formatPpt(hold.latestPpt)}; site is ${formatPpt(site)}.` } };
  const missing = s.requiredDays - hold.heldDays;
  if (missing <= 0) return { heldDays: hold.heldDays };
  const message = `Needs ${missing} more ${missing === 1 ? 'day' : 'days'} at ${formatPpt(site)} (held ${hold.heldDays} of ${s.requiredDays} days).`;
  return { heldDays: hold.heldDays, reason: { code: 'salinity_hold', message } };
}

function stageAndHealth(tree: ReadinessInput['tree']): Reason[] {
  const out: Reason[] = [];
  if (!PLANTABLE_STAGES.includes(tree.stage)) out.push({ code: 'stage', message: `Stage is ${tree.stage}; only brining or ready trees can go out.` });
  if (tree.healthy === false) out.push({ code: 'unhealthy', message: 'Latest health note marks it unhealthy.' });
  return out;
}

function cautionsFor(c: CrownClearance, bedM: number, s: ReadinessSettings): Readiness['cautions'] {
  const out: Readiness['cautions'] = [];
  if (c.collarFloodedShare > s.collarCautionShare) {
    const message = `Its root collar would be flooded ${formatShare(c.collarFloodedShare)} of the time; established mangroves flood no more than about ${formatShare(s.collarCautionShare)} of the time (Lewis 2005).`;
    out.push({ code: 'collar_flooded', message });
  }
  if (bedM < c.mslM) {
    const message = `The bed (${formatMetres(bedM)} above MLLW) is below mean sea level (${formatMetres(c.mslM)}); a Florida review found 0% survival at 13 months for plantings below mid-tide (Teas 1977).`;
    out.push({ code: 'bed_below_msl', message });
  }
  return out;
}

/**
 * Readiness of one tree for one site on `today`.
 * @example treeReadiness({ tree, site, tide: { series, extremes }, salinityReadings, today: '2026-04-01' })
 *   // { ready: false, reasons: [{ code: 'crown_submerged', message: 'Needs 14 cm more height: …' }], … }
 */
export function treeReadiness(input: ReadinessInput): Readiness {
  const d = READINESS_DEFAULTS;
  const o = input.settings ?? {};
  const s: ReadinessSettings = {
    crownThreshold: o.crownThreshold ?? d.crownThreshold,
    tolerancePpt: o.tolerancePpt ?? d.tolerancePpt,
    requiredDays: o.requiredDays ?? d.requiredDays,
    collarCautionShare: o.collarCautionShare ?? d.collarCautionShare,
  };
  const { tree, site } = input;
  const crown = crownClearance({ ...tree, bedElevationM: site.bedElevationM, tide: input.tide, threshold: s.crownThreshold });
  const reasons: Reason[] = [];
  if (!crown.pass) reasons.push({ code: 'crown_submerged', message: crownMessage(crown, s.crownThreshold) });
  const salinity = salinityReason(input, s);
  if (salinity.reason) reasons.push(salinity.reason);
  reasons.push(...stageAndHealth(tree));
  return {
    ready: reasons.length === 0,
    reasons,
    cautions: cautionsFor(crown, site.bedElevationM, s),
    crownSubmergedShare: crown.crownSubmergedShare,
    collarFloodedShare: crown.collarFloodedShare,
    crownTopM: crown.topM,
    requiredTopM: crown.requiredTopM,
    heightShortfallCm: crown.shortfallCm,
    heldDays: salinity.heldDays,
    mhhwM: crown.mhhwM,
    mslM: crown.mslM,
  };
}
