import { ref, type Ref } from 'vue';
import type { LengthUnit } from '@shared/schemas/organisation.schema';
import type { RuleOfThumb } from '@shared/schemas/trips.schema';
import { fetchRuleOfThumb } from '@/api/fleet';
import { parseNumber } from '@/utils/site-form';
import { fromDisplayLength, toDisplayLength } from '@/utils/units';
import { useAsyncAction } from './useAsyncAction';

/**
 * The boater-education persons rule of thumb for a small boat without a capacity plate. The rule
 * is stated in feet, so lengths typed in metres are converted first. A suggestion, never a rating.
 */
export function useFleetRuleOfThumb(units: Ref<LengthUnit>) {
  const length = ref('');
  const beam = ref('');
  const result = ref<RuleOfThumb | null>(null);
  const invalid = ref<string | null>(null);
  const { loading, error, run } = useAsyncAction(fetchRuleOfThumb);

  const feet = (text: string) => {
    const n = parseNumber(text);
    return n === undefined || Number.isNaN(n) || n <= 0 ? null : Math.round(toDisplayLength(fromDisplayLength(n, units.value), 'ft') * 100) / 100;
  };

  async function ask(): Promise<void> {
    result.value = null;
    const [l, b] = [feet(length.value), feet(beam.value)];
    invalid.value = l === null || b === null ? `Enter the length and the beam in ${units.value === 'ft' ? 'feet' : 'metres'}, more than 0.` : null;
    if (l === null || b === null) return;
    result.value = (await run(l, b)) ?? null;
  }

  return { length, beam, result, invalid, loading, error, ask };
}
