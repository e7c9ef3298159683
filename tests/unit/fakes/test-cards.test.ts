import { describe, expect, it } from 'vitest';
import { checkCard, passesLuhn } from '../../../fakes/stripe/test-cards.js';

describe('passesLuhn', () => {
  // The worked example 7992739871(3) of the Luhn check digit, as in the Wikipedia article
  // "Luhn algorithm" (from memory); the checksum itself is ISO/IEC 7812-1's.
  it.each([
    ['79927398713', true],
    ['79927398710', false],
    ['4242424242424242', true],
    ['4242424242424241', false],
  ])('%s → %s', (digits, valid) => {
    expect(passesLuhn(digits)).toBe(valid);
  });
});

describe('checkCard', () => {
  // Outcomes of the payments service's documented test numbers (docs.stripe.com/testing, as
  // transcribed in docs.venly.io "Testing PAY"): 4242… succeeds, 4000…0002 generic decline,
  // 4000…9995 insufficient funds. The decline messages and other error codes are from memory.
  it.each([
    ['4242 4242 4242 4242', { ok: true, brand: 'visa', last4: '4242' }],
    ['4000-0000-0000-0002', { ok: false, error: { code: 'card_declined', decline_code: 'generic_decline' } }],
    ['4000000000009995', { ok: false, error: { code: 'card_declined', decline_code: 'insufficient_funds' } }],
    ['4111111111111111', { ok: false, error: { code: 'card_declined', decline_code: 'test_mode_live_card' } }],
    ['4242 4242', { ok: false, error: { code: 'incorrect_number', param: 'number' } }],
    ['', { ok: false, error: { code: 'incomplete_number' } }],
  ])('%s', (number, expected) => {
    expect(checkCard({ number })).toMatchObject(expected);
  });

  it('checks the shape of the expiry and security code only when given', () => {
    expect(checkCard({ number: '4242424242424242', expiry: '12/34', cvc: '1234' }).ok).toBe(true);
    expect(checkCard({ number: '4242424242424242', expiry: '13/34' })).toMatchObject({ error: { code: 'invalid_expiry_month', param: 'exp_month' } });
    expect(checkCard({ number: '4242424242424242', cvc: '12' })).toMatchObject({ error: { code: 'invalid_cvc', param: 'cvc' } });
  });
});
