import { onBeforeUnmount, ref, watch, type Ref } from 'vue';
import type { Role } from '@shared/schemas/user.schema';
import { changeRole as changeRoleApi, listUsers, type PersonRow } from '@/api/users';
import { listVolunteers } from '@/api/volunteers';
import { errorMessage } from '@/utils/error-message';
import { useAsyncAction } from './useAsyncAction';

export interface People {
  people: Ref<PersonRow[]>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  search: Ref<string>;
  roleFilter: Ref<Role | ''>;
  reload: () => Promise<void>;
  savingId: Ref<string | null>;
  /** Resolves to null on success, or to the message to show. */
  changeRole: (person: PersonRow, role: Role) => Promise<string | null>;
}

const SEARCH_DELAY_MS = 300;

/**
 * The people list. Admins read `/api/users` (with a role filter and role changes);
 * coordinators read the read-only `/api/volunteers`.
 */
export function usePeople(asAdmin: boolean): People {
  const people = ref<PersonRow[]>([]);
  const search = ref('');
  const roleFilter = ref<Role | ''>('');
  const savingId = ref<string | null>(null);
  let latest = 0;

  const { loading, error, run } = useAsyncAction(async () => {
    const ticket = ++latest;
    const q = search.value.trim() || undefined;
    const rows = asAdmin ? await listUsers({ q, role: roleFilter.value || undefined }) : await listVolunteers(q);
    // A slower, older search must not overwrite a newer one.
    if (ticket === latest) people.value = rows;
  });

  async function reload(): Promise<void> {
    await run();
  }

  let timer: ReturnType<typeof setTimeout> | undefined;
  watch(search, () => {
    clearTimeout(timer);
    timer = setTimeout(() => void reload(), SEARCH_DELAY_MS);
  });
  watch(roleFilter, () => void reload());
  onBeforeUnmount(() => clearTimeout(timer));

  async function changeRole(person: PersonRow, role: Role): Promise<string | null> {
    savingId.value = person.id;
    try {
      const user = await changeRoleApi(person.id, role);
      people.value = people.value.map((row) => (row.id === user.id ? { ...row, ...user } : row));
      return null;
    } catch (err) {
      return errorMessage(err, { forbidden: "That role change isn't allowed." });
    } finally {
      savingId.value = null;
    }
  }

  return { people, loading, error, search, roleFilter, reload, savingId, changeRole };
}
