import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { errorResponse } from '../support/msw';
import { buildSettings } from '../support/organisation';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';

const admin = buildUser({ role: 'admin' });
const TEXT_V3 =
  'I take part in Bayhaven workdays of my own free will. I know tidal flats and small craft carry risks, and I will wear a life jacket on the water.';

function answerWaiver(): { posts: unknown[] } {
  const seen = { posts: [] as unknown[] };
  server.use(
    http.get('/api/waiver', () => HttpResponse.json({ waiver: { version: 3, text: TEXT_V3, guardianText: 'I sign for my child.', createdAt: '2025-01-10T12:00:00.000Z' } })),
    http.post('/api/waiver', async ({ request }) => {
      const body = (await request.json()) as { text: string; guardianText: string };
      seen.posts.push(body);
      return HttpResponse.json({ waiver: { version: 4, ...body, createdAt: '2025-03-01T12:00:00.000Z' } }, { status: 201 });
    }),
  );
  return seen;
}

async function openWaiver() {
  await renderApp('/settings/waiver', admin);
  const main = within(screen.getByRole('main'));
  await main.findByRole('heading', { level: 2, name: 'Current: version 3' });
  return main;
}

describe('WaiverAdminView', () => {
  it('shows the current version and says earlier signers keep theirs and local law decides the wording', async () => {
    answerWaiver();
    const main = await openWaiver();

    expect(main.getByRole('region', { name: 'Current waiver text' }).textContent).toBe(TEXT_V3);
    expect(main.getByText('Published 10 Jan 2025')).toBeTruthy();
    expect(main.getByText(/People who signed an earlier version keep the version they accepted/)).toBeTruthy();
    expect(main.getByText(/reviewed by someone who knows the law where you work/)).toBeTruthy();
    // Nothing to publish until the text changes.
    expect((main.getByRole('button', { name: 'Publish version 4' }) as HTMLButtonElement).disabled).toBe(true);
  });

  it('publishes a new version after confirming', async () => {
    const seen = answerWaiver();
    const user = userEvent.setup();
    const main = await openWaiver();

    await user.type(main.getByLabelText('Waiver text'), ' I will follow the boat operator.');
    await user.click(main.getByRole('button', { name: 'Publish version 4' }));
    await user.click(within(await screen.findByRole('dialog', { name: 'Publish version 4?' })).getByRole('button', { name: 'Publish' }));

    await waitFor(() => expect(seen.posts).toEqual([{ text: `${TEXT_V3} I will follow the boat operator.`, guardianText: 'I sign for my child.' }]));
    expect(await main.findByRole('heading', { level: 2, name: 'Current: version 4' })).toBeTruthy();
  });

  it('shows a text that is too short under the field', async () => {
    const seen = answerWaiver();
    server.use(http.get('/api/waiver', () => errorResponse(404, 'not_found', 'Waiver not found')));
    const user = userEvent.setup();
    await renderApp('/settings/waiver', admin);
    const main = within(screen.getByRole('main'));
    await main.findByRole('heading', { level: 2, name: 'No waiver published yet' });

    await user.type(main.getByLabelText('Waiver text'), 'Too short.');
    await user.click(main.getByRole('button', { name: 'Publish version 1' }));
    await user.click(within(await screen.findByRole('dialog', { name: 'Publish version 1?' })).getByRole('button', { name: 'Publish' }));

    expect(await main.findByText('A waiver needs more than a line')).toBeTruthy();
    expect(seen.posts).toHaveLength(0);
  });

  it('is linked from the organisation settings', async () => {
    server.use(http.get('/api/organisation/settings', () => HttpResponse.json({ settings: buildSettings() })));
    await renderApp('/settings', admin);
    const link = await screen.findByRole('link', { name: 'Waiver text and versions' });
    expect(link.getAttribute('href')).toBe('/settings/waiver');
  });
});
