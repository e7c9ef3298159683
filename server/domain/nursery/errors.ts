/** The one error the nursery computations throw: an input outside what the formulas can answer. */

/**
 * Input that a nursery computation cannot answer (out of the equation's range, a target the
 * given stock water cannot reach, a malformed date). `field` names the offending input so a
 * service can map it to a `validation_failed` body with `fields`.
 * @example throw new NurseryInputError('stockPpt', 'Stock at 30 ppt cannot raise the tank to 32 ppt.')
 */
export class NurseryInputError extends RangeError {
  readonly field: string;

  constructor(field: string, message: string) {
    super(message);
    this.name = 'NurseryInputError';
    this.field = field;
  }
}

/** Throws a `NurseryInputError` on `field` unless `value` is a finite number within [min, max]. */
export function requireRange(field: string, value: number, min: number, max: number, unit = ''): void {
  if (!Number.isFinite(value) || value < min || value > max) {
    const u = unit ? ` ${unit}` : '';
    throw new NurseryInputError(field, `${field} must be between ${min} and ${max}${u} (got ${value}${u}).`);
  }
}

/** Salinities the nursery accepts: 0–45 ppt covers fresh water up to hypersaline lagoon water. */
export const MAX_PPT = 45;

/** Throws unless `ppt` is a salinity between 0 and `MAX_PPT`. */
export function requirePpt(field: string, ppt: number): void {
  requireRange(field, ppt, 0, MAX_PPT, 'ppt');
}

/** Throws unless `value` is a whole number of at least `min`. */
export function requireWhole(field: string, value: number, min: number): void {
  if (!Number.isInteger(value) || value < min) {
    throw new NurseryInputError(field, `${field} must be a whole number of at least ${min} (got ${value}).`);
  }
}
