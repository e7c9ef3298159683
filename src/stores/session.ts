import { computed, ref } from 'vue';
import { defineStore } from 'pinia';
import type { LoginBody, RegisterBody } from '@shared/schemas/auth.schema';
import type { PublicUser, Role } from '@shared/schemas/user.schema';
import * as authApi from '@/api/auth';
import { ApiError } from '@/api/http';

/** Who is signed in; shared by the router guard, the top bar and every view that depends on the role. */
export const useSessionStore = defineStore('session', () => {
  const user = ref<PublicUser | null>(null);
  const loaded = ref(false);
  /** Set when the session could not be checked at all (server unreachable), not when signed out. */
  const loadError = ref<string | null>(null);

  const isSignedIn = computed(() => user.value !== null);
  const role = computed<Role | null>(() => user.value?.role ?? null);
  const isAdmin = computed(() => role.value === 'admin');
  /** Coordinators and admins run the program; admins can do everything coordinators can. */
  const isCoordinator = computed(() => role.value === 'coordinator' || role.value === 'admin');

  function hasRole(roles: readonly Role[]): boolean {
    return role.value !== null && roles.includes(role.value);
  }

  async function load(): Promise<void> {
    try {
      user.value = await authApi.fetchMe();
      loadError.value = null;
    } catch (err) {
      user.value = null;
      loadError.value = err instanceof ApiError && err.status === 401 ? null : describeLoadError(err);
    } finally {
      loaded.value = true;
    }
  }

  async function login(body: LoginBody): Promise<PublicUser> {
    user.value = await authApi.login(body);
    return user.value;
  }

  async function register(body: RegisterBody): Promise<PublicUser> {
    user.value = await authApi.register(body);
    return user.value;
  }

  async function logout(): Promise<void> {
    try {
      await authApi.logout();
    } finally {
      user.value = null;
    }
  }

  function setUser(next: PublicUser | null): void {
    user.value = next;
  }

  return { user, loaded, loadError, isSignedIn, role, isAdmin, isCoordinator, hasRole, load, login, register, logout, setUser };
});

function describeLoadError(err: unknown): string {
  return err instanceof ApiError ? err.message : 'Could not check whether you are signed in.';
}
