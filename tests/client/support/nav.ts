import { screen, within } from '@testing-library/vue';
import type { UserEvent } from '@testing-library/user-event';

/** The top bar's menu landmark (present on wide screens). */
export function mainNav(): HTMLElement {
  return screen.getByRole('navigation', { name: 'Main' });
}

export function texts(elements: HTMLElement[]): string[] {
  return elements.map((element) => element.textContent?.trim() ?? '');
}

/** The menu's visible links and group buttons in the bar, in reading order (closed groups hide their links). */
export function topLevel(): string[] {
  const nav = within(mainNav());
  const controls = [...nav.queryAllByRole('link'), ...nav.queryAllByRole('button')];
  controls.sort((a, b) => (a.compareDocumentPosition(b) & Node.DOCUMENT_POSITION_FOLLOWING ? -1 : 1));
  return texts(controls);
}

/** The list a group button controls. */
export function groupPanel(button: HTMLElement): HTMLElement {
  const panel = document.getElementById(button.getAttribute('aria-controls') ?? '');
  if (!panel) throw new Error(`no list for ${button.textContent?.trim()}`);
  return panel;
}

/** Opens a group in the bar with a click and reads its links, then closes it again. */
export async function groupLinks(user: UserEvent, name: string): Promise<string[]> {
  const button = within(mainNav()).getByRole('button', { name });
  await user.click(button);
  const links = texts(within(groupPanel(button)).getAllByRole('link'));
  await user.click(button);
  return links;
}
