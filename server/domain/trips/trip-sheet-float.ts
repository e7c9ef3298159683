/**
 * The float plan for the shore contact, generated from the trip plan's roster (TRADE.md §2,
 * after the USCG float plan form: vessels, people, route, departure and return times, and when
 * to call for help). It is left with a reliable person ashore, not filed with the Coast Guard.
 */
import { BLANK, CAUTIONS, PREVAIL, sheetContext, timeOrNone, type SheetContext } from './trip-sheet-common.js';
import { craftLine, craftName, distance, isoDay, listOr } from './trip-sheet-format.js';
import type { PrintableSheet, SheetCraft, SheetPerson, SheetSection, TripSheetInput } from './trip-sheet-types.js';

const LEAVE_ASHORE =
  'Leave this float plan with a reliable person ashore: the shore contact. It is not filed with the Coast Guard; '
  + 'the shore contact keeps it and uses it to raise the alarm if the party is overdue.';

function contactsSection(input: TripSheetInput): SheetSection {
  const { organisation: org, coordinator } = input;
  return {
    heading: 'Who to call',
    blocks: [{
      kind: 'facts',
      rows: [
        { label: 'Shore contact', value: `${BLANK} (name)   phone ${BLANK}` },
        { label: 'Organisation', value: org.contactEmail ? `${org.name}, ${org.contactEmail}` : org.name },
        { label: 'Coordinator', value: `${coordinator.name}, phone ${coordinator.phone ?? BLANK}, ${coordinator.email}` },
      ],
    }],
  };
}

function tripSection(input: TripSheetInput, ctx: SheetContext): SheetSection {
  const { workday, instance, plan } = input;
  const aboard = new Set(plan.runs.flatMap((r) => r.people));
  const launch = workday.launchName || 'the launch';
  return {
    heading: 'The trip',
    blocks: [{
      kind: 'facts',
      rows: [
        { label: 'Date', value: ctx.date },
        { label: 'Route', value: `from ${launch} to ${workday.siteName}, ${distance(instance.route.distanceKm, ctx.org.units)} each way` },
        ...(workday.meetingPoint ? [{ label: 'Meeting point', value: workday.meetingPoint }] : []),
        { label: 'Low-water window', value: ctx.window },
        { label: 'First departure', value: timeOrNone(ctx, ctx.firstDepartAt) },
        { label: 'Latest return', value: `${timeOrNone(ctx, ctx.lastReturnAt)} (planned, last craft back at the launch)` },
        { label: 'On the water', value: `${aboard.size} ${aboard.size === 1 ? 'person' : 'people'} in ${ctx.used.length} craft` },
      ],
    }],
  };
}

function craftSection(ctx: SheetContext, c: SheetCraft): SheetSection {
  const rows = ctx.runsOf(c.id).map((r) => [String(r.run), ctx.at(r.departAt), ctx.at(r.returnAt), listOr(r.people.map(ctx.nameOf), 'nobody (pots only)')]);
  return {
    heading: craftName(c),
    blocks: [
      {
        kind: 'facts',
        rows: [
          { label: 'Description', value: craftLine(c) },
          { label: 'Colour', value: c.colour ?? `${BLANK} (not recorded: fill in)` },
          ...(c.ownerName ? [{ label: 'Owner', value: c.ownerName }] : []),
          ...(c.needsOperator ? [{ label: 'Operator', value: 'run by a qualified operator' }] : []),
          ...(c.notes ? [{ label: 'Notes', value: c.notes }] : []),
        ],
      },
      {
        kind: 'table',
        columns: [
          { label: 'Run', width: 0.08 },
          { label: `Departs (${ctx.zone})`, width: 0.17 },
          { label: `Back by (${ctx.zone})`, width: 0.17 },
          { label: 'Aboard on the way out', width: 0.58 },
        ],
        rows,
        empty: 'No runs.',
      },
    ],
  };
}

function contactOf(p: SheetPerson | undefined): string {
  if (!p) return BLANK;
  const parts = [];
  if (p.emergencyContact) parts.push(`${p.emergencyContact.name}, ${p.emergencyContact.phone}`);
  if (p.guardian) parts.push(`guardian ${p.guardian.name}${p.guardian.phone ? `, ${p.guardian.phone}` : ''}`);
  return parts.length ? parts.join('; ') : 'none on record';
}

function peopleSection(input: TripSheetInput, ctx: SheetContext): SheetSection {
  const firstRun = new Map<string, string>();
  for (const r of ctx.runs) for (const id of r.people) if (!firstRun.has(id)) firstRun.set(id, `${ctx.craftLabel(r.craftId)}, run ${r.run}`);
  const rows = [...firstRun].map(([id, ride]) => {
    const p = ctx.person(id);
    return [`${ctx.nameOf(id)}${p?.minor ? ' (minor)' : ''}`, p?.phone ?? '', contactOf(p), ride];
  });
  const ashore = input.plan.unplaced.people.map((p) => ctx.nameOf(p.id));
  return {
    heading: 'People on the water',
    blocks: [
      {
        kind: 'table',
        columns: [
          { label: 'Name', width: 0.25 },
          { label: 'Phone', width: 0.17 },
          { label: 'Emergency contact', width: 0.33 },
          { label: 'Rides out on', width: 0.25 },
        ],
        rows,
        empty: 'Nobody goes out on the water in this plan.',
      },
      // Shore crew are not in the plan at all; only crew the plan could not place are named here.
      ...(ashore.length ? [{ kind: 'paragraph' as const, text: `Left ashore by the plan (not on the water): ${ashore.join(', ')}.` }] : []),
      { kind: 'paragraph', text: 'Private: contact details are for the shore contact and the coordinator only.' },
    ],
  };
}

function overdueSection(input: TripSheetInput, ctx: SheetContext): SheetSection {
  const planned = timeOrNone(ctx, ctx.lastReturnAt);
  const coordinator = `${input.coordinator.name} (phone ${input.coordinator.phone ?? BLANK})`;
  return {
    heading: 'If the party is overdue',
    blocks: [
      {
        kind: 'list',
        numbered: true,
        items: [
          `Call ${BLANK} if not back by ${BLANK}. Planned latest return: ${planned}. Start with the coordinator, ${coordinator}.`,
          `If you cannot reach the coordinator, or the party is still not back ${BLANK} minutes later, call the Coast Guard or local emergency services on ${BLANK}.`,
          'Read them this plan: the craft and how to recognise them, who is aboard, the route and the times.',
          'Keep your phone free and stay where they can reach you until the party is found or back.',
        ],
      },
      { kind: 'paragraph', text: 'When everyone is back ashore, the coordinator tells you, and this plan is closed.' },
    ],
  };
}

/** The float plan for a workday's stored plan. */
export function buildFloatPlan(input: TripSheetInput): PrintableSheet {
  const ctx = sheetContext(input);
  return {
    title: 'Float plan',
    organisation: input.organisation.name,
    subtitle: `${input.workday.title} · ${input.workday.siteName} · ${ctx.date}`,
    footer: 'Float plan · left with a reliable person ashore, not filed with the Coast Guard',
    fileName: `float-plan-${isoDay(input.instance.window.start, ctx.org.timeZone)}.pdf`,
    paper: ctx.org.units === 'ft' ? 'LETTER' : 'A4',
    sections: [
      { heading: 'For the shore contact', blocks: [{ kind: 'paragraph', text: LEAVE_ASHORE, strong: true }, { kind: 'paragraph', text: PREVAIL }] },
      contactsSection(input),
      tripSection(input, ctx),
      overdueSection(input, ctx),
      ...ctx.used.map((c) => craftSection(ctx, c)),
      peopleSection(input, ctx),
      { heading: 'Cautions', blocks: [{ kind: 'list', items: [...CAUTIONS] }, { kind: 'paragraph', text: PREVAIL, strong: true }] },
    ],
  };
}
