/**
 * Texts of the crew e-mails (sign-up, waitlist, promotion, reminder, change, cancellation).
 * Pure: the caller passes the workday as the site sees it, the links and the names.
 */
import { mailLayout, type MailContent } from './mail-layout.js';
import { clockTime, shortDate, workdayWhen } from './workday-time.js';

export type { MailContent } from './mail-layout.js';

export interface CrewMailWorkday {
  id: string;
  title: string;
  startsAt: Date;
  endsAt: Date;
  /** The site's IANA zone: every time in the mail is read there. */
  timeZone: string;
  siteName: string;
  /** Empty means the site's launch. */
  meetingPoint: string;
  launchName: string;
  whatToBring: string;
  cancelMessage: string;
}

export interface CrewMailContext {
  appUrl: string;
  recipientName: string;
  organisationName: string;
  /** Stops reminder e-mails only; confirmations, changes and cancellations still go out. */
  unsubscribeUrl: string;
}

/** The usual cautions, in plain words; never a promise that the day is without risk. */
export const CREW_CAUTIONS = [
  'On the day: everyone on the water wears a life jacket (PFD). Bring water, a hat and sun protection for the heat. At the first thunder or lightning, head for shore. Expect soft mud and sharp oyster shell: wear closed shoes that can get wet. A float plan is left with someone ashore.',
  "Local rules, permits and the boat operator's word come first.",
] as const;

export const workdayUrl = (appUrl: string, id: string) => `${appUrl.replace(/\/+$/, '')}/workdays/${id}`;
export const meetingPointOf = (w: Pick<CrewMailWorkday, 'meetingPoint' | 'launchName' | 'siteName'>) =>
  w.meetingPoint.trim() || w.launchName.trim() || w.siteName;

const subjectLine = (s: string) => s.replace(/\s+/g, ' ').trim().slice(0, 300);

function details(w: CrewMailWorkday, roleLabel?: string): [string, string][] {
  const rows: [string, string][] = [
    ['Workday', w.title],
    ['When', workdayWhen(w.startsAt, w.endsAt, w.timeZone)],
    ['Site', w.siteName],
    ['Meeting point', meetingPointOf(w)],
  ];
  if (w.whatToBring.trim()) rows.push(['Bring', w.whatToBring.trim()]);
  if (roleLabel) rows.push(['Your role', roleLabel]);
  return rows;
}

interface MailParts {
  subject: string;
  intro: string[];
  roleLabel?: string;
  cautions?: boolean;
}

function compose(w: CrewMailWorkday, ctx: CrewMailContext, parts: MailParts): MailContent {
  const greeting = `Hello ${ctx.recipientName},`;
  const link = { href: workdayUrl(ctx.appUrl, w.id), label: 'Open the workday page' };
  const rows = details(w, parts.roleLabel);
  const cautions = parts.cautions === false ? [] : [...CREW_CAUTIONS];
  const unsubscribe = 'Reminder e-mails before workdays can be turned off here (confirmations, changes and cancellations still reach you):';
  const signature = `${ctx.organisationName} · Ebbroot`;
  const text = [
    greeting,
    parts.intro.join('\n\n'),
    rows.map(([k, v]) => `${k}: ${v}`).join('\n'),
    `Workday page: ${link.href}`,
    ...(cautions.length ? [cautions.join('\n')] : []),
    signature,
    `${unsubscribe}\n${ctx.unsubscribeUrl}`,
  ].join('\n\n');
  const html = mailLayout({
    greeting,
    lines: parts.intro,
    details: rows,
    link,
    notes: cautions,
    smallPrint: [{ text: unsubscribe, link: { href: ctx.unsubscribeUrl, label: 'Stop reminders' } }],
    signature,
  });
  return { subject: subjectLine(parts.subject), text: `${text}\n`, html };
}

const on = (w: CrewMailWorkday) => shortDate(w.startsAt, w.timeZone);

export function confirmationMail(w: CrewMailWorkday, ctx: CrewMailContext, roleLabel: string): MailContent {
  return compose(w, ctx, {
    subject: `You're on the crew: ${w.title}, ${on(w)}`,
    intro: [
      `You have a place on the crew as ${roleLabel}. Thank you!`,
      'The attached calendar file adds the day to your calendar. If the plan changes, we will e-mail you; if you can no longer come, please cancel on the workday page so someone on the waitlist gets your place.',
    ],
    roleLabel,
  });
}

export function waitlistMail(w: CrewMailWorkday, ctx: CrewMailContext, roleLabel: string, position: number): MailContent {
  return compose(w, ctx, {
    subject: `Waitlist, number ${position}: ${w.title}, ${on(w)}`,
    intro: [
      `The crew is full for ${roleLabel} right now, so you are on the waitlist: number ${position} in line.`,
      'If a place opens up, you move onto the crew and we e-mail you. You can leave the waitlist on the workday page at any time.',
    ],
    roleLabel,
  });
}

export function promotionMail(w: CrewMailWorkday, ctx: CrewMailContext, roleLabel: string): MailContent {
  return compose(w, ctx, {
    subject: `A place opened up: you're on the crew for ${w.title}, ${on(w)}`,
    intro: [
      `Good news: a place opened up and you are now on the crew as ${roleLabel}.`,
      'The attached calendar file adds the day to your calendar. If you can no longer come, please cancel on the workday page so the next person in line gets the place.',
    ],
    roleLabel,
  });
}

export function reminderMail(w: CrewMailWorkday, ctx: CrewMailContext, roleLabel: string): MailContent {
  const start = clockTime(w.startsAt, w.timeZone);
  return compose(w, ctx, {
    subject: `Reminder: ${w.title}, ${on(w)} at ${start.time} ${start.zone}`,
    intro: [
      'A reminder that you are on the crew for this workday.',
      'Check the weather and the workday page before you leave. If you can no longer come, please cancel there so someone on the waitlist gets your place.',
    ],
    roleLabel,
  });
}

export function changeMail(w: CrewMailWorkday, ctx: CrewMailContext, summary: string): MailContent {
  return compose(w, ctx, {
    subject: `Changed: ${w.title}, now ${on(w)}`,
    intro: [
      'The plan for this workday has changed. Please check the date, time and meeting point below.',
      ...(summary.trim() ? [summary.trim()] : []),
      'The attached calendar file updates the entry in your calendar.',
    ],
  });
}

export function cancellationMail(w: CrewMailWorkday, ctx: CrewMailContext): MailContent {
  const message = w.cancelMessage.trim();
  return compose(w, ctx, {
    subject: `Cancelled: ${w.title}, ${on(w)}`,
    intro: [
      'This workday is cancelled. Please do not come to the meeting point.',
      ...(message ? [`Message from the coordinator: ${message}`] : []),
      'Thank you for signing up; we hope to see you on another workday.',
    ],
    cautions: false,
  });
}

/** DESCRIPTION of the workday's calendar event: plain text, with the cautions and the page link. */
export function calendarDescription(w: CrewMailWorkday & { description: string }, appUrl: string): string {
  const lines = [
    ...(w.cancelMessage.trim() ? [`Cancelled: ${w.cancelMessage.trim()}`] : []),
    ...(w.description.trim() ? [w.description.trim()] : []),
    `Meeting point: ${meetingPointOf(w)}`,
    ...(w.whatToBring.trim() ? [`Bring: ${w.whatToBring.trim()}`] : []),
    ...CREW_CAUTIONS,
    workdayUrl(appUrl, w.id),
  ];
  return lines.join('\n\n');
}
