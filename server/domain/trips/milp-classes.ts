/**
 * People the MILP cannot tell apart are one class with an integer count per craft, instead of
 * one binary per person and craft: same counted weight and skills, not a minor, guardian or
 * craft owner. This removes the symmetry between, say, thirty standard-weight planters that
 * would otherwise make the solver prove the same thing thirty-factorial times.
 */
import type { PersonInfo, TripContext } from './context.js';

export interface PersonClass {
  /** Member person indexes, in instance order. */
  members: number[];
  /** A member, for weight and skills. */
  rep: PersonInfo;
}

/** Classes in order of their first member; `classOf[personIndex]` is the class index. */
export function personClasses(ctx: TripContext): { classes: PersonClass[]; classOf: number[] } {
  const guardians = new Set(ctx.people.flatMap((p) => (p.minor && p.person.guardianId ? [p.person.guardianId] : [])));
  const owners = new Set(ctx.instance.craft.flatMap((c) => (c.ownerId ? [c.ownerId] : [])));
  const classes: PersonClass[] = [];
  const byKey = new Map<string, number>();
  const classOf: number[] = [];
  for (const p of ctx.people) {
    const id = p.person.id;
    const special = p.minor || guardians.has(id) || owners.has(id);
    const key = special ? `#${p.index}` : `${p.weightKg}|${p.operator}|${p.paddler}`;
    let q = byKey.get(key);
    if (q === undefined) {
      q = classes.length;
      byKey.set(key, q);
      classes.push({ members: [], rep: p });
    }
    classes[q]?.members.push(p.index);
    classOf[p.index] = q;
  }
  return { classes, classOf };
}
