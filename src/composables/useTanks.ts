import { ref, type Ref } from 'vue';
import type { CreateTankBody, NurseryTasksDto, ReadingBody, ReadingDto, TankDto } from '@shared/schemas/nursery.schema';
import { addReading, createTank, fetchNurseryTasks, listTanks, updateTank } from '@/api/tanks';
import { useAsyncAction } from './useAsyncAction';

/** The tanks with their latest salinity, and today's water swaps across them. */
export function useTanks(): {
  tanks: Ref<TankDto[]>;
  tasks: Ref<NurseryTasksDto | null>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
  logReading: (tankId: string, body: ReadingBody) => Promise<ReadingDto | undefined>;
  /** A new tank (`id` null) or changes to one; throws ApiError for the form to show. */
  saveTank: (id: string | null, body: CreateTankBody) => Promise<TankDto>;
} {
  const tanks = ref<TankDto[]>([]);
  const tasks = ref<NurseryTasksDto | null>(null);
  const { loading, error, run } = useAsyncAction(() => Promise.all([listTanks(), fetchNurseryTasks()]));

  async function reload(): Promise<void> {
    const out = await run();
    if (!out) return;
    tanks.value = out[0];
    tasks.value = out[1];
  }

  async function logReading(tankId: string, body: ReadingBody): Promise<ReadingDto | undefined> {
    const reading = await addReading(tankId, body);
    void reload();
    return reading;
  }

  async function saveTank(id: string | null, body: CreateTankBody): Promise<TankDto> {
    const tank = id === null ? await createTank(body) : await updateTank(id, body);
    // Not awaited: the form that asked must still be mounted to hear that it saved.
    void reload();
    return tank;
  }

  return { tanks, tasks, loading, error, reload, logReading, saveTank };
}
