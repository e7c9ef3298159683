import { beforeEach, describe, expect, it } from 'vitest';
import { createPinia, setActivePinia } from 'pinia';
import { createMemoryHistory } from 'vue-router';
import { createAppRouter } from '@/router';
import { useSessionStore } from '@/stores/session';
import { mockMe } from '../support/msw';
import { buildUser } from '../support/users';

async function navigate(path: string) {
  const router = createAppRouter(createMemoryHistory());
  await router.push(path);
  return router.currentRoute.value;
}

describe('router guards', () => {
  beforeEach(() => {
    setActivePinia(createPinia());
  });

  it('sends a signed-out visitor to sign in, with a redirect back', async () => {
    mockMe(null);

    const route = await navigate('/people?q=ana');

    expect(route.name).toBe('sign-in');
    expect(route.query.redirect).toBe('/people?q=ana');
  });

  it('sends a signed-out visitor of home to sign in without a redirect', async () => {
    mockMe(null);

    const route = await navigate('/');

    expect(route.name).toBe('sign-in');
    expect(route.query.redirect).toBeUndefined();
  });

  it('keeps volunteers out of People', async () => {
    mockMe(buildUser({ role: 'volunteer' }));

    const route = await navigate('/people');

    expect(route.name).toBe('no-access');
    expect(route.query.from).toBe('/people');
  });

  it.each(['coordinator', 'admin'] as const)('lets a %s open People', async (role) => {
    mockMe(buildUser({ role }));

    const route = await navigate('/people');

    expect(route.name).toBe('people');
  });

  it.each(['volunteer', 'coordinator'] as const)('keeps a %s out of organisation settings', async (role) => {
    mockMe(buildUser({ role }));

    const route = await navigate('/settings');

    expect(route.name).toBe('no-access');
  });

  it('lets an admin open organisation settings', async () => {
    mockMe(buildUser({ role: 'admin' }));

    const route = await navigate('/settings');

    expect(route.name).toBe('organisation-settings');
  });

  it('sends a signed-in person away from sign-in to home', async () => {
    mockMe(buildUser());

    const route = await navigate('/login');

    expect(route.name).toBe('home');
  });

  it('loads the session only once across navigations', async () => {
    let calls = 0;
    const user = buildUser();
    mockMe(user);
    const session = useSessionStore();
    const load = session.load;
    session.load = async () => {
      calls += 1;
      await load();
    };
    const router = createAppRouter(createMemoryHistory());

    await router.push('/');
    await router.push('/account');
    await router.push('/');

    expect(calls).toBe(1);
    expect(router.currentRoute.value.name).toBe('home');
  });

  it('shows the friendly not-found page for unknown paths', async () => {
    mockMe(null);

    const route = await navigate('/no/such/page');

    expect(route.name).toBe('not-found');
  });
});
