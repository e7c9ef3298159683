import { beforeEach, describe, expect, it } from 'vitest';
import { createPinia, setActivePinia } from 'pinia';
import { createMemoryHistory } from 'vue-router';
import { createAppRouter } from '@/router';
import { mockMe } from '../support/msw';
import { buildUser } from '../support/users';

async function navigate(path: string) {
  const router = createAppRouter(createMemoryHistory());
  await router.push(path);
  return router.currentRoute.value;
}

describe('workday routes', () => {
  beforeEach(() => {
    setActivePinia(createPinia());
  });

  it.each([
    ['/workdays', 'workday-calendar'],
    ['/workdays/6f1c1a52-3c5e-4a8e-9a53-1f2b3c4d5e6f', 'workday'],
  ])('lets a signed-out visitor open %s', async (path, name) => {
    mockMe(null);

    expect((await navigate(path)).name).toBe(name);
  });

  it.each([
    ['/my/workdays', 'my-workdays'],
    ['/my/hours', 'my-hours'],
  ])('asks a signed-out visitor to sign in for %s, then returns there', async (path, name) => {
    mockMe(null);
    const route = await navigate(path);
    expect(route.name).toBe('sign-in');
    expect(route.query.redirect).toBe(path);

    setActivePinia(createPinia());
    mockMe(buildUser());
    expect((await navigate(path)).name).toBe(name);
  });
});
