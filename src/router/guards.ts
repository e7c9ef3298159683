import type { Router } from 'vue-router';
import { useOrganisationStore } from '@/stores/organisation';
import { useSessionStore } from '@/stores/session';

/** Loads the session once before the first navigation, then keeps each page to the people it is for. */
export function installGuards(router: Router): void {
  router.beforeEach(async (to) => {
    const session = useSessionStore();
    if (!session.loaded) {
      // The organisation (name, demo marker, units) loads alongside the session, but the first page
      // doesn't wait for it: if it is slow or fails, the shell still works and fills in when it arrives.
      const organisation = useOrganisationStore();
      if (!organisation.loaded) void organisation.load();
      await session.load();
    }

    const { requiresAuth, roles, guestOnly } = to.meta;
    if (guestOnly && session.isSignedIn) return { name: 'home' };
    if ((requiresAuth || roles) && !session.isSignedIn) {
      return { name: 'sign-in', query: to.fullPath === '/' ? {} : { redirect: to.fullPath } };
    }
    if (roles && !session.hasRole(roles)) return { name: 'no-access', query: { from: to.fullPath } };
    return true;
  });

  router.afterEach((to) => {
    if (typeof document !== 'undefined') {
      document.title = to.meta.title ? `${to.meta.title} · Ebbroot` : 'Ebbroot';
    }
  });
}
