/** Formatting for the planner's human-readable messages. */

/** `14:35 UTC`. */
export const clock = (ms: number) => `${new Date(ms).toISOString().slice(11, 16)} UTC`;

/** `412.5 kg`. */
export const kg = (n: number) => `${Math.round(n * 10) / 10} kg`;
