/** Why a craft stays ashore, in the coordinator's words. */
import { canSkipper, type CraftInfo, type TripContext } from './context.js';
import type { Draft } from './draft.js';
import { clock } from './format.js';
import type { IdleCraft } from './types.js';

const minutes = (ms: number) => `${Math.round(ms / 60_000)} min`;

function noSkipper(ctx: TripContext, c: CraftInfo, draft: Draft): IdleCraft {
  const id = c.craft.id;
  const eligible = ctx.people.filter((p) => canSkipper(p, c));
  const skippers = new Set(draft.crews.flatMap((crew) => (crew ? [crew.skipper] : [])));
  const reason = c.craft.needsOperator ? 'no-operator' : 'no-paddler';
  const who = c.craft.needsOperator ? 'an adult with the operator skill' : 'an adult with the paddler skill';
  if (eligible.length === 0) return { craftId: id, reason, refs: { craftIds: [id] }, detail: `${id} needs ${who} within its load margin; there is none on the crew` };
  if (eligible.every((p) => skippers.has(p.index))) {
    return { craftId: id, reason, refs: { craftIds: [id] }, detail: `${id} needs ${who}; everyone who could take it is already in charge of another craft` };
  }
  return { craftId: id, reason: 'not-needed', refs: { craftIds: [id] }, detail: `${id} is not needed: the other craft carry everything that can go` };
}

/** The reason for one craft that makes no run. */
export function idleReason(ctx: TripContext, c: CraftInfo, draft: Draft): IdleCraft {
  const id = c.craft.id;
  if (c.craft.seats < 1 || c.capKg <= 0) return { craftId: id, reason: 'no-seat', refs: { craftIds: [id] }, detail: `${id} has no seat or no rated load` };
  if (c.maxRuns < 1) {
    const one = `one way takes ${minutes(c.travelMs)} and unloading ${minutes(ctx.unloadMs)}`;
    return { craftId: id, reason: 'window-too-short', refs: { craftIds: [id], at: ctx.end }, detail: `${id} cannot be unloaded at the site before the window closes at ${clock(ctx.end)} (${one})` };
  }
  const owner = c.craft.ownerId;
  if (owner && !ctx.personById.has(owner)) return { craftId: id, reason: 'owner-absent', refs: { craftIds: [id], personIds: [owner] }, detail: `${id} belongs to ${owner}, who is not on the crew; only its owner paddles it` };
  if (owner && !ctx.people.some((p) => canSkipper(p, c))) {
    return { craftId: id, reason: 'over-load', refs: { craftIds: [id], personIds: [owner] }, detail: `${id} belongs to ${owner}, who cannot take it out (a minor, over its load margin, or without a needed skill)` };
  }
  return noSkipper(ctx, c, draft);
}

/** Reasons for every craft the draft leaves ashore. */
export function idleCraft(ctx: TripContext, draft: Draft): IdleCraft[] {
  return ctx.crafts.filter((c) => !draft.crews[c.index]).map((c) => idleReason(ctx, c, draft));
}
