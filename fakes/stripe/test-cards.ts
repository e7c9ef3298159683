/** What the payer typed on the hosted page (or sent to the test shortcut). */
export interface CardInput {
  number: string;
  expiry?: string;
  cvc?: string;
  name?: string;
}

/** The API's card error: `type: 'card_error'` with a code and, for declines, a decline code. */
export interface CardError {
  type: 'card_error';
  code: string;
  decline_code?: string;
  message: string;
  param?: string;
}

export type CardCheck = { ok: true; brand: string; last4: string } | { ok: false; error: CardError };

interface TestCard {
  number: string;
  outcome: string;
  decline?: { declineCode: string; message: string };
}

/** The documented test numbers the fake honours, shown on the hosted page in this order. */
export const TEST_CARDS: readonly TestCard[] = [
  { number: '4242424242424242', outcome: 'Payment succeeds' },
  { number: '4000000000000002', outcome: 'Declined (generic decline)', decline: { declineCode: 'generic_decline', message: 'Your card was declined.' } },
  { number: '4000000000009995', outcome: 'Declined (insufficient funds)', decline: { declineCode: 'insufficient_funds', message: 'Your card has insufficient funds.' } },
];

export function groupDigits(number: string): string {
  return number.replace(/(\d{4})(?=\d)/g, '$1 ');
}

/** The Luhn checksum every card number carries (ISO/IEC 7812-1). */
export function passesLuhn(digits: string): boolean {
  let sum = 0;
  for (let i = 0; i < digits.length; i += 1) {
    let digit = Number(digits[digits.length - 1 - i]);
    if (i % 2 === 1) digit = digit * 2 > 9 ? digit * 2 - 9 : digit * 2;
    sum += digit;
  }
  return sum % 10 === 0;
}

function cardError(code: string, message: string, param: string): CardCheck {
  return { ok: false, error: { type: 'card_error', code, message, param } };
}

/** A decline names no parameter: the card is fine, the issuer said no. */
function declined(declineCode: string, message: string): CardCheck {
  return { ok: false, error: { type: 'card_error', code: 'card_declined', decline_code: declineCode, message } };
}

/** Expiry and CVC are optional here and checked for shape only: the fake never charges a card. */
function checkFormat(input: CardInput): CardCheck | undefined {
  const expiry = input.expiry?.trim();
  if (expiry && !/^(0[1-9]|1[0-2])\s*\/?\s*\d{2}$/.test(expiry)) {
    return cardError('invalid_expiry_month', 'Your card’s expiry date is invalid: use MM / YY.', 'exp_month');
  }
  const cvc = input.cvc?.trim();
  if (cvc && !/^\d{3,4}$/.test(cvc)) return cardError('invalid_cvc', 'Your card’s security code is invalid.', 'cvc');
  return undefined;
}

/**
 * Decides a payment the way test mode does: the listed numbers succeed or decline as
 * documented; any other well-formed number is declined, since test mode takes no real cards.
 */
export function checkCard(input: CardInput): CardCheck {
  const digits = input.number.replace(/[\s-]/g, '');
  if (digits === '') return cardError('incomplete_number', 'Your card number is incomplete.', 'number');
  if (!/^\d{12,19}$/.test(digits) || !passesLuhn(digits)) return cardError('incorrect_number', 'Your card number is invalid.', 'number');
  const format = checkFormat(input);
  if (format) return format;
  const known = TEST_CARDS.find((card) => card.number === digits);
  if (!known) {
    return declined('test_mode_live_card', 'Your card was declined. This local test checkout accepts only the test card numbers listed on the page.');
  }
  if (known.decline) return declined(known.decline.declineCode, known.decline.message);
  return { ok: true, brand: digits.startsWith('4') ? 'visa' : 'unknown', last4: digits.slice(-4) };
}
