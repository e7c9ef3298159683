import { reactive, ref, type Ref } from 'vue';
import type { LengthUnit } from '@shared/schemas/organisation.schema';
import { CreateSiteBody, UpdateSiteBody, type Site } from '@shared/schemas/site.schema';
import type { StationSummary } from '@shared/schemas/tide.schema';
import { createSite, fetchSite, updateSite } from '@/api/sites';
import { fetchStation } from '@/api/stations';
import { useOrganisationStore } from '@/stores/organisation';
import { emptySiteForm, formToCreateBody, formToUpdateBody, siteToForm, withSavedDefaults, type SiteForm } from '@/utils/site-form';
import { useAsyncAction } from './useAsyncAction';
import { useFormSubmit } from './useFormSubmit';

export interface SiteFormState {
  form: SiteForm;
  /** The units the form's boxes are in, fixed when the form is filled. */
  units: Ref<LengthUnit>;
  station: Ref<StationSummary | null>;
  ready: Ref<boolean>;
  loading: Ref<boolean>;
  loadError: Ref<string | null>;
  load: () => Promise<void>;
  fieldErrors: Ref<Record<string, string>>;
  formError: Ref<string | null>;
  saving: Ref<boolean>;
  /** Resolves to the saved site, or null when it was not saved (the errors say why). */
  save: () => Promise<Site | null>;
}

const MESSAGES = {
  conflict: 'Another site already has this name. Choose a different one.',
  validation_failed: 'Some answers need another look.',
};

/** The new-site and edit-site form: fills in from the organisation's defaults or the saved site, then saves. */
export function useSiteForm(siteId: string | null): SiteFormState {
  const organisation = useOrganisationStore();
  const units = ref<LengthUnit>(organisation.units);
  const form = reactive<SiteForm>(emptySiteForm(organisation.timeZone, units.value));
  let initial: SiteForm = { ...form };
  let savedSite: Site | null = null;
  const station = ref<StationSummary | null>(null);
  const ready = ref(false);

  const { loading, error: loadError, run } = useAsyncAction(async () => {
    // Boxes show the organisation's units, so wait for it before filling them.
    if (!organisation.loaded) await organisation.load();
    units.value = organisation.units;
    if (siteId === null) {
      Object.assign(form, emptySiteForm(organisation.timeZone, units.value));
      return;
    }
    const site = await fetchSite(siteId);
    savedSite = site;
    Object.assign(form, siteToForm(site, units.value));
    initial = { ...form };
    // The station's name and attribution are only shown, so a failure here doesn't stop editing.
    station.value = await fetchStation(site.stationId, units.value).catch(() => null);
  }, { not_found: "This site wasn't found. It may have been removed." });

  async function load(): Promise<void> {
    ready.value = false;
    await run();
    ready.value = loadError.value === null;
  }

  const saved = ref<Site | null>(null);
  const options = { messages: MESSAGES, fieldFor: { conflict: 'name' } } as const;
  const { fieldErrors, formError, submitting, submit } =
    siteId === null
      ? useFormSubmit(CreateSiteBody, async (body) => {
          saved.value = await createSite(body);
        }, options)
      : useFormSubmit(UpdateSiteBody, async (body) => {
          saved.value = await updateSite(siteId, body);
        }, options);

  async function save(): Promise<Site | null> {
    saved.value = null;
    const changes = siteId === null ? formToCreateBody(form, units.value) : formToUpdateBody(form, initial, units.value);
    const body = savedSite ? withSavedDefaults(changes, savedSite) : changes;
    if (!(await submit(body))) return null;
    initial = { ...form };
    if (saved.value) savedSite = saved.value;
    return saved.value;
  }

  return { form, units, station, ready, loading, loadError, load, fieldErrors, formError, saving: submitting, save };
}
