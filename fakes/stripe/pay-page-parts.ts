import { escapeHtml } from '../support/html.js';
import type { StoredSession } from './checkout-session.js';
import { groupDigits, TEST_CARDS } from './test-cards.js';

export const BANNER = 'Local test stand-in for the hosted payments page. No card is charged and no money moves.';

/** Phone first: full-width fields and 44 px targets; colours keep WCAG AA contrast on the page background. */
export const PAY_PAGE_CSS = `
  .checkout { max-width: 32rem; }
  .total { font-size: 1.5rem; font-weight: 700; margin: .25rem 0 1rem; }
  form input { width: 100%; box-sizing: border-box; min-height: 44px; font-size: 1rem; padding: .5rem .75rem; border: 1px solid #5f6f67; border-radius: 6px; background: #fff; }
  form input[aria-invalid="true"] { border: 2px solid #a4262c; }
  input:focus-visible, button:focus-visible, a:focus-visible { outline: 3px solid #0b5d44; outline-offset: 2px; }
  .pair { display: grid; grid-template-columns: 1fr 1fr; gap: .75rem; }
  .hint { color: #4a5a52; font-size: .9rem; margin: .25rem 0 0; }
  .error { color: #a4262c; background: #fdecea; border-left: 4px solid #a4262c; padding: .6rem .75rem; font-weight: 600; }
  .actions { display: flex; flex-wrap: wrap; gap: .75rem; align-items: center; margin-top: 1.25rem; }
  .actions button { flex: 1 1 10rem; min-height: 44px; border: 0; border-radius: 6px; background: #0b5d44; color: #fff; font-weight: 700; }
  .actions a, .link-button { display: inline-flex; align-items: center; justify-content: center; min-height: 44px; min-width: 44px; padding: 0 1rem; box-sizing: border-box; border: 1px solid #0b5d44; border-radius: 6px; text-decoration: none; font-weight: 600; }
  td code { white-space: nowrap; }
`;

/** Stripe amounts are in the smallest unit; these currencies have no minor unit. */
const ZERO_DECIMAL = new Set(['bif', 'clp', 'djf', 'gnf', 'jpy', 'kmf', 'krw', 'mga', 'pyg', 'rwf', 'ugx', 'vnd', 'vuv', 'xaf', 'xof', 'xpf']);

export function formatAmount(amount: number, currency: string): string {
  const major = ZERO_DECIMAL.has(currency) ? String(amount) : (amount / 100).toFixed(2);
  return `${major} ${currency.toUpperCase()}`;
}

export function orderSummary({ session, lineItems }: StoredSession): string {
  const rows = lineItems
    .map(
      (item) => `<tr><td>${escapeHtml(item.name)}</td><td>${item.quantity}</td>` +
        `<td>${escapeHtml(formatAmount(item.amountTotal, item.currency))}</td></tr>`,
    )
    .join('\n');
  return `<table>
<caption class="visually-hidden">Order summary</caption>
<thead><tr><th scope="col">Item</th><th scope="col">Quantity</th><th scope="col">Amount</th></tr></thead>
<tbody>
${rows}
</tbody>
<tfoot><tr><th scope="row" colspan="2">Total</th><td>${escapeHtml(formatAmount(session.amount_total, session.currency))}</td></tr></tfoot>
</table>`;
}

export function testCardList(): string {
  const rows = TEST_CARDS.map((card) => `<tr><td><code>${groupDigits(card.number)}</code></td><td>${escapeHtml(card.outcome)}</td></tr>`).join('\n');
  return `<section aria-labelledby="test-cards-heading">
<h2 id="test-cards-heading">Test cards</h2>
<p>This page is a local stand-in for testing. Only these numbers work; expiry and security code are optional here.</p>
<table>
<thead><tr><th scope="col">Card number</th><th scope="col">Result</th></tr></thead>
<tbody>
${rows}
</tbody>
</table>
</section>`;
}
