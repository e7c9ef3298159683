import type { CrewRole } from '@shared/schemas/crew.schema';
import type { DayCapacity } from '@shared/schemas/trip-capacity.schema';
import { formatLocalTime } from './zoned-time';

/** Role names in a sentence, singular and plural, in the order a coordinator fills them. */
const ROLE_WORDS: [CrewRole, string, string][] = [
  ['operator', 'boat operator', 'boat operators'],
  ['seat', 'paddler needing a seat', 'paddlers needing a seat'],
  ['own-kayak', 'paddler with their own kayak', 'paddlers with their own kayaks'],
  ['planter', 'planter', 'planters'],
  ['shore', 'on the shore crew', 'on the shore crew'],
];

function list(items: string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

/**
 * The estimate in one sentence.
 * @example capacitySentence(cap) // 'This day can plant about 118 trees and needs 2 boat operators, 10 paddlers needing a seat, … and 2 on the shore crew.'
 */
export function capacitySentence(cap: DayCapacity): string {
  if (cap.trees === 0) return 'This day cannot plant any trees with the active fleet in this window.';
  const needs = ROLE_WORDS.filter(([role]) => cap.roles[role] > 0).map(([role, one, many]) => `${cap.roles[role]} ${cap.roles[role] === 1 ? one : many}`);
  const trees = cap.trees === 1 ? 'about 1 tree' : `about ${cap.trees} trees`;
  return `This day can plant ${trees} and needs ${list(needs)}.`;
}

/** When the last pot lands and in how many runs, on the site's clock. */
export function capacityTiming(cap: DayCapacity, timeZone: string): string {
  if (cap.lastLandingAt === null) return '';
  const runs = cap.runs === 1 ? '1 run' : `${cap.runs} runs`;
  return `The last pot lands at about ${formatLocalTime(cap.lastLandingAt, timeZone)}, in ${runs} across ${cap.craftUsed.length} craft.`;
}
