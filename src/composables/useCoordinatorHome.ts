import { computed, ref, type ComputedRef, type Ref } from 'vue';
import type { NurseryTasksDto } from '@shared/schemas/nursery.schema';
import type { RecentSignup } from '@shared/schemas/recent-signups.schema';
import type { WorkdayDto } from '@shared/schemas/workday.schema';
import { listOpenCampaigns, type Campaign } from '@/api/campaigns';
import { fetchMonitoringDue, type MonitoringDueDto } from '@/api/monitoring';
import { fetchRecentSignups } from '@/api/signups';
import { listSites } from '@/api/sites';
import { fetchNurseryTasks } from '@/api/tanks';
import { fetchSiteReadiness } from '@/api/trees';
import { listWorkdays } from '@/api/workdays';
import { useOrganisationStore } from '@/stores/organisation';
import { localDateKey, zonedTime } from '@/utils/zoned-time';
import { useAsyncAction } from './useAsyncAction';

const UPCOMING_SHOWN = 5;
const SIGNUPS_SHOWN = 6;

export interface CoordinatorHome {
  loading: Ref<boolean>;
  error: Ref<string | null>;
  loaded: Ref<boolean>;
  reload: () => Promise<void>;
  /** The first published workday that hasn't ended. */
  next: ComputedRef<WorkdayDto | null>;
  upcoming: ComputedRef<WorkdayDto[]>;
  drafts: ComputedRef<WorkdayDto[]>;
  /** The latest sign-ups and cancellations on upcoming workdays, newest first; empty when they couldn't be read. */
  latestSignups: Ref<RecentSignup[]>;
  /** The rest of the dashboard; each part is null until loaded, or 'error' when it couldn't be. */
  extras: HomeExtras;
}

/** Trees the server judges ready for each site (held at its salinity, tall enough), out of those it judged. */
export interface SiteReadyCount {
  siteId: string;
  siteName: string;
  ready: number;
  judged: number;
}

export interface HomeExtras {
  readyBySite: Ref<SiteReadyCount[] | null | 'error'>;
  brining: Ref<NurseryTasksDto | null | 'error'>;
  monitoringDue: Ref<MonitoringDueDto | null | 'error'>;
  campaigns: Ref<Campaign[] | null | 'error'>;
}

/** Runs one part of the dashboard on its own, so a slow or failing part never holds up the others. */
async function part<T>(target: Ref<T | null | 'error'>, load: () => Promise<T>): Promise<void> {
  try {
    target.value = await load();
  } catch {
    target.value = 'error';
  }
}

async function readyBySite(): Promise<SiteReadyCount[]> {
  const sites = await listSites();
  const judged = await Promise.all(sites.map((s) => fetchSiteReadiness(s.id)));
  return judged.map((r) => ({ siteId: r.site.id, siteName: r.site.name, ready: r.trees.filter((t) => t.ready).length, judged: r.trees.length }));
}

/** "At the water": workdays from today on, drafts included, and who joined or dropped out lately. */
export function useCoordinatorHome(now: () => Date = () => new Date()): CoordinatorHome {
  const organisation = useOrganisationStore();
  const workdays = ref<WorkdayDto[]>([]);
  const latestSignups = ref<RecentSignup[]>([]);
  const loaded = ref(false);
  const extras: HomeExtras = { readyBySite: ref(null), brining: ref(null), monitoringDue: ref(null), campaigns: ref(null) };

  const live = computed(() => workdays.value.filter((w) => w.status === 'published' && Date.parse(w.endsAt) > now().getTime()));
  const next = computed(() => live.value[0] ?? null);
  const upcoming = computed(() => live.value.slice(1, 1 + UPCOMING_SHOWN));
  const drafts = computed(() => workdays.value.filter((w) => w.status === 'draft'));

  const { loading, error, run } = useAsyncAction(async () => {
    if (!organisation.loaded) await organisation.load();
    const tz = organisation.timeZone;
    return listWorkdays({ from: zonedTime(localDateKey(now(), tz), tz).toISOString() });
  });

  async function loadSignups(): Promise<void> {
    // Only a nice-to-have on the home page: a failure leaves the list out rather than the page.
    latestSignups.value = await fetchRecentSignups(SIGNUPS_SHOWN).catch(() => []);
  }

  function loadExtras(): Promise<unknown> {
    return Promise.all([
      loadSignups(),
      part(extras.readyBySite, readyBySite),
      part(extras.brining, () => fetchNurseryTasks()),
      part(extras.monitoringDue, fetchMonitoringDue),
      part(extras.campaigns, listOpenCampaigns),
    ]);
  }

  async function reload(): Promise<void> {
    const pending = loadExtras();
    const rows = await run();
    if (rows) {
      workdays.value = rows;
      loaded.value = true;
    }
    await pending;
  }

  return { loading, error, loaded, reload, next, upcoming, drafts, latestSignups, extras };
}
