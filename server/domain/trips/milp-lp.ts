/** A small sparse LP/MILP builder: columns with bounds, rows in CSR, objective set per column. */

export interface SparseModel {
  numCols: number;
  numRows: number;
  colCost: number[];
  colLower: number[];
  colUpper: number[];
  rowLower: number[];
  rowUpper: number[];
  integrality: (0 | 1)[];
  matrix: { format: 'csr'; numRows: number; numCols: number; starts: number[]; indices: number[]; values: number[] };
}

export type Term = readonly [col: number, coef: number];

export interface LpBuilder {
  /** Adds a column; returns its index. */
  col(lower: number, upper: number, integer: boolean): number;
  /** Adds a row `lower ≤ Σ coef × col ≤ upper` (repeated columns are summed). */
  row(lower: number, upper: number, terms: readonly Term[]): void;
  cost(col: number, value: number): void;
  build(): SparseModel;
}

/** A fresh builder. Use ±Infinity for missing bounds. */
export function lpBuilder(): LpBuilder {
  const m: SparseModel = {
    numCols: 0, numRows: 0, colCost: [], colLower: [], colUpper: [], rowLower: [], rowUpper: [], integrality: [],
    matrix: { format: 'csr', numRows: 0, numCols: 0, starts: [0], indices: [], values: [] },
  };
  return {
    col(lower, upper, integer) {
      m.colLower.push(lower);
      m.colUpper.push(upper);
      m.colCost.push(0);
      m.integrality.push(integer ? 1 : 0);
      return m.numCols++;
    },
    row(lower, upper, terms) {
      const merged = new Map<number, number>();
      for (const [c, v] of terms) merged.set(c, (merged.get(c) ?? 0) + v);
      for (const [c, v] of [...merged].sort((a, b) => a[0] - b[0])) {
        if (v === 0) continue;
        m.matrix.indices.push(c);
        m.matrix.values.push(v);
      }
      m.matrix.starts.push(m.matrix.indices.length);
      m.rowLower.push(lower);
      m.rowUpper.push(upper);
      m.numRows++;
    },
    cost(col, value) {
      m.colCost[col] = value;
    },
    build() {
      return { ...m, matrix: { ...m.matrix, numRows: m.numRows, numCols: m.numCols } };
    },
  };
}
