import type { TripRunDto } from '@/api/trip-plans';
import { formatLocalTime, localMinuteOfDay } from './zoned-time';

const MINUTE = 60_000;
/** Room left and right of the window and the runs, so the close is never at the very edge. */
const PAD_MS = 30 * MINUTE;
/** The tide curve's box (SVG user units); the SVG stretches it to the page's width. */
const WIDTH = 100;
const HEIGHT = 40;
const INSET = 4;

export interface TimelineInput {
  window: { start: string; end: string };
  runs: readonly TripRunDto[];
  /** Craft in lane order. */
  lanes: readonly { id: string; name: string }[];
  levels: readonly { time: string; height: number }[];
  timeZone: string;
  lastLandingAt: string | null;
}

export interface TimelineBar {
  key: string;
  run: number;
  /** Percent across the timeline: leaving the launch, landing at the site, back at the launch. */
  depart: number;
  land: number;
  back: number;
  label: string;
}

export interface TripTimeline {
  width: number;
  height: number;
  /** The tide curve as an SVG path in the 100 × 40 box; empty without levels. */
  path: string;
  /** Everything else in percent across. */
  window: { from: number; to: number };
  closeLabel: string;
  ticks: { at: number; label: string }[];
  lastLanding: { at: number; label: string } | null;
  rows: { craftId: string; name: string; bars: TimelineBar[] }[];
}

function hourTicks(t0: number, t1: number, timeZone: string): { ms: number; label: string }[] {
  const step = t1 - t0 > 8 * 60 * MINUTE ? 120 : 60;
  const start = Math.floor(t0 / MINUTE) * MINUTE;
  const minute = localMinuteOfDay(start, timeZone);
  const out: { ms: number; label: string }[] = [];
  for (let t = start + ((step - (minute % step)) % step) * MINUTE; t <= t1; t += step * MINUTE) out.push({ ms: t, label: formatLocalTime(t, timeZone) });
  return out;
}

function tidePath(levels: TimelineInput['levels'], t0: number, t1: number, x: (t: number) => number): string {
  const near = levels.filter((l) => Date.parse(l.time) >= t0 - 60 * MINUTE && Date.parse(l.time) <= t1 + 60 * MINUTE);
  if (near.length < 2) return '';
  const heights = near.map((l) => l.height);
  const lo = Math.min(...heights);
  const hi = Math.max(...heights);
  const y = (h: number) => round(HEIGHT - INSET - ((h - lo) / (hi - lo || 1)) * (HEIGHT - 2 * INSET));
  return near.map((l, i) => `${i === 0 ? 'M' : 'L'}${x(Date.parse(l.time))} ${y(l.height)}`).join(' ');
}

const round = (n: number) => Math.round(n * 100) / 100;

/**
 * The runs of a plan against the tide: a span from before the window (or the first departure)
 * to after the close (or the last return), with the window, its close, hour ticks, the tide
 * curve and one row of run bars per craft, all in percent across.
 */
export function buildTripTimeline(input: TimelineInput): TripTimeline {
  const departs = input.runs.map((r) => Date.parse(r.departAt));
  const returns = input.runs.map((r) => Date.parse(r.returnAt));
  const start = Date.parse(input.window.start);
  const end = Date.parse(input.window.end);
  const t0 = Math.min(start, ...departs) - PAD_MS;
  const t1 = Math.max(end, ...returns) + PAD_MS;
  const x = (t: number) => round(((Math.min(Math.max(t, t0), t1) - t0) / (t1 - t0)) * WIDTH);
  // The curve runs on past both edges, where the SVG clips it, so it never bends at an edge.
  const curveX = (t: number) => round(((t - t0) / (t1 - t0)) * WIDTH);
  const clock = (iso: string) => formatLocalTime(iso, input.timeZone);
  const rows = input.lanes.map((lane) => ({
    craftId: lane.id,
    name: lane.name,
    bars: input.runs
      .filter((r) => r.craftId === lane.id)
      .map((r) => ({
        key: `${r.craftId}#${r.run}`,
        run: r.run,
        depart: x(Date.parse(r.departAt)),
        land: x(Date.parse(r.landAt)),
        back: x(Date.parse(r.returnAt)),
        label: `${lane.name} run ${r.run}: leaves ${clock(r.departAt)}, lands ${clock(r.landAt)}, back ${clock(r.returnAt)}`,
      })),
  }));
  return {
    width: WIDTH,
    height: HEIGHT,
    path: tidePath(input.levels, t0, t1, curveX),
    window: { from: x(start), to: x(end) },
    closeLabel: clock(input.window.end),
    ticks: hourTicks(t0, t1, input.timeZone).map((t) => ({ at: x(t.ms), label: t.label })),
    lastLanding: input.lastLandingAt ? { at: x(Date.parse(input.lastLandingAt)), label: clock(input.lastLandingAt) } : null,
    rows,
  };
}
