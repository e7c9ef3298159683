/** Where each MILP variable lives, shared by the model, its warm start and the decoder. */
import type { Term } from './milp-lp.js';
import type { PersonClass } from './milp-classes.js';

export interface MilpIndex {
  classes: PersonClass[];
  classOf: number[];
  /** Modelled craft indexes. */
  crafts: number[];
  s: Map<string, number>;
  x: Map<string, number>;
  u: Map<number, number[]>;
  /** Pots per run and pot class: `n.get(c)[k][j]`. */
  n: Map<number, number[][]>;
  /** Distinct unloading times, ascending, with their A, π and G columns. */
  times: number[];
  A: number[];
  pi: number[];
  G: number[];
  /** z[r] (r ≥ 1): some run with pots lands at rank r or later; z[0] is unused (−1). */
  z: number[];
  M: number;
  /** Rank of each landing time among all modelled landings. */
  landRank: Map<number, number>;
  /** Pot room per run with the lightest possible skipper (the bound of n). */
  room: Map<number, number>;
  weights: { pots: number; people: number; last: number; runs: number; share: number };
}

export const key = (q: number, c: number) => `${q}:${c}`;

/** Terms Σ weight × s (and × x on run 1), optionally scaled. */
export function crewTerms(ix: MilpIndex, c: number, firstRun: boolean, scale = 1): Term[] {
  return ix.classes.flatMap((cl, q) => {
    const w = cl.rep.weightKg * scale;
    const s = ix.s.get(key(q, c));
    const x = firstRun ? ix.x.get(key(q, c)) : undefined;
    return [...(s === undefined ? [] : [[s, w] as const]), ...(x === undefined ? [] : [[x, w] as const])];
  });
}


/** Terms for the columns that exist, all with one coefficient. */
export const termsOf = (cols: readonly (number | undefined)[], coef: number): Term[] => cols.flatMap((v) => (v === undefined ? [] : [[v, coef] as const]));

/** A class's skipper and passenger columns on craft c (those that exist). */
export const crewCols = (ix: MilpIndex, q: number, c: number) => [ix.s.get(key(q, c)), ix.x.get(key(q, c))];
