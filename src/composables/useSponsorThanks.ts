import { onBeforeUnmount, ref, type Ref } from 'vue';
import { fetchThanks, type DonationThanks } from '@/api/donations';
import { ApiError } from '@/api/http';
import { errorMessage } from '@/utils/error-message';

export interface SponsorThanksOptions {
  /** Time between checks while the payment's webhook has not landed yet. */
  intervalMs?: number;
  /** Checks before giving up and pointing to the e-mailed receipt (20 × 1.5 s ≈ 30 s). */
  attempts?: number;
}

export interface SponsorThanks {
  thanks: Ref<DonationThanks | null>;
  /** Still asking whether the gift is recorded. */
  waiting: Ref<boolean>;
  /** Stopped asking without seeing the gift recorded. */
  gaveUp: Ref<boolean>;
  error: Ref<string | null>;
}

/**
 * The thank-you page's view of a checkout. The gift is recorded from the payment provider's webhook,
 * which may land a moment after the donor is sent back here, so this asks again until it has.
 */
export function useSponsorThanks(sessionId: string, options: SponsorThanksOptions = {}): SponsorThanks {
  const intervalMs = options.intervalMs ?? 1500;
  const attempts = options.attempts ?? 20;
  const thanks = ref<DonationThanks | null>(null);
  const waiting = ref(true);
  const gaveUp = ref(false);
  const error = ref<string | null>(null);
  let timer: ReturnType<typeof setTimeout> | undefined;
  let stopped = false;
  let tries = 0;

  async function check(): Promise<void> {
    tries += 1;
    try {
      thanks.value = await fetchThanks(sessionId);
      error.value = null;
    } catch (err) {
      error.value = errorMessage(err, { not_found: "We couldn't find this checkout. If you paid, your receipt will still arrive by e-mail." });
      // An unknown or malformed session stays so (any 4xx); a dropped connection or a 5xx is worth another try.
      if (err instanceof ApiError && err.status >= 400 && err.status < 500) return finish(false);
    }
    if (stopped) return;
    if (thanks.value?.recorded) return finish(false);
    if (tries >= attempts) return finish(true);
    timer = setTimeout(() => void check(), intervalMs);
  }

  function finish(timedOut: boolean): void {
    waiting.value = false;
    gaveUp.value = timedOut;
  }

  onBeforeUnmount(() => {
    stopped = true;
    clearTimeout(timer);
  });

  void check();
  return { thanks, waiting, gaveUp, error };
}
