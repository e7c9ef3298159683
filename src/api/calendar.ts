import { z } from 'zod';
import { del, get, post } from './http';

const FeedResponse = z.object({ url: z.string().nullable() });
const NewFeedResponse = z.object({ url: z.string() });

/** One workday as an .ics file, for "Add to calendar" (a plain link: the browser downloads it). */
export function workdayIcsPath(workdayId: string): string {
  return `/api/calendar/workdays/${encodeURIComponent(workdayId)}.ics`;
}

/** My personal calendar feed's secret address, or null when I have none. */
export async function fetchFeedUrl(): Promise<string | null> {
  return (await get('/api/me/calendar-token', FeedResponse)).url;
}

/** Makes a feed address, or a new one that replaces (and switches off) the old. */
export async function createFeedUrl(): Promise<string> {
  return (await post('/api/me/calendar-token', {}, NewFeedResponse)).url;
}

/** Switches the feed off; calendars subscribed to it stop updating. */
export async function revokeFeed(): Promise<void> {
  await del('/api/me/calendar-token');
}
