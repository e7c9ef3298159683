import { afterEach, beforeEach, vi } from 'vitest';

/**
 * Fixes the date for a test file's tests (timers stay real, so MSW and user-event run as usual).
 * @example useClock('2025-03-01T15:00:00Z')
 */
export function useClock(iso: string): void {
  beforeEach(() => {
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(new Date(iso));
  });
  afterEach(() => {
    vi.useRealTimers();
  });
}
