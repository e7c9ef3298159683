import {
  createRouter,
  createWebHistory,
  useRouter,
  type LocationQueryRaw,
  type RouteParamsRawGeneric,
  type RouteRecordRaw,
  type Router,
  type RouterHistory,
} from 'vue-router';
import type { Role } from '@shared/schemas/user.schema';
import { installGuards } from './guards';

declare module 'vue-router' {
  interface RouteMeta {
    /** Signed-out visitors are sent to sign in, with `?redirect=` back here. */
    requiresAuth?: boolean;
    /** Only these roles may open the page (implies requiresAuth). */
    roles?: readonly Role[];
    /** Sign-in and register: signed-in people go home instead. */
    guestOnly?: boolean;
    /** Shown in the browser tab before " · Ebbroot". */
    title?: string;
  }
}

/** Every route name; renaming a route breaks the build wherever it is linked. */
export type AppRouteName =
  | 'home'
  | 'sign-in'
  | 'register'
  | 'forgot-password'
  | 'reset-password'
  | 'verify-email'
  | 'people'
  | 'sites'
  | 'site-new'
  | 'site-edit'
  | 'site-tide'
  | 'window-calendar'
  | 'nursery'
  | 'nursery-tree'
  | 'account'
  | 'organisation-settings'
  | 'waiver-admin'
  | 'workday-admin-list'
  | 'workday-new'
  | 'workday-edit'
  | 'workday-manage'
  | 'workday-roster'
  | 'workday-check-in'
  | 'workday-trips'
  | 'workday-planting'
  | 'monitoring-visits'
  | 'monitoring-visit'
  | 'reports'
  | 'fleet'
  | 'workday-calendar'
  | 'workday'
  | 'my-workdays'
  | 'my-hours'
  | 'sponsor-campaigns'
  | 'sponsor-thanks'
  | 'sponsor'
  | 'campaigns-admin'
  | 'donations'
  | 'no-access'
  | 'not-found';

type AppRouteRecord = RouteRecordRaw & { name: AppRouteName };

export const routes: AppRouteRecord[] = [
  { path: '/', name: 'home', component: () => import('@/views/HomeView.vue'), meta: { requiresAuth: true, title: 'Home' } },
  { path: '/login', name: 'sign-in', component: () => import('@/views/SignInView.vue'), meta: { guestOnly: true, title: 'Sign in' } },
  { path: '/register', name: 'register', component: () => import('@/views/RegisterView.vue'), meta: { guestOnly: true, title: 'Create an account' } },
  { path: '/forgot-password', name: 'forgot-password', component: () => import('@/views/ForgotPasswordView.vue'), meta: { title: 'Forgot password' } },
  { path: '/reset-password', name: 'reset-password', component: () => import('@/views/ResetPasswordView.vue'), meta: { title: 'Choose a new password' } },
  { path: '/verify-email', name: 'verify-email', component: () => import('@/views/VerifyEmailView.vue'), meta: { title: 'Confirm your e-mail' } },
  {
    path: '/people',
    name: 'people',
    component: () => import('@/views/PeopleView.vue'),
    meta: { requiresAuth: true, roles: ['coordinator', 'admin'], title: 'People' },
  },
  {
    path: '/settings',
    name: 'organisation-settings',
    component: () => import('@/views/OrganisationSettingsView.vue'),
    meta: { requiresAuth: true, roles: ['admin'], title: 'Organisation settings' },
  },
  {
    path: '/settings/waiver',
    name: 'waiver-admin',
    component: () => import('@/views/WaiverAdminView.vue'),
    meta: { requiresAuth: true, roles: ['admin'], title: 'Waiver' },
  },
  {
    path: '/workdays/manage',
    name: 'workday-admin-list',
    component: () => import('@/views/WorkdayManageListView.vue'),
    meta: { requiresAuth: true, roles: ['coordinator', 'admin'], title: 'Manage workdays' },
  },
  {
    path: '/workdays/new',
    name: 'workday-new',
    component: () => import('@/views/WorkdayFormView.vue'),
    meta: { requiresAuth: true, roles: ['coordinator', 'admin'], title: 'New workday' },
  },
  {
    path: '/workdays/:id/edit',
    name: 'workday-edit',
    component: () => import('@/views/WorkdayFormView.vue'),
    meta: { requiresAuth: true, roles: ['coordinator', 'admin'], title: 'Edit workday' },
  },
  {
    path: '/workdays/:id/manage',
    name: 'workday-manage',
    component: () => import('@/views/WorkdayManageView.vue'),
    meta: { requiresAuth: true, roles: ['coordinator', 'admin'], title: 'Manage workday' },
  },
  {
    path: '/workdays/:id/roster',
    name: 'workday-roster',
    component: () => import('@/views/WorkdayRosterView.vue'),
    meta: { requiresAuth: true, roles: ['coordinator', 'admin'], title: 'Roster' },
  },
  {
    path: '/workdays/:id/check-in',
    name: 'workday-check-in',
    component: () => import('@/views/WorkdayCheckInView.vue'),
    meta: { requiresAuth: true, roles: ['coordinator', 'admin'], title: 'Check-in' },
  },
  {
    path: '/workdays/:id/trips',
    name: 'workday-trips',
    component: () => import('@/views/TripBoardView.vue'),
    meta: { requiresAuth: true, roles: ['coordinator', 'admin'], title: 'Trip plan' },
  },
  {
    path: '/workdays/:id/planting',
    name: 'workday-planting',
    component: () => import('@/views/WorkdayPlantingView.vue'),
    meta: { requiresAuth: true, roles: ['coordinator', 'admin'], title: 'Record planting' },
  },
  {
    path: '/monitoring',
    name: 'monitoring-visits',
    component: () => import('@/views/MonitoringVisitsView.vue'),
    meta: { requiresAuth: true, roles: ['coordinator', 'admin'], title: 'Monitoring' },
  },
  {
    path: '/monitoring/:id',
    name: 'monitoring-visit',
    component: () => import('@/views/MonitoringVisitView.vue'),
    meta: { requiresAuth: true, roles: ['coordinator', 'admin'], title: 'Monitoring visit' },
  },
  {
    path: '/reports',
    name: 'reports',
    component: () => import('@/views/ReportsView.vue'),
    meta: { requiresAuth: true, roles: ['coordinator', 'admin'], title: 'Reports' },
  },
  {
    path: '/fleet',
    name: 'fleet',
    component: () => import('@/views/FleetView.vue'),
    meta: { requiresAuth: true, roles: ['coordinator', 'admin'], title: 'Fleet' },
  },
  { path: '/sites', name: 'sites', component: () => import('@/views/SitesView.vue'), meta: { requiresAuth: true, title: 'Sites' } },
  {
    path: '/sites/new',
    name: 'site-new',
    component: () => import('@/views/SiteFormView.vue'),
    meta: { requiresAuth: true, roles: ['coordinator', 'admin'], title: 'New site' },
  },
  {
    path: '/sites/:id/edit',
    name: 'site-edit',
    component: () => import('@/views/SiteFormView.vue'),
    meta: { requiresAuth: true, roles: ['coordinator', 'admin'], title: 'Edit site' },
  },
  { path: '/sites/:id', name: 'site-tide', component: () => import('@/views/SiteTideView.vue'), meta: { requiresAuth: true, title: 'Tide board' } },
  // Everyone signed in reads the ledger; coordinators and admins get the write controls.
  { path: '/nursery', name: 'nursery', component: () => import('@/views/NurseryView.vue'), meta: { requiresAuth: true, title: 'Nursery' } },
  // Printed QR labels point here: the ledger with this tree's drawer open.
  { path: '/nursery/trees/:id', name: 'nursery-tree', component: () => import('@/views/NurseryView.vue'), meta: { requiresAuth: true, title: 'Tree' } },
  { path: '/windows', name: 'window-calendar', component: () => import('@/views/WindowCalendarView.vue'), meta: { requiresAuth: true, title: 'Tide calendar' } },
  // Public: anyone may browse workdays and open one; signing up asks them to sign in.
  { path: '/workdays', name: 'workday-calendar', component: () => import('@/views/WorkdayCalendarView.vue'), meta: { title: 'Workdays' } },
  { path: '/workdays/:id', name: 'workday', component: () => import('@/views/WorkdayView.vue'), meta: { title: 'Workday' } },
  { path: '/my/workdays', name: 'my-workdays', component: () => import('@/views/MyWorkdaysView.vue'), meta: { requiresAuth: true, title: 'My workdays' } },
  { path: '/my/hours', name: 'my-hours', component: () => import('@/views/MyHoursView.vue'), meta: { requiresAuth: true, title: 'My hours' } },
  // Public: donors need no account. The thank-you path is listed before /sponsor/:campaignId so it isn't taken for an id.
  { path: '/sponsor', name: 'sponsor-campaigns', component: () => import('@/views/SponsorCampaignsView.vue'), meta: { title: 'Sponsor a tree' } },
  { path: '/sponsor/thanks', name: 'sponsor-thanks', component: () => import('@/views/SponsorThanksView.vue'), meta: { title: 'Thank you' } },
  { path: '/sponsor/:campaignId', name: 'sponsor', component: () => import('@/views/SponsorView.vue'), meta: { title: 'Sponsor a tree' } },
  {
    path: '/settings/campaigns',
    name: 'campaigns-admin',
    component: () => import('@/views/CampaignsAdminView.vue'),
    meta: { requiresAuth: true, roles: ['admin'], title: 'Campaigns' },
  },
  { path: '/donations', name: 'donations', component: () => import('@/views/DonationsView.vue'), meta: { requiresAuth: true, roles: ['admin'], title: 'Donations' } },
  { path: '/account', name: 'account', component: () => import('@/views/AccountView.vue'), meta: { requiresAuth: true, title: 'My account' } },
  { path: '/no-access', name: 'no-access', component: () => import('@/views/NoAccessView.vue'), meta: { requiresAuth: true, title: 'Not for your role' } },
  { path: '/:pathMatch(.*)*', name: 'not-found', component: () => import('@/views/NotFoundView.vue'), meta: { title: 'Page not found' } },
];

/** A location by route name only, so links and pushes cannot point at a path that doesn't exist. */
export interface AppLocation {
  name: AppRouteName;
  params?: RouteParamsRawGeneric;
  query?: LocationQueryRaw;
  hash?: string;
}

/** The app's router with its guards; tests pass `createMemoryHistory()`. */
export function createAppRouter(history: RouterHistory = createWebHistory()): Router {
  const router = createRouter({
    history,
    routes,
    scrollBehavior: (_to, _from, saved) => saved ?? { top: 0 },
  });
  installGuards(router);
  return router;
}

/** Typed navigation for components: `const { push } = useAppRouter(); push({ name: 'people' })`. */
export function useAppRouter(): {
  push: (to: AppLocation) => Promise<unknown>;
  replace: (to: AppLocation) => Promise<unknown>;
} {
  const router = useRouter();
  return {
    push: (to) => router.push(to),
    replace: (to) => router.replace(to),
  };
}
