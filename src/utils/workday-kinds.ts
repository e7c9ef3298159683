import type { WorkdayKind } from '@shared/schemas/workday.schema';

export const WORKDAY_KINDS: readonly WorkdayKind[] = ['planting', 'nursery', 'monitoring', 'other'];

const LABELS: Record<WorkdayKind, string> = {
  planting: 'Planting',
  nursery: 'Nursery',
  monitoring: 'Monitoring',
  other: 'Other',
};

export function workdayKindLabel(kind: WorkdayKind): string {
  return LABELS[kind];
}
