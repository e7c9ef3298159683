/** The survival chart's ECharts option, built from the survival report (pure). */
import type { LineSeriesOption } from 'echarts/charts';
import type { GridComponentOption, LegendComponentOption, TooltipComponentOption } from 'echarts/components';
import type { ComposeOption } from 'echarts/core';
import type { SurvivalReport } from '@shared/schemas/report.schema';
import { formatRate, milestoneLabel } from './report-format';

export type SurvivalChartOption = ComposeOption<LineSeriesOption | GridComponentOption | LegendComponentOption | TooltipComponentOption>;

/** Palette drawn from the product's colours, darkest first so one site reads best; markers differ too (never colour alone). */
const LINES = ['#1f5e46', '#2a7f8e', '#6b4e3d', '#a8402b', '#7a5a12'];
const SYMBOLS = ['circle', 'rect', 'triangle', 'diamond', 'pin'];

/**
 * One line per site: survival (alive ÷ checked, in %) at each milestone since planting. A
 * milestone nobody has checked yet is a gap, not a zero.
 */
export function buildSurvivalChartOption(report: Pick<SurvivalReport, 'milestones' | 'sites'>, compact = false): SurvivalChartOption {
  return {
    animation: false,
    grid: { left: 48, right: 16, top: compact ? 56 : 40, bottom: 36 },
    legend: { top: 0, left: 0, textStyle: { fontFamily: 'Nunito, sans-serif', fontSize: 13 } },
    tooltip: { trigger: 'axis', valueFormatter: (v) => (typeof v === 'number' ? formatRate(v / 100) : '\u2014') },
    xAxis: {
      type: 'category',
      data: report.milestones.map(milestoneLabel),
      name: compact ? '' : 'since planting',
      nameLocation: 'middle',
      nameGap: 26,
      axisLabel: { interval: 0, fontFamily: 'Nunito, sans-serif', fontSize: compact ? 11 : 12, color: '#1e2a24' },
    },
    yAxis: {
      type: 'value',
      min: 0,
      max: 100,
      interval: 25,
      axisLabel: { formatter: '{value} %', fontFamily: 'Nunito, sans-serif', color: '#1e2a24' },
    },
    series: report.sites.map((site, i) => ({
      type: 'line' as const,
      name: site.siteName,
      connectNulls: false,
      symbol: SYMBOLS[i % SYMBOLS.length],
      symbolSize: 10,
      lineStyle: { width: 3, color: LINES[i % LINES.length] },
      itemStyle: { color: LINES[i % LINES.length] },
      data: report.milestones.map((m) => {
        const cell = site.cells.find((c) => c.months === m);
        return cell && cell.survivalRate !== null ? Math.round(cell.survivalRate * 1000) / 10 : null;
      }),
    })),
  };
}

/** The chart in one sentence, for screen readers; the table under it has every figure. */
export function survivalChartSummary(report: Pick<SurvivalReport, 'sites'>): string {
  if (report.sites.length === 0) return 'Survival chart: no trees planted in this range.';
  const parts = report.sites.map((s) => {
    const latest = [...s.cells].reverse().find((c) => c.survivalRate !== null);
    return latest ? `${s.siteName} ${formatRate(latest.survivalRate)} at ${milestoneLabel(latest.months)}` : `${s.siteName} not checked yet`;
  });
  return `Survival by months since planting, latest figure per site: ${parts.join('; ')}. The table below lists every figure.`;
}
