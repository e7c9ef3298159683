import { computed, type ComputedRef } from 'vue';
import { useSessionStore } from '@/stores/session';
import type { AppRouteName } from '@/router';

export interface NavItem {
  name: AppRouteName;
  label: string;
}

/** The menu for whoever is signed in: volunteers see their own pages, coordinators and admins also People, admins Settings. */
export function useNavItems(): ComputedRef<NavItem[]> {
  const session = useSessionStore();
  return computed(() => {
    if (!session.isSignedIn) {
      return [
        { name: 'sign-in', label: 'Sign in' },
        { name: 'register', label: 'Create an account' },
      ];
    }
    const items: NavItem[] = [
      { name: 'home', label: 'Home' },
      { name: 'sites', label: 'Sites' },
      { name: 'window-calendar', label: 'Tide calendar' },
    ];
    if (session.isCoordinator) items.push({ name: 'people', label: 'People' });
    if (session.isAdmin) items.push({ name: 'organisation-settings', label: 'Settings' });
    items.push({ name: 'account', label: 'My account' });
    return items;
  });
}
