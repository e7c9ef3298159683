/** Geometry for the small height-over-time chart in the tree drawer (pure, so it is tested without a browser). */

export interface GrowthPoint {
  at: string;
  heightCm: number;
}

export interface GrowthChart {
  width: number;
  height: number;
  /** SVG path through the points, oldest first. */
  path: string;
  dots: { x: number; y: number; label: string }[];
  yTicks: { y: number; label: string }[];
  xTicks: { x: number; label: string }[];
  plot: { left: number; right: number; top: number; bottom: number };
}

const W = 360;
const H = 180;
const PLOT = { left: 40, right: W - 16, top: 12, bottom: H - 28 };

/** A round step (1, 2 or 5 × 10ⁿ cm, at least 1 cm) giving four to six gridlines up to `max`. */
export function niceStep(max: number): number {
  const raw = Math.max(max, 1) / 5;
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * power).find((s) => s >= raw);
  return Math.max(1, step ?? 10 * power);
}

const dayLabel = (t: number, withYear: boolean) =>
  new Date(t).toLocaleDateString('en-GB', { day: 'numeric', month: 'short', ...(withYear && { year: 'numeric' }) });

/**
 * Scales heights (from 0 cm, so growth is not exaggerated) and dates onto a 360 × 180 drawing.
 * @example growthChart([{ at: '2025-02-01T12:00:00Z', heightCm: 24 }, { at: '2025-03-01T12:00:00Z', heightCm: 32 }]).dots[1] // { x: 344, y: 40, label: '32 cm on 1 Mar 2025' }
 */
export function growthChart(points: readonly GrowthPoint[]): GrowthChart {
  const times = points.map((p) => Date.parse(p.at));
  const first = Math.min(...times);
  const last = Math.max(...times);
  const step = niceStep(Math.max(...points.map((p) => p.heightCm)));
  const top = step * Math.max(1, Math.ceil(Math.max(...points.map((p) => p.heightCm)) / step));
  const x = (t: number) => (last === first ? (PLOT.left + PLOT.right) / 2 : PLOT.left + ((t - first) / (last - first)) * (PLOT.right - PLOT.left));
  const y = (cm: number) => PLOT.bottom - (cm / top) * (PLOT.bottom - PLOT.top);
  const round = (n: number) => Math.round(n * 10) / 10;
  const dots = points.map((p, i) => ({ x: round(x(times[i]!)), y: round(y(p.heightCm)), label: `${p.heightCm} cm on ${dayLabel(times[i]!, true)}` }));
  const yTicks = [];
  for (let v = 0; v <= top; v += step) yTicks.push({ y: round(y(v)), label: String(v) });
  const spansYears = new Date(first).getFullYear() !== new Date(last).getFullYear();
  const xTicks = last === first ? [{ x: round(x(first)), label: dayLabel(first, true) }] : [first, last].map((t) => ({ x: round(x(t)), label: dayLabel(t, spansYears) }));
  const path = dots.map((d, i) => `${i === 0 ? 'M' : 'L'}${d.x} ${d.y}`).join(' ');
  return { width: W, height: H, path, dots, yTicks, xTicks, plot: PLOT };
}

/** The chart in words, for screen readers (the table under it has every value). */
export function growthSummary(points: readonly GrowthPoint[]): string {
  const a = points[0];
  const b = points.at(-1);
  if (!a || !b) return 'No heights measured yet.';
  const day = (iso: string) => dayLabel(Date.parse(iso), true);
  if (points.length === 1) return `Height over time: one measurement, ${a.heightCm} cm on ${day(a.at)}.`;
  return `Height over time: from ${a.heightCm} cm on ${day(a.at)} to ${b.heightCm} cm on ${day(b.at)}, ${points.length} measurements.`;
}
