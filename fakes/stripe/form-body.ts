/**
 * A form body as the Stripe SDK encodes it (`line_items[0][price_data][currency]=usd`),
 * after express's extended urlencoded parser (qs) has nested it again.
 */
export type FormValue = string | FormValue[] | FormObject;
export interface FormObject {
  [key: string]: FormValue | undefined;
}

/** qs only ever produces strings, arrays and plain objects, so a shallow check suffices. */
export function isFormObject(value: unknown): value is FormObject {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

export function formObject(value: unknown): FormObject {
  return isFormObject(value) ? value : {};
}

export function text(source: FormObject, key: string): string | undefined {
  const value = source[key];
  return typeof value === 'string' ? value : undefined;
}

export function child(source: FormObject, key: string): FormObject | undefined {
  const value = source[key];
  return isFormObject(value) ? value : undefined;
}

/**
 * A list parameter. qs turns large or sparse indices into an object keyed by index,
 * so both shapes are read back in index order.
 */
export function list(source: FormObject, key: string): FormValue[] | undefined {
  const value = source[key];
  if (Array.isArray(value)) return value;
  if (!isFormObject(value)) return undefined;
  return Object.keys(value)
    .filter((index) => /^\d+$/.test(index))
    .sort((a, b) => Number(a) - Number(b))
    .flatMap((index) => {
      const item = value[index];
      return item === undefined ? [] : [item];
    });
}

/** Flat string map, as Stripe's `metadata` is; non-string values are dropped. */
export function stringMap(source: FormObject, key: string): Record<string, string> {
  const value = child(source, key) ?? {};
  const entries = Object.entries(value).filter((entry): entry is [string, string] => typeof entry[1] === 'string');
  return Object.fromEntries(entries);
}

/** Integer parameter; the SDK sends numbers as decimal strings. */
export function integer(source: FormObject, key: string): number | undefined {
  const value = text(source, key);
  return value !== undefined && /^-?\d+$/.test(value) ? Number(value) : undefined;
}
