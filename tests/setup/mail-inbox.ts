/** Waiting for the background side in API tests: polls until a check passes or time runs out. */
import type { Config } from '../../server/config.js';
import { mailTo } from './test-app.js';

/** Re-runs `probe` until it returns something other than undefined/false. */
export async function eventually<T>(probe: () => Promise<T | undefined | false>, what: string, timeoutMs = 20_000): Promise<T> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const value = await probe();
    if (value !== undefined && value !== false) return value;
    if (Date.now() > until) throw new Error(`Timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 150));
  }
}

/** The newest message to `address` whose subject matches, once the SMTP fake has it. */
export function waitForMail(config: Config, address: string, subject: RegExp, timeoutMs?: number) {
  return eventually(async () => (await mailTo(config, address)).find((m) => subject.test(m.subject)), `mail to ${address} matching ${subject}`, timeoutMs);
}

/** An attachment's bytes as the SMTP fake received them, as text. */
export async function attachmentText(inspectUrl: string, messageId: string, index = 0): Promise<{ contentType: string; text: string }> {
  const res = await fetch(`${inspectUrl}/messages/${encodeURIComponent(messageId)}/attachments/${index}`);
  if (!res.ok) throw new Error(`attachment ${index} of message ${messageId}: HTTP ${res.status}`);
  return { contentType: res.headers.get('content-type') ?? '', text: await res.text() };
}
