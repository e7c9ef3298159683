import { ref, type Ref } from 'vue';
import type { PublicUser } from '@shared/schemas/user.schema';
import { verifyEmail } from '@/api/auth';
import { useSessionStore } from '@/stores/session';
import { useAsyncAction } from './useAsyncAction';

/** Confirms an e-mail address with the token from the link we sent. */
export function useVerifyEmail(): {
  verifying: Ref<boolean>;
  error: Ref<string | null>;
  verified: Ref<PublicUser | null>;
  verify: (token: string) => Promise<void>;
} {
  const session = useSessionStore();
  const verified = ref<PublicUser | null>(null);
  const { loading, error, run } = useAsyncAction(verifyEmail, {
    invalid_token: 'This link has expired or was already used.',
    validation_failed: 'This link is incomplete. Open it again from the e-mail, or send a new one.',
  });

  async function verify(token: string): Promise<void> {
    const user = await run({ token });
    if (!user) return;
    verified.value = user;
    // Keep the top bar and My account in step when the person who verified is the one signed in.
    if (session.user?.id === user.id) session.setUser(user);
  }

  return { verifying: loading, error, verified, verify };
}
