import { z } from 'zod';
import { post } from './http';
import { Waiver } from './signups';

/** Mirrors the server's rule for a new waiver text (server/routes/waiver.router.ts). */
export const PublishWaiverBody = z
  .object({
    text: z.string().trim().min(50, { message: 'a waiver needs more than a line' }).max(20_000),
    guardianText: z.string().trim().max(5000).default(''),
  })
  .strict();
export type PublishWaiverBody = z.infer<typeof PublishWaiverBody>;

const WaiverResponse = z.object({ waiver: Waiver });

/** Admin only: publishes the text as the next version; sign-ups keep the version they accepted. */
export async function publishWaiver(body: PublishWaiverBody): Promise<Waiver> {
  return (await post('/api/waiver', body, WaiverResponse)).waiver;
}
