import { child, integer, isFormObject, list, text, type FormObject } from './form-body.js';
import { invalidParam, missingParam, resourceMissing, type StripeApiError } from './stripe-errors.js';

/** A line item as the fake keeps it, for the hosted page and later for webhooks. */
export interface LineItem {
  name: string;
  currency: string;
  unitAmount: number;
  quantity: number;
  amountTotal: number;
}

export type LineItemsResult = { ok: true; items: LineItem[] } | { ok: false; error: StripeApiError };

function parseLineItem(raw: FormObject, index: number): LineItem | StripeApiError {
  const at = `line_items[${index}]`;
  const price = text(raw, 'price');
  if (price !== undefined) return resourceMissing('price', price, `${at}[price]`);
  const priceData = child(raw, 'price_data');
  if (!priceData) return missingParam(`${at}[price_data]`);
  const currency = text(priceData, 'currency')?.toLowerCase();
  if (!currency || !/^[a-z]{3}$/.test(currency)) return missingParam(`${at}[price_data][currency]`);
  const unitAmount = integer(priceData, 'unit_amount');
  if (unitAmount === undefined || unitAmount < 0) {
    return invalidParam(`${at}[price_data][unit_amount]`, 'Invalid integer: unit_amount must be a non-negative integer', 'parameter_invalid_integer');
  }
  const quantity = integer(raw, 'quantity') ?? 1;
  if (quantity < 1) return invalidParam(`${at}[quantity]`, 'Quantity must be at least 1');
  const name = text(child(priceData, 'product_data') ?? {}, 'name') ?? text(priceData, 'product');
  if (!name) return missingParam(`${at}[price_data][product_data][name]`);
  return { name, currency, unitAmount, quantity, amountTotal: unitAmount * quantity };
}

/**
 * Reads `line_items` with inline `price_data`. Saved prices (`price: 'price_…'`) do not
 * exist in the fake, so they are reported missing the way the API reports an unknown id.
 */
export function parseLineItems(params: FormObject): LineItemsResult {
  const rawItems = list(params, 'line_items');
  if (!rawItems || rawItems.length === 0) return { ok: false, error: missingParam('line_items') };
  const items: LineItem[] = [];
  for (const [index, raw] of rawItems.entries()) {
    if (!isFormObject(raw)) return { ok: false, error: invalidParam(`line_items[${index}]`, 'Invalid object') };
    const item = parseLineItem(raw, index);
    if (!('quantity' in item)) return { ok: false, error: item };
    items.push(item);
  }
  const currencies = new Set(items.map((item) => item.currency));
  if (currencies.size > 1) {
    return { ok: false, error: invalidParam('line_items', 'All line items must use the same currency') };
  }
  return { ok: true, items };
}
