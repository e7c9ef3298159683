import { ref, type Ref } from 'vue';
import { resendVerification } from '@/api/auth';
import { useAsyncAction } from './useAsyncAction';

/** Sends a fresh confirmation link to the signed-in person's address. */
export function useResendVerification(): {
  sending: Ref<boolean>;
  error: Ref<string | null>;
  sent: Ref<boolean>;
  resend: () => Promise<void>;
} {
  const sent = ref(false);
  const { loading, error, run } = useAsyncAction(resendVerification, {
    rate_limited: 'A link was sent very recently. Wait a few minutes before asking for another.',
  });

  async function resend(): Promise<void> {
    sent.value = false;
    await run();
    sent.value = error.value === null;
  }

  return { sending: loading, error, sent, resend };
}
