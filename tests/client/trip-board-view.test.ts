import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { errorResponse } from './support/msw';
import { renderApp } from './support/render-app';
import { buildUser } from './support/users';
import { IDS, buildBoardWorkday, buildStoredPlan, mockBoard } from './trip-board-data';

const coordinator = buildUser({ role: 'coordinator' });

async function openBoard(options: Parameters<typeof mockBoard>[1] = {}) {
  const workday = buildBoardWorkday();
  const seen = mockBoard(workday, options);
  await renderApp(`/workdays/${workday.id}/trips`, coordinator);
  const main = within(screen.getByRole('main'));
  await main.findByRole('heading', { level: 1, name: 'Trip plan: Planting at Heron Cove' });
  return { main, seen, workday };
}

describe('TripBoardView', () => {
  it('shows one lane per craft with its runs in time order, loads against the rating and the idle craft with its reason', async () => {
    const { main, workday } = await openBoard();

    const skiff = within(await main.findByRole('region', { name: 'Skimmer' }));
    expect(skiff.getByText(/Skiff · 5 seats · rated 900 lb · 8 pot slots · needs a boat operator/)).toBeTruthy();
    expect(skiff.getAllByRole('article').map((a) => a.getAttribute('aria-label'))).toEqual(['Skimmer run 1', 'Skimmer run 2']);
    // 384 kg of 408.2 kg = 94 %; 384 kg = 847 lb and 408.2 kg = 900 lb (1 lb = 0.45359237 kg exactly).
    const load = skiff.getByRole('meter', { name: 'Load on Skimmer run 1' });
    expect(load.getAttribute('aria-valuenow')).toBe('94');
    expect(load.getAttribute('aria-valuetext')).toMatch(/^847 lb of 900 lb rated · 94 %\. Plan limit 100 % of the rating\.$/);
    // 08:00 EDT is 12:00Z; the second run leaves at 08:29 and, as the last, is back after the close.
    const second = within(skiff.getByRole('article', { name: 'Skimmer run 2' }));
    expect(second.getByText('Leaves').parentElement?.textContent).toMatch(/Leaves 08:29/);
    expect(second.getByText('Back').parentElement?.textContent).toMatch(/Back 11:07/);

    const canoe = within(main.getByRole('region', { name: 'Tarpon' }));
    expect(canoe.getByRole('meter', { name: 'Load on Tarpon run 1' }).getAttribute('aria-valuetext')).toMatch(/65 %\. Plan limit 70 % of the rating/);
    expect(canoe.getByText('Minor, with Dev Patel')).toBeTruthy();
    expect(within(main.getByRole('region', { name: 'Ibis' })).getByText('Not going out: Ibis needs an adult with the paddler skill; there is none on the crew')).toBeTruthy();

    expect(main.getByText('Proven best')).toBeTruthy();
    expect(main.getByText('17 of 18 pots on a run · last pot lands 08:36 · window closes 11:00 · 3 runs')).toBeTruthy();
    expect(main.getByText('1 pot stays ashore: every pot slot on Skimmer and Tarpon is taken')).toBeTruthy();
    expect(main.getByRole('img', { name: /window closes at 11:00; the last pot lands at 08:36/ })).toBeTruthy();
    expect(main.getByRole('link', { name: 'Trip sheet (PDF)' }).getAttribute('href')).toBe(`/api/workdays/${workday.id}/trip-plan/sheet.pdf`);
    expect(main.getByRole('link', { name: 'Float plan (PDF)' }).getAttribute('href')).toBe(`/api/workdays/${workday.id}/trip-plan/float-plan.pdf`);
    expect(main.getByRole('link', { name: 'Float plan (PDF)' }).hasAttribute('download')).toBe(true);
  });

  it('carries the cautions, defers to rules and the operator, and never calls the plan safe', async () => {
    const { main } = await openBoard();
    await main.findByRole('region', { name: 'Skimmer' });
    const cautions = within(main.getByRole('complementary', { name: 'Before the first run' }));
    for (const text of [/life jacket \(PFD\)/, /Float plan:/, /first thunder/, /Heat:/, /Soft mud/, /licensed operator’s judgement come before this plan/]) {
      expect(cautions.getByText(text)).toBeTruthy();
    }
    expect(screen.getByRole('main').textContent).not.toMatch(/\bsafe\b/i);
  });

  it('builds a plan when there is none yet', async () => {
    const { main, seen } = await openBoard({ plan: null });
    expect(await main.findByText(/No plan yet/)).toBeTruthy();
    expect(main.queryByRole('link', { name: 'Trip sheet (PDF)' })).toBeNull();

    await userEvent.setup().click(main.getByRole('button', { name: 'Build plan' }));

    await waitFor(() => expect(seen.built).toEqual([{}]));
    expect(await main.findByRole('region', { name: 'Skimmer' })).toBeTruthy();
    expect(main.getByRole('button', { name: 'Re-plan' })).toBeTruthy();
  });

  it('moves a person with the Move menu and saves the runs with PUT', async () => {
    const { main, seen } = await openBoard();
    const user = userEvent.setup();
    await user.click(await main.findByRole('button', { name: 'Move Cleo Marsh to…' }));
    await user.click(await screen.findByRole('menuitem', { name: 'Tarpon run 1 (leaves 08:00)' }));

    await waitFor(() => expect(seen.saved).toHaveLength(1));
    const runs = seen.saved[0]!.runs;
    expect(runs.find((r) => r.craftId === IDS.skiff && r.run === 1)?.people).toEqual([IDS.ana]);
    expect(runs.find((r) => r.craftId === IDS.canoe)?.people).toEqual([IDS.ben, IDS.dev, IDS.eli, IDS.cleo]);
    expect(await main.findByText('Edited by hand')).toBeTruthy();
    expect(main.getAllByRole('status').map((s) => s.textContent)).toContain('Saved: moving Cleo Marsh from Skimmer run 1 to Tarpon run 1.');
    // Keyboard focus follows the person to their new run.
    const moved = within(main.getByRole('article', { name: 'Tarpon run 1' })).getByRole('button', { name: 'Move Cleo Marsh to…' });
    await waitFor(() => expect(document.activeElement).toBe(moved));
  });

  it('shows the rules a refused edit breaks beside the run, craft or plan the server files them under', async () => {
    // As the server answers (see TripPlanRefusal): messages in names, each under the body path
    // it concerns; `runs` repeats them all. Placement reads the paths, never the text: the first
    // message names Skimmer run 1 yet belongs beside Tarpon run 1.
    const refuse = (body: { runs: { craftId: string; run: number }[] }) => {
      const canoe = body.runs.findIndex((r) => r.craftId === IDS.canoe && r.run === 1);
      const seats = 'Tarpon run 1 carries 4 people but has 3 seats (Cleo Marsh came from Skimmer run 1)';
      const paddler = 'Tarpon needs an adult with the paddler skill aboard every run; none is';
      const plan = 'The runs carry 19 pots but only 18 are ready';
      return errorResponse(400, 'validation_failed', 'The edited plan breaks a rule', {
        runs: [seats, paddler, plan],
        [`runs.${canoe}`]: [seats],
        [`runs.${canoe}.craftId`]: [paddler],
        _: [plan],
      });
    };
    const { main, seen } = await openBoard({ onSave: refuse });
    const user = userEvent.setup();
    await user.click(await main.findByRole('button', { name: 'Move Cleo Marsh to…' }));
    await user.click(await screen.findByRole('menuitem', { name: /Tarpon run 1/ }));

    await waitFor(() => expect(seen.saved).toHaveLength(1));
    const alert = await main.findByText('Not saved: moving Cleo Marsh from Skimmer run 1 to Tarpon run 1 breaks a rule. The plan is as it was.');
    expect(alert).toBeTruthy();
    const run = within(main.getByRole('article', { name: 'Tarpon run 1' }));
    expect(run.getByRole('alert').textContent).toBe('Tarpon run 1 carries 4 people but has 3 seats (Cleo Marsh came from Skimmer run 1)');
    expect(within(main.getByRole('article', { name: 'Skimmer run 1' })).queryByRole('alert')).toBeNull();
    const lane = within(main.getByRole('region', { name: 'Tarpon' }));
    expect(lane.getByText('Tarpon needs an adult with the paddler skill aboard every run; none is')).toBeTruthy();
    expect(main.getByText('The runs carry 19 pots but only 18 are ready')).toBeTruthy();
    // Each message shows once, in its place.
    expect(main.getAllByText(/carries 4 people/)).toHaveLength(1);
    // Nothing moved: Cleo is still aboard the skiff, and the canoe still shows three aboard.
    expect(within(main.getByRole('list', { name: 'Aboard Skimmer run 1' })).getByText('Cleo Marsh')).toBeTruthy();
    expect(run.getByText('Aboard: 3 of 3 seats')).toBeTruthy();
  });

  it('takes a pot from ashore with the stepper', async () => {
    const { main, seen } = await openBoard();
    const user = userEvent.setup();
    const canoe = within(await main.findByRole('article', { name: 'Tarpon run 1' }));
    expect(canoe.getByText('1 of 6 slots')).toBeTruthy();
    // The skiff's runs are full (8 of 8 slots): no room for another pot.
    const skiffRun = within(main.getByRole('article', { name: 'Skimmer run 1' }));
    expect(skiffRun.getByRole('button', { name: 'One pot more: Pots on Skimmer run 1' }).hasAttribute('disabled')).toBe(true);

    await user.click(canoe.getByRole('button', { name: 'One pot more: Pots on Tarpon run 1' }));

    await waitFor(() => expect(seen.saved).toHaveLength(1));
    expect(seen.saved[0]!.runs.map((r) => r.pots)).toEqual([8, 2, 8]);
    expect(await canoe.findByText('2 of 6 slots')).toBeTruthy();
  });

  it('asks before re-planning over hand edits', async () => {
    const edited = buildStoredPlan({ status: 'feasible' });
    const { main, seen } = await openBoard({ plan: { ...edited, source: 'edited' } });
    const user = userEvent.setup();
    await user.click(await main.findByRole('button', { name: 'Re-plan' }));
    const dialog = within(await screen.findByRole('dialog', { name: 'Re-plan from scratch?' }));
    await user.click(dialog.getByRole('button', { name: 'Keep my changes' }));
    expect(seen.built).toHaveLength(0);

    await user.click(main.getByRole('button', { name: 'Re-plan' }));
    await user.click(within(await screen.findByRole('dialog', { name: 'Re-plan from scratch?' })).getByRole('button', { name: 'Re-plan' }));
    await waitFor(() => expect(seen.built).toHaveLength(1));
  });

  it('says plainly when nothing fits', async () => {
    const { main } = await openBoard({
      plan: buildStoredPlan({
        status: 'infeasible', runs: [], lastLandingAt: null,
        unplaced: { pots: 18, potReasons: [{ count: 18, reason: 'window-too-short', detail: 'no craft can be unloaded before the window closes' }], people: [{ id: IDS.ben, reason: 'no-craft', detail: 'no craft can go out' }] },
      }),
    });
    expect(await main.findByText('Nothing fits')).toBeTruthy();
    expect(main.getByText('18 pots stay ashore: no craft can be unloaded before the window closes')).toBeTruthy();
    expect(main.getByText('Ben Okoro stays ashore: no craft can go out')).toBeTruthy();
    expect(main.getByText('0 of 18 pots on a run · no pot goes out · window closes 11:00 · 0 runs')).toBeTruthy();
  });
});
