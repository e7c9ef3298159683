import { escapeHtml, renderPage } from '../support/html.js';
import type { StoredSession } from './checkout-session.js';

const BANNER = 'Local test stand-in for the hosted payments page. No card is charged.';

/** Stripe amounts are in the smallest unit; these currencies have no minor unit. */
const ZERO_DECIMAL = new Set(['bif', 'clp', 'djf', 'gnf', 'jpy', 'kmf', 'krw', 'mga', 'pyg', 'rwf', 'ugx', 'vnd', 'vuv', 'xaf', 'xof', 'xpf']);

function formatAmount(amount: number, currency: string): string {
  const major = ZERO_DECIMAL.has(currency) ? String(amount) : (amount / 100).toFixed(2);
  return `${major} ${currency.toUpperCase()}`;
}

/** Shows what the payer would be asked to pay; paying and cancelling come with webhooks later. */
export function renderPayPage({ session, lineItems }: StoredSession): string {
  const rows = lineItems
    .map(
      (item) => `<tr><td>${escapeHtml(item.name)}</td><td>${item.quantity}</td>` +
        `<td>${escapeHtml(formatAmount(item.amountTotal, item.currency))}</td></tr>`,
    )
    .join('\n');
  const body = `<h1>Checkout</h1>
<p role="status">Test checkout is not built yet: this page cannot take a payment.</p>
<table>
<caption>Session <code>${escapeHtml(session.id)}</code></caption>
<thead><tr><th scope="col">Item</th><th scope="col">Quantity</th><th scope="col">Amount</th></tr></thead>
<tbody>
${rows}
</tbody>
<tfoot><tr><th scope="row" colspan="2">Total</th><td>${escapeHtml(formatAmount(session.amount_total, session.currency))}</td></tr></tfoot>
</table>`;
  return renderPage('Checkout (test)', body, BANNER);
}

export function renderMissingSession(id: string): string {
  const body = `<h1>Checkout session not found</h1>\n<p role="alert">No session with id <code>${escapeHtml(id)}</code>.</p>`;
  return renderPage('Checkout session not found', body, BANNER);
}
