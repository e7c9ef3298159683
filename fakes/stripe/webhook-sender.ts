import { setTimeout as sleep } from 'node:timers/promises';
import type { LogLine } from '../support/request-log.js';
import { buildEvent, signatureHeader, type EventSpec, type StripeEvent } from './webhook-event.js';

export interface WebhookEndpoint {
  url: string;
  /** The endpoint's signing secret (`whsec_…`). */
  secret: string;
  /** Waits between attempts; one more attempt than delays, then the event is given up. */
  retryDelaysMs?: number[];
}

/** Much shorter than the hosted service's three days, so tests and demos see retries. */
export const DEFAULT_RETRY_DELAYS_MS = [500, 1000, 2000, 4000, 8000];
const ATTEMPT_TIMEOUT_MS = 10_000;
const MAX_EVENTS = 500;

export interface DeliveryAttempt {
  attempt: number;
  at: string;
  url: string;
  /** The endpoint's HTTP status, or null when it could not be reached. */
  status: number | null;
  error: string | null;
  durationMs: number;
}

export type DeliveryState = 'no_endpoint' | 'pending' | 'delivered' | 'failed';

export interface EventRecord {
  event: StripeEvent;
  state: DeliveryState;
  attempts: DeliveryAttempt[];
}

export interface WebhookSender {
  /** Points deliveries at a new endpoint, or at none; events already under way keep theirs. */
  configure(endpoint: WebhookEndpoint | null): void;
  endpoint(): { url: string; retryDelaysMs: number[] } | null;
  /** Records the event and starts delivering it in the background. */
  publish(spec: EventSpec): EventRecord;
  /** Delivers a recorded event again, same id and body, to the current endpoint. */
  resend(eventId: string): EventRecord | undefined;
  find(eventId: string): EventRecord | undefined;
  /** Newest first. */
  events(): EventRecord[];
  /** Cancels waiting retries and requests in flight. */
  stop(): void;
}

/** A 2xx within the timeout counts as delivered; anything else (3xx too) is retried. */
async function attemptOnce(endpoint: WebhookEndpoint, payload: string, stopped: AbortSignal): Promise<{ status: number | null; error: string | null }> {
  const headers = {
    'content-type': 'application/json; charset=utf-8',
    'user-agent': 'Stripe/1.0 (+https://stripe.com/docs/webhooks)',
    'stripe-signature': signatureHeader(payload, endpoint.secret, Math.floor(Date.now() / 1000)),
  };
  try {
    const signal = AbortSignal.any([stopped, AbortSignal.timeout(ATTEMPT_TIMEOUT_MS)]);
    const res = await fetch(endpoint.url, { method: 'POST', headers, body: payload, signal, redirect: 'manual' });
    await res.arrayBuffer().catch(() => undefined);
    return { status: res.status, error: res.ok ? null : `HTTP ${res.status}` };
  } catch (error) {
    const cause = error instanceof Error && error.cause instanceof Error ? `: ${error.cause.message}` : '';
    return { status: null, error: `${error instanceof Error ? error.message : String(error)}${cause}` };
  }
}

export function createWebhookSender(opts: { endpoint?: WebhookEndpoint; log: LogLine }): WebhookSender {
  let current: WebhookEndpoint | null = opts.endpoint ?? null;
  const records: EventRecord[] = [];
  const stopper = new AbortController();

  async function deliver(record: EventRecord, endpoint: WebhookEndpoint): Promise<void> {
    const payload = JSON.stringify(record.event, null, 2);
    const delays = endpoint.retryDelaysMs ?? DEFAULT_RETRY_DELAYS_MS;
    record.state = 'pending';
    for (let tries = 0; !stopper.signal.aborted; tries += 1) {
      const started = performance.now();
      const at = new Date().toISOString();
      const result = await attemptOnce(endpoint, payload, stopper.signal);
      const durationMs = Math.round(performance.now() - started);
      record.attempts.push({ attempt: record.attempts.length + 1, at, url: endpoint.url, ...result, durationMs });
      opts.log(`[stripe] ${record.event.type} ${record.event.id} → ${endpoint.url}: ${result.status ?? result.error}`);
      if (result.error === null) return void (record.state = 'delivered');
      const delay = delays[tries];
      if (delay === undefined) return void (record.state = 'failed');
      await sleep(delay, undefined, { signal: stopper.signal }).catch(() => undefined);
    }
  }

  const start = (record: EventRecord): EventRecord => {
    if (current) void deliver(record, { ...current });
    return record;
  };

  return {
    configure: (endpoint) => void (current = endpoint),
    endpoint: () => (current ? { url: current.url, retryDelaysMs: current.retryDelaysMs ?? DEFAULT_RETRY_DELAYS_MS } : null),
    publish(spec) {
      const event = buildEvent(spec, Math.floor(Date.now() / 1000), current ? 1 : 0);
      const record: EventRecord = { event, state: 'no_endpoint', attempts: [] };
      records.unshift(record);
      if (records.length > MAX_EVENTS) records.length = MAX_EVENTS;
      return start(record);
    },
    resend(eventId) {
      const record = records.find((candidate) => candidate.event.id === eventId);
      return record && start(record);
    },
    find: (eventId) => records.find((record) => record.event.id === eventId),
    events: () => [...records],
    stop: () => stopper.abort(),
  };
}
