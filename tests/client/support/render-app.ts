import { render, type RenderResult } from '@testing-library/vue';
import { createPinia, setActivePinia, type Pinia } from 'pinia';
import { createMemoryHistory, type Router } from 'vue-router';
import type { PublicUser } from '@shared/schemas/user.schema';
import App from '@/App.vue';
import { createAppRouter } from '@/router';
import { mockMe } from './msw';

export interface RenderedApp extends RenderResult {
  router: Router;
  pinia: Pinia;
}

/** The whole app (top bar, guards, the routed view) at `path`, with the session answered by MSW. */
export async function renderApp(path: string, user: PublicUser | null): Promise<RenderedApp> {
  mockMe(user);
  const pinia = createPinia();
  setActivePinia(pinia);
  const router = createAppRouter(createMemoryHistory());
  // Navigate before mounting, or the router's install would start its own navigation to '/'.
  await router.push(path);
  const result = render(App, { global: { plugins: [pinia, router] } });
  await router.isReady();
  return { ...result, router, pinia };
}
