import { computed, type ComputedRef } from 'vue';
import { useSessionStore } from '@/stores/session';
import type { AppRouteName } from '@/router';

export interface NavItem {
  name: AppRouteName;
  label: string;
}

/**
 * The menu: Workdays for everyone (the calendar is public); signed in, volunteers see their own pages,
 * coordinators and admins also People, admins Settings.
 */
export function useNavItems(): ComputedRef<NavItem[]> {
  const session = useSessionStore();
  return computed(() => {
    if (!session.isSignedIn) {
      return [
        { name: 'workday-calendar', label: 'Workdays' },
        { name: 'sign-in', label: 'Sign in' },
        { name: 'register', label: 'Create an account' },
      ];
    }
    const items: NavItem[] = [
      { name: 'home', label: 'Home' },
      { name: 'workday-calendar', label: 'Workdays' },
      { name: 'my-workdays', label: 'My workdays' },
      { name: 'sites', label: 'Sites' },
      { name: 'window-calendar', label: 'Tide calendar' },
      { name: 'nursery', label: 'Nursery' },
    ];
    if (session.isCoordinator) items.push({ name: 'workday-admin-list', label: 'Manage workdays' });
    if (session.isCoordinator) items.push({ name: 'people', label: 'People' });
    if (session.isAdmin) items.push({ name: 'organisation-settings', label: 'Settings' });
    items.push({ name: 'account', label: 'My account' });
    return items;
  });
}
