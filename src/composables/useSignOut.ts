import type { Ref } from 'vue';
import { useAppRouter } from '@/router';
import { useSessionStore } from '@/stores/session';
import { useAsyncAction } from './useAsyncAction';

/** Signs out, then shows the sign-in page; the error (if any) is for the caller to show. */
export function useSignOut(): { signingOut: Ref<boolean>; signOutError: Ref<string | null>; signOut: () => Promise<void> } {
  const session = useSessionStore();
  const { replace } = useAppRouter();
  const { loading, error, run } = useAsyncAction(async () => {
    await session.logout();
    await replace({ name: 'sign-in' });
  });
  return {
    signingOut: loading,
    signOutError: error,
    signOut: async () => {
      await run();
    },
  };
}
