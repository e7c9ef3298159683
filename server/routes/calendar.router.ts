import { Router, type Response } from 'express';
import { z } from 'zod';
import { WorkdayIdParams } from '../../shared/schemas/workday.schema.js';
import { escapeHtml } from '../domain/mail-layout.js';
import { currentUser, requireAuth } from '../middleware/auth.js';
import { ICS_CONTENT_TYPE } from '../services/calendar-ics.js';
import type { CalendarService } from '../services/calendar.service.js';
import type { ReminderOptOutService } from '../services/reminder-opt-out.service.js';

const TokenParams = z.object({ token: z.string().max(100) });

function sendIcs(res: Response, body: string, opts: { filename: string; download?: boolean; cache: string }) {
  res.set({
    'Content-Type': ICS_CONTENT_TYPE,
    'Content-Disposition': `${opts.download ? 'attachment' : 'inline'}; filename="${opts.filename}"`,
    'Cache-Control': opts.cache,
  });
  res.send(body);
}

function page(title: string, message: string, appUrl: string): string {
  const account = new URL('/account', appUrl).toString();
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>${escapeHtml(title)}</title></head><body style="font-family:Nunito,Arial,sans-serif;background:#F3EBDD;color:#1d2b24;padding:24px"><main style="max-width:32rem;margin:auto"><h1 style="color:#1F5E46">${escapeHtml(title)}</h1><p>${escapeHtml(message)}</p><p><a href="${escapeHtml(account)}" style="color:#1F5E46">Your account</a></p></main></body></html>`;
}

/**
 * Mounted at `/api`, before the workday routes (`/workdays/:id` would take `…/<id>.ics`):
 * calendar files and feeds, the personal feed's secret URL, and the reminders opt-out link.
 */
export function calendarRouter(deps: { calendar: CalendarService; optOut: ReminderOptOutService; appUrl: string }): Router {
  const r = Router();

  r.get(['/workdays/:id.ics', '/calendar/workdays/:id.ics'], async (req, res) => {
    const { id } = WorkdayIdParams.parse(req.params);
    sendIcs(res, await deps.calendar.workday(id, req.user?.role), { filename: `workday-${id}.ics`, download: true, cache: 'private, no-cache' });
  });
  r.get('/calendar/organisation.ics', async (_req, res) => {
    sendIcs(res, await deps.calendar.organisationFeed(), { filename: 'workdays.ics', cache: 'public, max-age=300' });
  });
  r.get('/calendar/personal/:token.ics', async (req, res) => {
    const { token } = TokenParams.parse(req.params);
    sendIcs(res, await deps.calendar.personalFeed(token), { filename: 'my-workdays.ics', cache: 'private, no-cache' });
  });

  r.get('/me/calendar-token', requireAuth, async (req, res) => {
    res.json({ url: await deps.calendar.feedUrlOf(currentUser(req).id) });
  });
  r.post('/me/calendar-token', requireAuth, async (req, res) => {
    res.json({ url: await deps.calendar.rotateFeed(currentUser(req).id) });
  });
  r.delete('/me/calendar-token', requireAuth, async (req, res) => {
    await deps.calendar.revokeFeed(currentUser(req).id);
    res.status(204).end();
  });

  r.get('/unsubscribe/reminders', async (req, res) => {
    const done = await deps.optOut.optOut(req.query.u, req.query.t);
    res.status(done ? 200 : 400).type('html');
    res.send(
      done
        ? page('Reminders turned off', 'You will no longer get reminder e-mails before workdays. Confirmations, changes and cancellations still reach you.', deps.appUrl)
        : page('This link does not work', 'The unsubscribe link is incomplete or was changed. Open it again from the e-mail, or turn reminders off in your account.', deps.appUrl),
    );
  });
  return r;
}
