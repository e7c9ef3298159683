import { escapeHtml, renderPage } from '../support/html.js';
import { successRedirect } from './checkout-flow.js';
import type { StoredSession } from './checkout-session.js';
import { BANNER, formatAmount, orderSummary, PAY_PAGE_CSS, testCardList } from './pay-page-parts.js';
import type { CardError, CardInput } from './test-cards.js';

export interface PayFormState {
  /** The last decline or format problem, shown above the form. */
  error?: CardError;
  /** What the payer typed, put back after a decline (never the security code). */
  typed?: CardInput;
}

interface FieldSpec {
  id: string;
  name: string;
  label: string;
  attrs: string;
  value?: string;
  describedBy?: string[];
  invalid?: boolean;
}

function field({ id, name, label, attrs, value = '', describedBy = [], invalid = false }: FieldSpec): string {
  const described = describedBy.length > 0 ? ` aria-describedby="${describedBy.join(' ')}"` : '';
  return `<div><label for="${id}">${escapeHtml(label)}</label>` +
    `<input id="${id}" name="${name}" ${attrs} value="${escapeHtml(value)}"${described}${invalid ? ' aria-invalid="true"' : ''}></div>`;
}

/** The field at fault is marked invalid and points at the message; a decline faults the number. */
function fault(error: CardError | undefined, param: string): Pick<FieldSpec, 'invalid' | 'describedBy'> {
  const invalid = error !== undefined && (error.param ?? 'number') === param;
  return { invalid, describedBy: invalid ? ['card-error'] : [] };
}

function cardFields({ error, typed }: PayFormState): string {
  const numberFault = fault(error, 'number');
  return [
    field({ id: 'card-number', name: 'card_number', label: 'Card number', attrs: 'inputmode="numeric" autocomplete="cc-number" required', value: typed?.number, invalid: numberFault.invalid, describedBy: ['card-hint', ...(numberFault.describedBy ?? [])] }),
    '<p class="hint" id="card-hint">Use one of the test card numbers listed below.</p>',
    '<div class="pair">',
    field({ id: 'card-expiry', name: 'card_expiry', label: 'Expiry (MM / YY)', attrs: 'inputmode="numeric" autocomplete="cc-exp" placeholder="MM / YY"', value: typed?.expiry, ...fault(error, 'exp_month') }),
    field({ id: 'card-cvc', name: 'card_cvc', label: 'Security code', attrs: 'inputmode="numeric" autocomplete="cc-csc"', ...fault(error, 'cvc') }),
    '</div>',
    field({ id: 'card-name', name: 'card_name', label: 'Name on card', attrs: 'autocomplete="cc-name"', value: typed?.name }),
  ].join('\n');
}

function cardForm(stored: StoredSession, state: PayFormState): string {
  const { session } = stored;
  const alert = state.error ? `<p class="error" role="alert" id="card-error">${escapeHtml(state.error.message)}</p>\n` : '';
  const cancel = session.cancel_url ? `<a href="${escapeHtml(session.cancel_url)}">Cancel</a>` : '';
  return `${alert}<form method="post" action="/pay/${encodeURIComponent(session.id)}">
${cardFields(state)}
<div class="actions"><button type="submit">Pay</button>${cancel}</div>
</form>`;
}

/** The hosted checkout page for an open session: what is bought, the card form, the test cards. */
export function renderPayPage(stored: StoredSession, state: PayFormState = {}): string {
  const total = formatAmount(stored.session.amount_total, stored.session.currency);
  const body = `<div class="checkout">
<h1>Checkout</h1>
<p class="total">Total ${escapeHtml(total)}</p>
${orderSummary(stored)}
<section aria-labelledby="card-heading">
<h2 id="card-heading">Pay by card</h2>
${cardForm(stored, state)}
</section>
${testCardList()}
</div>`;
  return renderPage(state.error ? 'Payment declined – Checkout (test)' : 'Checkout (test)', body, BANNER, PAY_PAGE_CSS);
}

function linkBack(href: string | null, text: string): string {
  return href ? `<p><a class="link-button" href="${escapeHtml(href)}">${escapeHtml(text)}</a></p>` : '';
}

/** A paid or expired session takes no more payments; say so and offer the way back. */
export function renderClosedPage(stored: StoredSession): string {
  const { session } = stored;
  const paid = session.status === 'complete';
  const title = paid ? 'This checkout is already paid' : 'This checkout has expired';
  const text = paid ? 'A payment was already made for this checkout, so no second payment is taken.' : 'This checkout can no longer be paid. Start again from the site.';
  const back = paid ? linkBack(successRedirect(stored), 'Continue') : linkBack(session.cancel_url, 'Back to the site');
  const body = `<div class="checkout">\n<h1>${title}</h1>\n<p role="status">${text}</p>\n${back}\n</div>`;
  return renderPage(title, body, BANNER, PAY_PAGE_CSS);
}

/** Shown only when a session was created without a success_url to send the payer back to. */
export function renderPaidPage(stored: StoredSession): string {
  const total = formatAmount(stored.session.amount_total, stored.session.currency);
  const body = `<div class="checkout">\n<h1>Payment received</h1>\n<p role="status">${escapeHtml(total)} was paid. You can close this page.</p>\n</div>`;
  return renderPage('Payment received', body, BANNER, PAY_PAGE_CSS);
}

export function renderMissingSession(id: string): string {
  const body = `<h1>Checkout session not found</h1>\n<p role="alert">No session with id <code>${escapeHtml(id)}</code>.</p>`;
  return renderPage('Checkout session not found', body, BANNER, PAY_PAGE_CSS);
}
