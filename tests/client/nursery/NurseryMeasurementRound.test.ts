import { afterEach, describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { errorResponse } from '../support/msw';
import { buildTank, buildTree, mockNursery } from '../support/nursery';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';
import { setViewport } from '../support/viewport';

const coordinator = buildUser({ role: 'coordinator' });
const tank = buildTank({ name: 'Tank B', treeCount: 3 });
const inTank = { id: tank.id, name: 'Tank B' };
const trees = [
  buildTree({ tag: 'T-0056', tank: inTank, heightCm: 36 }),
  buildTree({ tag: 'T-0057', tank: inTank, heightCm: 37 }),
  buildTree({ tag: 'T-0058', tank: inTank, heightCm: null }),
];

async function openRound(user: ReturnType<typeof userEvent.setup>) {
  await renderApp('/nursery', coordinator);
  await user.click(await screen.findByRole('tab', { name: 'Tanks' }));
  const card = within(await screen.findByRole('list', { name: 'Tanks' }));
  await user.click(card.getByRole('button', { name: 'Measure trees' }));
  return within(await screen.findByRole('form', { name: 'Measurement round for Tank B' }));
}

function mockTankTrees(): URLSearchParams[] {
  const asked: URLSearchParams[] = [];
  server.use(
    http.get('/api/trees', ({ request }) => {
      const q = new URL(request.url).searchParams;
      asked.push(q);
      return HttpResponse.json({ trees: q.get('tankId') === tank.id ? trees : [], total: q.get('tankId') === tank.id ? trees.length : 0 });
    }),
  );
  return asked;
}

describe('Measurement round for a tank', () => {
  afterEach(async () => {
    await setViewport(1024, 768);
  });

  it('gives each tree one line, moves down with Enter, and sends only the lines filled in', async () => {
    mockNursery({ tanks: [tank] });
    const asked = mockTankTrees();
    let body: unknown = null;
    server.use(
      http.post(`/api/tanks/${tank.id}/measurement-round`, async ({ request }) => {
        body = await request.json();
        return HttpResponse.json({ recorded: 2, trees: [{ ...trees[0]!, heightCm: 41.5 }, { ...trees[2]!, heightCm: 20 }] }, { status: 201 });
      }),
    );
    const user = userEvent.setup();
    const form = await openRound(user);

    expect(await form.findByText('was 36 cm')).toBeTruthy();
    expect(asked.some((q) => q.get('tankId') === tank.id && q.get('pageSize') === '500')).toBe(true);
    await user.type(form.getByLabelText('Height of T-0056 (cm)'), '41.5{Enter}');
    // Enter went down to the next tree's height, like a tally sheet.
    expect(document.activeElement).toBe(form.getByLabelText('Height of T-0057 (cm)'));
    await user.keyboard('{Enter}');
    await user.keyboard('20');
    await user.tab();
    await user.keyboard('4');
    await user.click(form.getByRole('checkbox', { name: 'T-0058 healthy' }));
    await user.type(form.getByLabelText('Health note for T-0058'), 'yellow leaves');
    await user.click(form.getByRole('button', { name: 'Save round (2 trees)' }));

    await waitFor(() =>
      expect(body).toEqual({
        measurements: [
          { treeId: trees[0]!.id, heightCm: 41.5, healthy: true },
          { treeId: trees[2]!.id, heightCm: 20, leafCount: 4, healthy: false, note: 'yellow leaves' },
        ],
      }),
    );
    expect(await form.findByText('Saved 2 measurements.')).toBeTruthy();
    expect(form.getByText('was 41.5 cm')).toBeTruthy();
    expect((form.getByLabelText('Height of T-0056 (cm)') as HTMLInputElement).value).toBe('');
  });

  it('refuses unreadable values before sending, and shows the server\'s per-tree refusals', async () => {
    mockNursery({ tanks: [tank] });
    mockTankTrees();
    let posts = 0;
    server.use(
      http.post(`/api/tanks/${tank.id}/measurement-round`, () => {
        posts += 1;
        return errorResponse(400, 'validation_failed', '1 of the trees are not in Tank B; nothing was recorded', { measurements: ['T-0057 is not in Tank B'] });
      }),
    );
    const user = userEvent.setup();
    const form = await openRound(user);

    await user.type(await form.findByLabelText('Leaf count of T-0056'), '4.5');
    await user.click(form.getByRole('button', { name: /Save round/ }));
    expect(await form.findByText('T-0056: leaf count must be a whole number')).toBeTruthy();
    expect(posts).toBe(0);

    await user.clear(form.getByLabelText('Leaf count of T-0056'));
    await user.type(form.getByLabelText('Height of T-0057 (cm)'), '40');
    await user.click(form.getByRole('button', { name: 'Save round (1 tree)' }));
    expect(await form.findByText('T-0057 is not in Tank B')).toBeTruthy();
    expect(form.getByText('The round was not saved; nothing was stored.')).toBeTruthy();
    expect(posts).toBe(1);
  });

  it('on a phone keeps each tree to one line, opening a note only when asked', async () => {
    await setViewport(375, 812);
    mockNursery({ tanks: [tank] });
    mockTankTrees();
    const user = userEvent.setup();
    const form = await openRound(user);

    await form.findByText('was 36 cm');
    expect(form.queryByLabelText('Health note for T-0056')).toBeNull();
    await user.click(form.getByRole('button', { name: 'Add a health note for T-0056' }));
    expect(document.activeElement).toBe(form.getByLabelText('Health note for T-0056'));
    await user.click(form.getByRole('checkbox', { name: 'T-0057 healthy' }));
    expect(form.getByLabelText('Health note for T-0057')).toBeTruthy();
  });
});
