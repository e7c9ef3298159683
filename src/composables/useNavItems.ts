import { computed, type ComputedRef } from 'vue';
import { useSessionStore } from '@/stores/session';
import type { AppRouteName } from '@/router';

/** The menu's groups, in the words of the job. `account` items sit with the signed-in person's name. */
export const NAV_GROUP_LABELS = {
  workdays: 'Workdays',
  tides: 'Tides & sites',
  nursery: 'Nursery',
  giving: 'Giving & reports',
  organisation: 'Organisation',
  account: 'Your account',
} as const;
export type NavGroupId = keyof typeof NAV_GROUP_LABELS;

/** One menu item. Without a group it stands on its own in the bar (like Home). */
export interface NavItem {
  name: AppRouteName;
  label: string;
  group?: NavGroupId;
}

/**
 * The menu items for who is signed in, in order: Workdays and Sponsor a tree for everyone (both are
 * public); signed in, volunteers see their own pages, coordinators and admins also the running of the
 * program, admins donations and settings. Add an item with its group: `{ name, label, group }`.
 */
export function useNavItems(): ComputedRef<NavItem[]> {
  const session = useSessionStore();
  return computed(() => {
    if (!session.isSignedIn) {
      return [
        { name: 'workday-calendar', label: 'Workdays' },
        { name: 'sponsor-campaigns', label: 'Sponsor a tree' },
        { name: 'sign-in', label: 'Sign in' },
        { name: 'register', label: 'Create an account' },
      ];
    }
    const items: NavItem[] = [
      { name: 'home', label: 'Home' },
      { name: 'workday-calendar', label: 'Workday calendar', group: 'workdays' },
      { name: 'my-workdays', label: 'My workdays', group: 'workdays' },
      { name: 'sites', label: 'Sites', group: 'tides' },
      { name: 'window-calendar', label: 'Tide calendar', group: 'tides' },
      { name: 'nursery', label: 'Nursery ledger', group: 'nursery' },
      { name: 'sponsor-campaigns', label: 'Sponsor a tree', group: 'giving' },
    ];
    if (session.isCoordinator) items.push({ name: 'workday-admin-list', label: 'Manage workdays', group: 'workdays' });
    if (session.isCoordinator) items.push({ name: 'people', label: 'People', group: 'organisation' });
    if (session.isCoordinator) items.push({ name: 'fleet', label: 'Fleet', group: 'workdays' });
    if (session.isCoordinator) items.push({ name: 'monitoring-visits', label: 'Monitoring', group: 'nursery' }, { name: 'reports', label: 'Reports', group: 'giving' });
    if (session.isAdmin) items.push({ name: 'donations', label: 'Donations', group: 'giving' });
    if (session.isAdmin) items.push({ name: 'campaigns-admin', label: 'Campaigns', group: 'giving' });
    if (session.isAdmin) items.push({ name: 'organisation-settings', label: 'Settings', group: 'organisation' });
    items.push({ name: 'account', label: 'My account', group: 'account' });
    return items;
  });
}

/** A group of the menu: a disclosure in the bar, a headed section in the phone drawer. */
export interface NavGroup {
  id: NavGroupId;
  label: string;
  items: NavItem[];
}
export type NavEntry = { kind: 'link'; item: NavItem } | { kind: 'group'; group: NavGroup };

/** The menu laid out: entries for the bar and drawer, and the items that go beside the person's name. */
export interface NavMenu {
  entries: NavEntry[];
  account: NavItem[];
}

/** Up to this many items (a volunteer's pages, the public menu) fit one row as plain links. */
export const FLAT_MENU_LIMIT = 7;

/**
 * Lays out the items: a short list stays flat; a longer one is grouped, each group standing where its
 * first item would. (The top bar shows a group of one as a plain link; the drawer keeps its heading.)
 */
export function buildNavMenu(items: NavItem[]): NavMenu {
  const account = items.filter((item) => item.group === 'account');
  const menuItems = items.filter((item) => item.group !== 'account');
  if (menuItems.length <= FLAT_MENU_LIMIT) return { entries: menuItems.map((item) => ({ kind: 'link', item })), account };
  const entries: NavEntry[] = [];
  const groups = new Map<NavGroupId, NavGroup>();
  for (const item of menuItems) {
    if (!item.group) {
      entries.push({ kind: 'link', item });
      continue;
    }
    let group = groups.get(item.group);
    if (!group) {
      group = { id: item.group, label: NAV_GROUP_LABELS[item.group], items: [] };
      groups.set(item.group, group);
      entries.push({ kind: 'group', group });
    }
    group.items.push(item);
  }
  return { entries, account };
}

export function useNavMenu(): ComputedRef<NavMenu> {
  const items = useNavItems();
  return computed(() => buildNavMenu(items.value));
}

/** Whether the page at `currentPath` belongs under a menu item at `itemPath` (itself or a page below it). */
export function isUnderNavPath(currentPath: string, itemPath: string): boolean {
  if (currentPath === itemPath) return true;
  return itemPath !== '/' && currentPath.startsWith(`${itemPath}/`);
}
