/**
 * The trip sheet a coordinator prints for the launch: the day, then each craft with its limits
 * and its runs (times, who is aboard, pots, load against the rated maximum), then what stays
 * ashore and why.
 */
import { marginFor } from './context.js';
import { BLANK, CAUTIONS, PREVAIL, sheetContext, timeOrNone, type SheetContext } from './trip-sheet-common.js';
import { craftName, distance, isoDay, kindLabel, length, listOr, percent, ratingSource, weight } from './trip-sheet-format.js';
import type { PrintableSheet, SheetBlock, SheetCraft, SheetSection, TripSheetInput } from './trip-sheet-types.js';

/** Times are in the sheet's zone, named in the column headings. */
const runColumns = (zone: string) => [
  { label: 'Run', width: 0.07 },
  { label: `Departs (${zone})`, width: 0.12 },
  { label: `Lands (${zone})`, width: 0.12 },
  { label: `Back (${zone})`, width: 0.12 },
  { label: 'Aboard', width: 0.3 },
  { label: 'Pots', width: 0.07 },
  { label: 'Load (share of rated max.)', width: 0.2 },
];

function planStatus(input: TripSheetInput): string {
  const { status, solver } = input.plan;
  const how = status === 'optimal' ? 'proven optimal' : status === 'feasible' ? 'valid, not proven optimal' : 'not every rule can be met';
  const by = input.source === 'edited' ? 'edited by hand and checked against every rule' : `built by the ${solver === 'highs' ? 'HiGHS solver' : 'fast planner'}`;
  return `${how}; ${by}`;
}

/** `12 × 60 lb each`, or the spread when pots were weighed one by one. */
function potsLine(input: TripSheetInput): string {
  const { count, massKg, masses = [] } = input.instance.pots;
  const all = [...masses.slice(0, count), ...Array<number>(Math.max(0, count - masses.length)).fill(massKg)];
  const units = input.organisation.units;
  if (all.length === 0) return 'none';
  const [low, high] = [Math.min(...all), Math.max(...all)];
  return low === high ? `${count} × ${weight(low, units)} each` : `${count} pots, ${weight(low, units)} to ${weight(high, units)} each`;
}

function daySection(input: TripSheetInput, ctx: SheetContext): SheetSection {
  const { instance, plan, workday } = input;
  const units = ctx.org.units;
  const { distanceKm, loadMinutes, unloadMinutes } = instance.route;
  const rows = [
    { label: 'Workday', value: workday.title },
    { label: 'Date', value: ctx.date },
    { label: 'Site', value: workday.siteName },
    { label: 'Launch', value: workday.launchName || BLANK },
    ...(workday.meetingPoint ? [{ label: 'Meeting point', value: workday.meetingPoint }] : []),
    { label: 'Window', value: ctx.window },
    { label: 'Route', value: `launch to site ${distance(distanceKm, units)} each way; loading ${loadMinutes} min, unloading ${unloadMinutes} min` },
    { label: 'Pots', value: potsLine(input) },
    { label: 'First departure', value: timeOrNone(ctx, ctx.firstDepartAt) },
    { label: 'Last pot lands', value: timeOrNone(ctx, plan.lastLandingAt) },
    { label: 'Last craft back', value: timeOrNone(ctx, ctx.lastReturnAt) },
    { label: 'Plan', value: planStatus(input) },
    { label: 'Plan updated', value: `${ctx.zoned(input.planUpdatedAt)}, ${isoDay(input.planUpdatedAt, ctx.org.timeZone)}` },
  ];
  return { heading: 'The day', blocks: [{ kind: 'facts', rows }] };
}

function craftFacts(input: TripSheetInput, c: SheetCraft): SheetBlock {
  const units = input.organisation.units;
  // The planner's own view of the craft decides the margin it planned to.
  const planned = input.instance.craft.find((k) => k.id === c.id);
  const margin = planned ? marginFor(planned, input.instance.loadMargin) : 1;
  const crossing = planned?.speedKmh ? `${Math.round((input.instance.route.distanceKm / planned.speedKmh) * 60)} min each way` : null;
  const rows = [
    { label: 'Kind', value: `${kindLabel(c.kind)}, ${c.seats} seat${c.seats === 1 ? '' : 's'}` },
    { label: 'Rated max. load', value: `${weight(c.maxLoadKg, units)} (${ratingSource(c)}); planned to at most ${percent(margin)} = ${weight(c.maxLoadKg * margin, units)}` },
    { label: 'Pot slots', value: String(c.potSlots) },
    { label: 'Operator', value: c.needsOperator ? 'needs a qualified operator aboard on every run' : 'paddled by the crew' },
    ...(c.ownerName ? [{ label: 'Owner', value: `${c.ownerName} (only the owner paddles it)` }] : []),
    ...(c.draftM ? [{ label: 'Loaded draft', value: length(c.draftM, units) }] : []),
    ...(crossing ? [{ label: 'Crossing', value: crossing }] : []),
    ...(c.notes ? [{ label: 'Notes', value: c.notes }] : []),
  ];
  return { kind: 'facts', rows };
}

function runRows(input: TripSheetInput, ctx: SheetContext, c: SheetCraft): string[][] {
  return ctx.runsOf(c.id).map((r) => [
    String(r.run),
    ctx.at(r.departAt),
    ctx.at(r.landAt),
    ctx.at(r.returnAt),
    listOr(r.people.map(ctx.nameOf), 'nobody (pots only)'),
    String(r.pots),
    `${weight(r.loadKg, input.organisation.units)}, ${percent(r.loadShare)} of ${weight(c.maxLoadKg, input.organisation.units)}`,
  ]);
}

function craftSection(input: TripSheetInput, ctx: SheetContext, c: SheetCraft): SheetSection {
  return {
    heading: craftName(c),
    blocks: [craftFacts(input, c), { kind: 'table', columns: runColumns(ctx.zone), rows: runRows(input, ctx, c), empty: 'No runs.' }],
  };
}

function ashoreSection(input: TripSheetInput, ctx: SheetContext): SheetSection {
  const { unplaced, warnings } = input.plan;
  const pots = unplaced.potReasons.map((p) => `${p.count} pot${p.count === 1 ? '' : 's'}: ${ctx.explain(p)}`);
  const people = unplaced.people.map((p) => `${ctx.nameOf(p.id)}: ${ctx.explain(p)}`);
  const idle = (input.plan.idleCraft ?? []).map((i) => `${ctx.craftLabel(i.craftId)}: ${ctx.explain(i)}`);
  const blocks: SheetBlock[] = [];
  if (unplaced.pots > 0 && pots.length === 0) pots.push(`${unplaced.pots} pots: no reason given.`);
  blocks.push(pots.length ? { kind: 'list', items: pots } : { kind: 'paragraph', text: 'Every pot is placed on a run.' });
  blocks.push(people.length ? { kind: 'list', items: people } : { kind: 'paragraph', text: 'Everyone going out is placed on a run.' });
  if (idle.length) blocks.push({ kind: 'paragraph', text: 'Craft staying ashore:', strong: true }, { kind: 'list', items: idle });
  if (warnings.length) blocks.push({ kind: 'paragraph', text: 'Planner notes:', strong: true }, { kind: 'list', items: warnings });
  return { heading: 'Not placed', blocks };
}

/** The trip sheet for a workday's stored plan. */
export function buildTripSheet(input: TripSheetInput): PrintableSheet {
  const ctx = sheetContext(input);
  return {
    title: 'Trip sheet',
    organisation: input.organisation.name,
    subtitle: `${input.workday.title} · ${input.workday.siteName} · ${ctx.date}`,
    footer: `Trip sheet · ${input.workday.title} · loads against each craft's rated maximum`,
    fileName: `trip-sheet-${isoDay(input.instance.window.start, ctx.org.timeZone)}.pdf`,
    paper: ctx.org.units === 'ft' ? 'LETTER' : 'A4',
    sections: [
      daySection(input, ctx),
      ...ctx.used.map((c) => craftSection(input, ctx, c)),
      ashoreSection(input, ctx),
      { heading: 'Cautions', blocks: [{ kind: 'list', items: [...CAUTIONS] }, { kind: 'paragraph', text: PREVAIL, strong: true }] },
    ],
  };
}
