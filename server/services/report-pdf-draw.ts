/** Drawing helpers for the printed report: headings, key figures, tables that break across pages, a bar chart. */
import type PDFDocument from 'pdfkit';

type Doc = InstanceType<typeof PDFDocument>;

export const INK = '#1d2b25';
export const MUTED = '#4d5c56';
export const PALETTE = { green: '#1F5E46', teal: '#2A7F8E', mud: '#6B4E3D', amber: '#E0A43B', sand: '#F3EBDD' };
export const FONT = { regular: 'Nunito', bold: 'Nunito-Bold' };

const bottom = (doc: Doc) => doc.page.height - doc.page.margins.bottom;
const left = (doc: Doc) => doc.page.margins.left;
export const contentWidth = (doc: Doc) => doc.page.width - doc.page.margins.left - doc.page.margins.right;

/** Starts a new page when fewer than `needed` points are left. */
export function ensureRoom(doc: Doc, needed: number): void {
  if (doc.y + needed > bottom(doc)) doc.addPage();
}

/** A section heading; `keep` is the room (points) the content right after it needs on the same page. */
export function heading(doc: Doc, text: string, keep = 40): void {
  ensureRoom(doc, 30 + keep);
  doc.moveDown(0.8).font(FONT.bold).fontSize(13).fillColor(PALETTE.green).text(text, left(doc), doc.y);
  doc.moveDown(0.3).font(FONT.regular).fontSize(10).fillColor(INK);
}

export function paragraph(doc: Doc, text: string, opts: { size?: number; color?: string } = {}): void {
  doc.font(FONT.regular).fontSize(opts.size ?? 10).fillColor(opts.color ?? INK).text(text, left(doc), doc.y, { width: contentWidth(doc) });
  doc.moveDown(0.35);
}

/** Label and value pairs in two columns. */
export function figures(doc: Doc, pairs: readonly [string, string][]): void {
  const half = contentWidth(doc) / 2;
  for (let i = 0; i < pairs.length; i += 2) {
    ensureRoom(doc, 34);
    const y = doc.y;
    let next = y;
    pairs.slice(i, i + 2).forEach(([label, value], k) => {
      const x = left(doc) + k * half;
      doc.font(FONT.regular).fontSize(9).fillColor(MUTED).text(label, x, y, { width: half - 12 });
      doc.font(FONT.bold).fontSize(14).fillColor(INK).text(value, x, doc.y, { width: half - 12 });
      next = Math.max(next, doc.y);
    });
    doc.y = next + 6;
  }
}

export interface Column {
  header: string;
  /** Share of the content width. */
  share: number;
  align?: 'left' | 'right';
}

/** A table with a header row that repeats on every page it runs onto. */
export function table(doc: Doc, columns: readonly Column[], rows: readonly (readonly string[])[]): void {
  const width = contentWidth(doc);
  const xs = columns.reduce<number[]>((acc, c, i) => [...acc, (acc[i] ?? left(doc)) + c.share * width], [left(doc)]);
  const line = (cells: readonly string[], bold: boolean) => {
    doc.font(bold ? FONT.bold : FONT.regular).fontSize(9);
    const h = Math.max(...cells.map((cell, i) => doc.heightOfString(cell, { width: columns[i]!.share * width - 6 }))) + 6;
    if (doc.y + h > bottom(doc)) {
      doc.addPage();
      if (!bold) line(columns.map((c) => c.header), true);
    }
    const y = doc.y;
    cells.forEach((cell, i) => doc.fillColor(INK).text(cell, xs[i]! + 3, y + 3, { width: columns[i]!.share * width - 6, align: columns[i]!.align ?? 'left' }));
    doc.moveTo(left(doc), y + h).lineTo(left(doc) + width, y + h).lineWidth(bold ? 1 : 0.4).strokeColor(bold ? PALETTE.green : '#c9c2b4').stroke();
    doc.y = y + h;
  };
  line(columns.map((c) => c.header), true);
  for (const row of rows) line(row, false);
  doc.x = left(doc);
  doc.moveDown(0.5);
}

/** A round upper bound for an axis: 1, 2 or 5 × a power of ten. */
export function niceMax(value: number): number {
  if (value <= 0) return 1;
  const power = 10 ** Math.floor(Math.log10(value));
  return [1, 2, 5, 10].map((m) => m * power).find((m) => m >= value)!;
}

export interface BarGroup {
  label: string;
  values: readonly number[];
}

/** Room a bar chart of this height takes, with its labels and legend. */
export const chartRoom = (height: number) => height + 60;

/** Grouped vertical bars with a y axis, gridlines, the value over each bar, group labels and a legend. */
export function barChart(doc: Doc, groups: readonly BarGroup[], series: readonly { name: string; color: string }[], height = 170): void {
  ensureRoom(doc, chartRoom(height));
  const x0 = left(doc) + 30;
  const width = contentWidth(doc) - 30;
  const top = doc.y + 6;
  const base = top + height;
  const max = niceMax(Math.max(0, ...groups.flatMap((g) => g.values)));
  // Whole-number ticks: 1, 2, 5 or 10 × a power of ten splits evenly into 5 (or 2, or 1) steps.
  const steps = [5, 2, 1].find((d) => max % d === 0 && max / d >= 1) ?? 1;
  doc.font(FONT.regular).fontSize(8).fillColor(MUTED);
  for (let k = 0; k <= steps; k++) {
    const y = base - (height * k) / steps;
    doc.moveTo(x0, y).lineTo(x0 + width, y).lineWidth(0.4).strokeColor('#d9d2c4').stroke();
    doc.text(String((max * k) / steps), left(doc), y - 4, { width: 26, align: 'right' });
  }
  const slot = width / Math.max(1, groups.length);
  const bar = Math.min(18, (slot * 0.8) / series.length);
  groups.forEach((g, i) => {
    const start = x0 + i * slot + (slot - bar * series.length) / 2;
    g.values.forEach((v, s) => {
      const h = (height * v) / max;
      if (h > 0) doc.rect(start + s * bar, base - h, bar - 1, h).fill(series[s]!.color);
      doc.font(FONT.regular).fontSize(7).fillColor(INK).text(String(v), start + s * bar - 6, base - h - 10, { width: bar + 11, align: 'center', lineBreak: false });
    });
    doc.font(FONT.regular).fontSize(7).fillColor(MUTED).text(g.label, x0 + i * slot, base + 4, { width: slot, align: 'center' });
  });
  let lx = x0;
  const ly = base + 20;
  for (const s of series) {
    doc.rect(lx, ly, 9, 9).fill(s.color);
    doc.font(FONT.regular).fontSize(8).fillColor(INK).text(s.name, lx + 13, ly, { lineBreak: false });
    lx += 13 + doc.widthOfString(s.name) + 18;
  }
  doc.x = left(doc);
  doc.y = ly + 18;
}

/** "Organisation · title · page n of m" along the foot of every page (call once all pages exist). */
export function footers(doc: Doc, text: string): void {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const bottomMargin = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    doc.font(FONT.regular).fontSize(8).fillColor(MUTED).text(`${text} · page ${i + 1} of ${range.count}`, left(doc), doc.page.height - 36, { width: contentWidth(doc), align: 'center', lineBreak: false });
    doc.page.margins.bottom = bottomMargin;
  }
}
