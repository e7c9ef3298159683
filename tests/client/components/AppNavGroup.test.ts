import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent, { type UserEvent } from '@testing-library/user-event';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';
import { setViewport } from '../support/viewport';
import { groupPanel, mainNav } from '../support/nav';

async function tabTo(user: UserEvent, target: HTMLElement): Promise<void> {
  for (let i = 0; i < 20 && document.activeElement !== target; i += 1) await user.tab();
  expect(document.activeElement).toBe(target);
}

function focused(): string {
  return document.activeElement?.textContent?.trim() ?? '';
}

describe('a menu group in the top bar, by keyboard', () => {
  beforeEach(async () => {
    await setViewport(1280, 800);
  });
  afterEach(async () => {
    await setViewport(1024, 768);
  });

  async function setUp(): Promise<{ user: UserEvent; button: HTMLElement; panel: HTMLElement }> {
    const user = userEvent.setup();
    await renderApp('/', buildUser({ role: 'admin' }));
    await screen.findByRole('heading', { level: 2, name: 'At the water' });
    const button = within(mainNav()).getByRole('button', { name: 'Workdays' });
    return { user, button, panel: groupPanel(button) };
  }

  it('is reached with Tab, opens with Enter, and Down moves through its links', async () => {
    const { user, button, panel } = await setUp();
    await tabTo(user, button);
    expect(button.getAttribute('aria-expanded')).toBe('false');
    expect(within(mainNav()).queryByRole('link', { name: 'Fleet' })).toBeNull();

    await user.keyboard('{Enter}');
    expect(button.getAttribute('aria-expanded')).toBe('true');
    expect(within(panel).getAllByRole('link')).toHaveLength(4);

    await user.keyboard('{ArrowDown}');
    expect(focused()).toBe('Workday calendar');
    await user.keyboard('{ArrowDown}{ArrowDown}');
    expect(focused()).toBe('Manage workdays');
    await user.keyboard('{End}');
    expect(focused()).toBe('Fleet');
    await user.keyboard('{ArrowDown}');
    expect(focused()).toBe('Workday calendar');
    await user.keyboard('{ArrowUp}');
    expect(focused()).toBe('Fleet');
  });

  it('opens with Space, closes with Escape and gives focus back to its button', async () => {
    const { user, button } = await setUp();
    button.focus();

    await user.keyboard(' ');
    expect(button.getAttribute('aria-expanded')).toBe('true');
    await user.keyboard('{ArrowUp}');
    expect(focused()).toBe('Fleet');
    await user.keyboard('{Escape}');

    expect(button.getAttribute('aria-expanded')).toBe('false');
    expect(document.activeElement).toBe(button);
  });

  it('opens straight onto its first link with Down, and follows the link with Enter', async () => {
    const { user, button } = await setUp();
    button.focus();

    await user.keyboard('{ArrowDown}');
    expect(button.getAttribute('aria-expanded')).toBe('true');
    expect(focused()).toBe('Workday calendar');
    await user.keyboard('{Enter}');

    await screen.findByRole('heading', { level: 1, name: 'Workdays' });
    expect(button.getAttribute('aria-expanded')).toBe('false');
  });

  it('moves between the top-level items with Left and Right, closing the open group', async () => {
    const { user, button } = await setUp();
    button.focus();
    await user.keyboard('{Enter}');

    await user.keyboard('{ArrowRight}');
    expect(focused()).toBe('Tides & sites');
    expect(button.getAttribute('aria-expanded')).toBe('false');
    await user.keyboard('{ArrowLeft}{ArrowLeft}');
    expect(focused()).toBe('Home');
    await user.keyboard('{ArrowLeft}');
    expect(focused()).toBe('Organisation');
  });

  it('keeps one group open at a time, and closes when focus or a click goes elsewhere', async () => {
    const { user, button } = await setUp();
    const nursery = within(mainNav()).getByRole('button', { name: 'Nursery' });

    await user.click(button);
    await user.click(nursery);
    expect(button.getAttribute('aria-expanded')).toBe('false');
    expect(nursery.getAttribute('aria-expanded')).toBe('true');

    await user.click(screen.getByRole('heading', { level: 2, name: 'At the water' }));
    expect(nursery.getAttribute('aria-expanded')).toBe('false');

    nursery.focus();
    await user.keyboard('{ArrowDown}');
    await user.tab();
    await user.tab();
    await waitFor(() => expect(nursery.getAttribute('aria-expanded')).toBe('false'));
  });
});
