import type { StoredSession } from './checkout-session.js';
import type { FormObject } from './form-body.js';

const MAX_RECORDS = 500;

export interface RecordedRequest {
  method: string;
  path: string;
  body: FormObject;
  query: FormObject;
  time: string;
}

export interface StoredResponse {
  status: number;
  body: unknown;
}

export interface StripeStore {
  recordRequest(request: RecordedRequest): void;
  /** Newest first. */
  requests(): RecordedRequest[];
  saveSession(stored: StoredSession): void;
  findSession(id: string): StoredSession | undefined;
  /** Newest first. */
  sessions(): StoredSession[];
  /**
   * The SDK retries POSTs on network errors with the same Idempotency-Key; replaying
   * the first response keeps a retry from creating a second session, as the API does.
   */
  replay(key: string): StoredResponse | undefined;
  remember(key: string, response: StoredResponse): void;
}

function pushCapped<T>(items: T[], item: T): void {
  items.unshift(item);
  if (items.length > MAX_RECORDS) items.length = MAX_RECORDS;
}

export function createStripeStore(): StripeStore {
  const requests: RecordedRequest[] = [];
  const sessions: StoredSession[] = [];
  const responses = new Map<string, StoredResponse>();
  return {
    recordRequest: (request) => pushCapped(requests, request),
    requests: () => [...requests],
    saveSession: (stored) => pushCapped(sessions, stored),
    findSession: (id) => sessions.find((stored) => stored.session.id === id),
    sessions: () => [...sessions],
    replay: (key) => responses.get(key),
    remember(key, response) {
      responses.set(key, response);
      // Maps iterate in insertion order, so the first key is the oldest.
      const oldest = responses.keys().next();
      if (responses.size > MAX_RECORDS && !oldest.done) responses.delete(oldest.value);
    },
  };
}
