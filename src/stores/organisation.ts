import { computed, ref } from 'vue';
import { defineStore } from 'pinia';
import type { LengthUnit, PublicOrganisation } from '@shared/schemas/organisation.schema';
import { fetchOrganisation } from '@/api/organisation';
import { errorMessage } from '@/utils/error-message';
import { deviceTimeZone } from '@/utils/time-zones';
import { formatLength as formatLengthIn, unitName as unitNameOf } from '@/utils/units';

/**
 * The organisation the app serves: its name and demo marker for the shell, and the display units
 * and time zone every view that shows lengths or times reads. Loaded once alongside the session.
 */
export const useOrganisationStore = defineStore('organisation', () => {
  const organisation = ref<PublicOrganisation | null>(null);
  const loaded = ref(false);
  const loadError = ref<string | null>(null);

  const name = computed(() => organisation.value?.name ?? null);
  const isDemo = computed(() => organisation.value?.isDemo ?? false);
  // Until the organisation is known, metres (how lengths are stored) and the device's zone are
  // shown: unfamiliar perhaps, but never mislabelled.
  const units = computed<LengthUnit>(() => organisation.value?.units ?? 'm');
  const timeZone = computed(() => organisation.value?.timeZone ?? deviceTimeZone());
  const unitName = computed(() => unitNameOf(units.value));

  let pending: Promise<void> | null = null;

  /** Never rejects: a failure leaves the shell working without the name or demo banner. */
  function load(): Promise<void> {
    pending ??= fetchOrganisation()
      .then((next) => {
        organisation.value = next;
        loadError.value = null;
      })
      .catch((err: unknown) => {
        loadError.value = errorMessage(err);
      })
      .finally(() => {
        loaded.value = true;
        pending = null;
      });
    return pending;
  }

  /** After an admin saves the settings, so the banner, top bar and units follow at once. */
  function setOrganisation(next: PublicOrganisation): void {
    organisation.value = { name: next.name, isDemo: next.isDemo, units: next.units, timeZone: next.timeZone, currency: next.currency };
  }

  /** A length stored in metres, in the organisation's display units. */
  function formatLength(metres: number, digits?: number): string {
    return formatLengthIn(metres, units.value, digits);
  }

  return { organisation, loaded, loadError, name, isDemo, units, timeZone, unitName, load, setOrganisation, formatLength };
});
