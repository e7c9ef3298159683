/**
 * Readiness reasons and cautions on hand-built trees and a hand-built site (invented): a pure
 * sine tide with MSL 0.40 m and amplitude 0.40 m above MLLW, so MHHW = 0.80 m and the share of
 * time a point at z is under water is arccos((z − 0.40)/0.40)/π (TRADE.md §3's closed form).
 * Thresholds: the issue's defaults (top above MHHW; ±2 ppt for 21 days); the 30% collar caution
 * is Lewis 2005 and the below-MSL caution Teas 1977 (TRADE.md §3, [PUB]).
 */
import { describe, expect, it } from 'vitest';
import { siteTideDatums } from '../../../server/domain/nursery/crown-clearance.js';
import { NurseryInputError } from '../../../server/domain/nursery/errors.js';
import { readinessSettingsFrom, treeReadiness, type ReadinessInput } from '../../../server/domain/nursery/readiness.js';
import { DEFAULT_NURSERY_RULES } from '../../../shared/schemas/nursery.schema.js';
import { sineTide } from './sine-tide.js';

const tide = sineTide(0.4, 0.4);

/** Hand-built: a healthy brining tree, 30 cm pot on a bed at 0.30 m, 11 cm tall → top at 0.66 m. */
function input(overrides: { tree?: Partial<ReadinessInput['tree']>; settings?: ReadinessInput['settings']; readings?: ReadinessInput['salinityReadings'] } = {}): ReadinessInput {
  return {
    tree: { stage: 'brining', heightCm: 11, potHeightCm: 25, healthy: true, ...overrides.tree },
    site: { bedElevationM: 0.3, salinityPpt: 32 },
    tide,
    salinityReadings: overrides.readings ?? [
      { date: '2026-02-20', ppt: 26 },
      { date: '2026-03-01', ppt: 31 },
      { date: '2026-03-10', ppt: 33.5 },
    ],
    today: '2026-03-25',
    settings: overrides.settings,
  };
}

const TALL = { heightCm: 40 }; // top 0.95 m, above MHHW
const CROWN = 'Needs 14 cm more height: its top is 0.66 m above MLLW, under MHHW (0.80 m).';
const SHORT_HOLD = 'Needs 9 more days at 32 ppt (held 12 of 21 days).';
const OFF = 'Tank is at 26 ppt; site is 32 ppt.';
const STAGE = 'Stage is potted; only brining or ready trees can go out.';
const UNHEALTHY = 'Latest health note marks it unhealthy.';

describe('treeReadiness: each reason alone', () => {
  it('is ready when tall enough, held 24 days at 32 ± 2 ppt, brining and healthy', () => {
    const r = treeReadiness(input({ tree: TALL }));
    expect(r.ready).toBe(true);
    expect(r.reasons).toEqual([]);
    expect(r.heldDays).toBe(24);
    expect(r.crownTopM).toBeCloseTo(0.95, 10);
  });

  it('(a) crown under MHHW: "needs 14 cm more height"', () => {
    const r = treeReadiness(input());
    expect(r.ready).toBe(false);
    expect(r.reasons).toEqual([{ code: 'crown_submerged', message: CROWN }]);
    expect(r.heightShortfallCm).toBe(14);
    expect(r.requiredTopM).toBeCloseTo(0.8, 6);
  });

  it('(a) crown against a share threshold: 5% allowed, top under water 27% (closed form 0.275)', () => {
    const r = treeReadiness(input({ settings: { crownThreshold: { kind: 'share', maxShare: 0.05 } } }));
    // Required top z with arccos((z − 0.4)/0.4)/π = 0.05: z = 0.4 + 0.4·cos(0.05π) = 0.7951 m → 13.5 cm short → 14 cm.
    expect(r.requiredTopM).toBeCloseTo(0.7951, 3);
    expect(r.crownSubmergedShare).toBeCloseTo(Math.acos(0.65) / Math.PI, 3);
    expect(r.reasons).toEqual([
      { code: 'crown_submerged', message: 'Needs 14 cm more height: its top would be under water 27% of the time (at most 5% allowed).' },
    ]);
  });

  it('(a) a share threshold passes when the top is wet no more than allowed', () => {
    const r = treeReadiness(input({ settings: { crownThreshold: { kind: 'share', maxShare: 0.3 } } }));
    expect(r.reasons).toEqual([]);
  });

  it('(b) hold too short: "9 more days at 32 ppt", counted from the first reading back in tolerance', () => {
    const r = treeReadiness(input({ tree: TALL, readings: [{ date: '2026-03-01', ppt: 26 }, { date: '2026-03-13', ppt: 30.5 }, { date: '2026-03-20', ppt: 32 }] }));
    expect(r.heldDays).toBe(12);
    expect(r.reasons).toEqual([{ code: 'salinity_hold', message: SHORT_HOLD }]);
  });

  it('(b) latest reading outside the tolerance: says where the tank and the site are', () => {
    const r = treeReadiness(input({ tree: TALL, readings: [{ date: '2026-02-01', ppt: 32 }, { date: '2026-03-20', ppt: 26 }] }));
    expect(r.reasons).toEqual([{ code: 'salinity_off', message: OFF }]);
  });

  it('(b) no reading at all', () => {
    const r = treeReadiness(input({ tree: TALL, readings: [] }));
    expect(r.reasons).toEqual([{ code: 'salinity_unknown', message: 'No salinity reading for its tank yet; site is 32 ppt.' }]);
  });

  it('(b) ignores readings after today', () => {
    const r = treeReadiness(input({ tree: TALL, readings: [{ date: '2026-03-01', ppt: 32 }, { date: '2026-03-30', ppt: 20 }] }));
    expect(r.reasons).toEqual([]);
  });

  it.each(['collected', 'tube', 'potted', 'planted', 'alive', 'lost'] as const)('(c) stage %s blocks', (stage) => {
    const r = treeReadiness(input({ tree: { ...TALL, stage } }));
    expect(r.reasons).toEqual([{ code: 'stage', message: `Stage is ${stage}; only brining or ready trees can go out.` }]);
  });

  it('(c) a latest health note flagged unhealthy blocks; no note does not', () => {
    expect(treeReadiness(input({ tree: { ...TALL, healthy: false } })).reasons).toEqual([{ code: 'unhealthy', message: UNHEALTHY }]);
    expect(treeReadiness(input({ tree: { ...TALL, healthy: undefined, stage: 'ready' } })).ready).toBe(true);
  });
});

describe('treeReadiness: reasons together', () => {
  it('lists every failing reason in order: crown, salinity, stage, health', () => {
    const r = treeReadiness(input({ tree: { stage: 'potted', healthy: false }, readings: [{ date: '2026-03-20', ppt: 26 }] }));
    expect(r.ready).toBe(false);
    expect(r.reasons.map((x) => x.message)).toEqual([CROWN, OFF, STAGE, UNHEALTHY]);
  });
});

describe('treeReadiness: cautions never block', () => {
  it('warns that the collar (0.55 m) floods 38% of the time and the bed is below MSL, yet the tree is ready', () => {
    const r = treeReadiness(input({ tree: TALL }));
    expect(r.ready).toBe(true);
    expect(r.collarFloodedShare).toBeCloseTo(Math.acos(0.375) / Math.PI, 3); // 0.378
    expect(r.cautions).toEqual([
      {
        code: 'collar_flooded',
        message: 'Its root collar would be flooded 38% of the time; established mangroves flood no more than about 30% of the time (Lewis 2005).',
      },
      {
        code: 'bed_below_msl',
        message: 'The bed (0.30 m above MLLW) is below mean sea level (0.40 m); a Florida review found 0% survival at 13 months for plantings below mid-tide (Teas 1977).',
      },
    ]);
  });

  it('has no cautions for a bed above MSL with a 60 cm pot (collar at 1.05 m, above every tide)', () => {
    const r = treeReadiness({ ...input({ tree: { ...TALL, potHeightCm: 60 } }), site: { bedElevationM: 0.45, salinityPpt: 32 } });
    expect(r.collarFloodedShare).toBe(0);
    expect(r.cautions).toEqual([]);
  });
});

describe('treeReadiness: tide datums and input', () => {
  it('gives the same answer with the site datums computed once and passed in', () => {
    const withDatums = { ...tide, datums: siteTideDatums(tide) };
    expect(treeReadiness({ ...input(), tide: withDatums })).toEqual(treeReadiness(input()));
  });

  it('refuses a negative height and a tide shorter than a tidal day', () => {
    expect(() => treeReadiness(input({ tree: { heightCm: -1 } }))).toThrow(NurseryInputError);
    const day = { series: { ...tide.series, heights: tide.series.heights.subarray(0, 100) }, extremes: tide.extremes.slice(0, 2) };
    expect(() => treeReadiness({ ...input(), tide: day })).toThrow('The tide series must cover at least one tidal day (use a year).');
  });
});

describe('readinessSettingsFrom', () => {
  it('maps the stored nursery rules onto readiness settings', () => {
    expect(readinessSettingsFrom(DEFAULT_NURSERY_RULES)).toEqual({ crownThreshold: { kind: 'mhhw' }, tolerancePpt: 2, requiredDays: 21 });
    const share = readinessSettingsFrom({ ...DEFAULT_NURSERY_RULES, crownRule: 'share', maxCrownSubmergedShare: 0.05 });
    expect(share.crownThreshold).toEqual({ kind: 'share', maxShare: 0.05 });
  });
});
