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

const id = '7c9e6679-7425-40de-944b-e07fc1f90ae7';

describe('coordinator workday routes', () => {
  beforeEach(() => {
    setActivePinia(createPinia());
  });

  it.each(['/workdays/manage', '/workdays/new', `/workdays/${id}/edit`, `/workdays/${id}/manage`, `/workdays/${id}/roster`, `/workdays/${id}/check-in`, '/settings/waiver'])(
    'keeps volunteers out of %s',
    async (path) => {
      mockMe(buildUser({ role: 'volunteer' }));
      expect((await navigate(path)).name).toBe('no-access');
    },
  );

  it.each([
    ['/workdays/manage', 'workday-admin-list'],
    ['/workdays/new?siteId=x', 'workday-new'],
    [`/workdays/${id}/roster`, 'workday-roster'],
    [`/workdays/${id}/check-in`, 'workday-check-in'],
  ])('lets a coordinator open %s', async (path, name) => {
    mockMe(buildUser({ role: 'coordinator' }));
    expect((await navigate(path)).name).toBe(name);
  });

  it('keeps the waiver page to admins', async () => {
    mockMe(buildUser({ role: 'coordinator' }));
    expect((await navigate('/settings/waiver')).name).toBe('no-access');
    setActivePinia(createPinia());
    mockMe(buildUser({ role: 'admin' }));
    expect((await navigate('/settings/waiver')).name).toBe('waiver-admin');
  });
});
