import { randomInt } from 'node:crypto';

const ALPHANUMERIC = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789';

/** Random alphanumeric id with a prefix, like the ids hosted services hand out (`cs_test_…`). */
export function randomId(prefix: string, length: number): string {
  let id = prefix;
  for (let i = 0; i < length; i += 1) id += ALPHANUMERIC[randomInt(ALPHANUMERIC.length)];
  return id;
}
