import { describe, expect, it } from 'vitest';
import { defineComponent, h } from 'vue';
import { render, screen, waitFor, within } from '@testing-library/vue';
import { http, HttpResponse } from 'msw';
import { useSponsorThanks, type SponsorThanks } from '@/composables/useSponsorThanks';
import { server } from '../setup/client-setup';
import { errorResponse } from './support/msw';
import { renderApp } from './support/render-app';
import { buildThanks } from './sponsor-fixtures';

const SESSION = 'cs_test_a1b2c3d4e5f6';

/** Answers the thank-you endpoint with each of `answers` in turn (the last one repeats), counting calls. */
function answerThanks(...answers: (ReturnType<typeof buildThanks> | Response)[]): { calls: number } {
  const seen = { calls: 0 };
  server.use(
    http.get('/api/donations/thanks/:id', ({ params }) => {
      expect(params.id).toBe(SESSION);
      const answer = answers[Math.min(seen.calls, answers.length - 1)]!;
      seen.calls += 1;
      return answer instanceof Response ? answer.clone() : HttpResponse.json(answer);
    }),
  );
  return seen;
}

const pending = buildThanks({ recorded: false, status: 'pending', trees: [] });

describe('SponsorThanksView', () => {
  it('thanks the donor by name with the amount, trees and tag numbers once the gift is recorded', async () => {
    answerThanks(buildThanks());
    await renderApp(`/sponsor/thanks?session_id=${SESSION}`, null);
    const main = within(screen.getByRole('main'));

    expect(await main.findByRole('heading', { level: 1, name: 'Thank you, Noor' })).toBeTruthy();
    expect(main.getByText('Your gift of $51.81 sponsors 2 trees in Gull Spit fringe.')).toBeTruthy();
    const tags = within(main.getByRole('list', { name: 'Your trees carry the tags' }));
    expect(tags.getAllByRole('listitem').map((li) => li.textContent)).toEqual(['BST-0107', 'BST-0112']);
    const next = within(main.getByRole('region', { name: 'What happens next' }));
    expect(next.getByText(/site, the date and that day's tide/)).toBeTruthy();
    expect(next.getByText(/receipt/i)).toBeTruthy();
  });

  it('waits for the payment webhook, asking again until the gift is recorded', async () => {
    const seen = answerThanks(pending, buildThanks());
    await renderApp(`/sponsor/thanks?session_id=${SESSION}`, null);
    const main = within(screen.getByRole('main'));

    expect(await main.findByRole('heading', { level: 1, name: 'Thank you, Noor' })).toBeTruthy();
    expect(main.getByText(/Confirming your payment/)).toBeTruthy();
    expect(main.queryByRole('list', { name: /Your trees/ })).toBeNull();
    expect(await main.findByText(/Your gift of \$51.81 sponsors 2 trees/, undefined, { timeout: 4000 })).toBeTruthy();
    expect(seen.calls).toBe(2);
  });

  it('says plainly when the checkout is unknown, and stops asking', async () => {
    const seen = answerThanks(errorResponse(404, 'not_found', 'Checkout session not found'));
    await renderApp(`/sponsor/thanks?session_id=${SESSION}`, null);

    expect(await screen.findByText(/We couldn't find this checkout/)).toBeTruthy();
    expect(seen.calls).toBe(1);
  });

  it('still says what happens next without a session id', async () => {
    await renderApp('/sponsor/thanks', null);
    expect(await screen.findByText(/your receipt is on its way by e-mail/)).toBeTruthy();
    expect(screen.getByRole('region', { name: 'What happens next' })).toBeTruthy();
  });
});

describe('useSponsorThanks', () => {
  function mount(options: { intervalMs: number; attempts: number }): SponsorThanks {
    let state: SponsorThanks | undefined;
    render(defineComponent({ setup: () => { state = useSponsorThanks(SESSION, options); return () => h('p'); } }));
    return state!;
  }

  it('gives up after the set number of checks and points to the e-mailed receipt', async () => {
    const seen = answerThanks(pending);
    const state = mount({ intervalMs: 10, attempts: 3 });

    await waitFor(() => expect(state.waiting.value).toBe(false));
    expect(state.gaveUp.value).toBe(true);
    expect(seen.calls).toBe(3);
  });

  it('keeps asking through a dropped connection', async () => {
    const seen = answerThanks(errorResponse(503, 'service_unavailable', 'down'), buildThanks());
    const state = mount({ intervalMs: 10, attempts: 5 });

    await waitFor(() => expect(state.thanks.value?.recorded).toBe(true));
    expect(state.gaveUp.value).toBe(false);
    expect(state.error.value).toBeNull();
    expect(seen.calls).toBe(2);
  });
});
