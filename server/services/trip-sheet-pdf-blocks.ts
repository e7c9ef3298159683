/**
 * Draws the blocks of a printable sheet with pdfkit, top to bottom, starting a new page when a
 * block would run past the bottom margin (tables repeat their header row there). Black text and
 * grey rules, so the print reads the same in black and white.
 */
import type { SheetBlock, SheetColumn } from '../domain/trips/trip-sheet-types.js';

export const FONT = { regular: 'sheet-regular', bold: 'sheet-bold' };
export const INK = '#000000';
export const ACCENT = '#1F5E46';
const RULE = '#8A8A8A';
const SHADE = '#E4E4E4';
const BODY_SIZE = 10;
const TABLE_SIZE = 9;
const PAD = 3;
const LABEL_WIDTH = 118;

export interface Frame {
  doc: PDFKit.PDFDocument;
  left: number;
  width: number;
  top: number;
  bottom: number;
}

/** Moves to a new page unless `height` more points fit on this one. */
export function ensure(f: Frame, height: number): void {
  if (f.doc.y + height <= f.bottom) return;
  f.doc.addPage();
  f.doc.y = f.top;
}

function textAt(f: Frame, text: string, x: number, y: number, width: number, bold = false, size = BODY_SIZE): void {
  f.doc.font(bold ? FONT.bold : FONT.regular).fontSize(size).fillColor(INK).text(text, x, y, { width });
}

// Text layout is the slow part of rendering, and every block is measured before it is drawn.
const heights = new WeakMap<PDFKit.PDFDocument, Map<string, number>>();

function heightOf(f: Frame, text: string, width: number, bold = false, size = BODY_SIZE): number {
  let memo = heights.get(f.doc);
  if (!memo) heights.set(f.doc, (memo = new Map()));
  const key = `${bold ? 'b' : 'r'}|${size}|${width.toFixed(2)}|${text}`;
  let h = memo.get(key);
  if (h === undefined) memo.set(key, (h = f.doc.font(bold ? FONT.bold : FONT.regular).fontSize(size).heightOfString(text || ' ', { width })));
  return h;
}

function facts(f: Frame, rows: { label: string; value: string }[]): void {
  const valueWidth = f.width - LABEL_WIDTH;
  for (const row of rows) {
    const h = Math.max(heightOf(f, row.label, LABEL_WIDTH - 6, true), heightOf(f, row.value, valueWidth)) + PAD;
    ensure(f, h);
    const y = f.doc.y;
    textAt(f, row.label, f.left, y, LABEL_WIDTH - 6, true);
    textAt(f, row.value, f.left + LABEL_WIDTH, y, valueWidth);
    f.doc.y = y + h;
  }
}

function tableRow(f: Frame, cells: string[], columns: SheetColumn[], header: boolean): void {
  const widths = columns.map((c) => c.width * f.width);
  const h = rowHeight(f, cells, columns, header);
  const y = f.doc.y;
  if (header) f.doc.rect(f.left, y, f.width, h).fill(SHADE);
  let x = f.left;
  cells.forEach((cell, i) => {
    textAt(f, cell, x + PAD, y + PAD, widths[i]! - 2 * PAD, header, TABLE_SIZE);
    x += widths[i]!;
  });
  f.doc.moveTo(f.left, y + h).lineTo(f.left + f.width, y + h).lineWidth(0.5).strokeColor(RULE).stroke();
  f.doc.y = y + h;
}

function rowHeight(f: Frame, cells: string[], columns: SheetColumn[], header = false): number {
  return Math.max(...cells.map((cell, i) => heightOf(f, cell, columns[i]!.width * f.width - 2 * PAD, header, TABLE_SIZE))) + 2 * PAD;
}

function table(f: Frame, columns: SheetColumn[], rows: string[][], empty: string): void {
  const labels = columns.map((c) => c.label);
  const headerHeight = rowHeight(f, labels, columns, true);
  if (rows.length === 0) return paragraph(f, empty);
  ensure(f, headerHeight + rowHeight(f, rows[0]!, columns));
  tableRow(f, labels, columns, true);
  for (const row of rows) {
    const h = rowHeight(f, row, columns);
    if (f.doc.y + h > f.bottom) {
      ensure(f, headerHeight + h);
      tableRow(f, labels, columns, true);
    }
    tableRow(f, row, columns, false);
  }
  f.doc.y += PAD;
}

function paragraph(f: Frame, text: string, strong = false): void {
  const h = heightOf(f, text, f.width, strong) + PAD;
  ensure(f, h);
  const y = f.doc.y;
  textAt(f, text, f.left, y, f.width, strong);
  f.doc.y = y + h;
}

function list(f: Frame, items: string[], numbered = false): void {
  const indent = 16;
  items.forEach((item, i) => {
    const h = heightOf(f, item, f.width - indent) + PAD;
    ensure(f, h);
    const y = f.doc.y;
    textAt(f, numbered ? `${i + 1}.` : '•', f.left + 2, y, indent, numbered);
    textAt(f, item, f.left + indent, y, f.width - indent);
    f.doc.y = y + h;
  });
}

/** Draws one block at the current position. */
export function drawBlock(f: Frame, b: SheetBlock): void {
  if (b.kind === 'facts') facts(f, b.rows);
  else if (b.kind === 'table') table(f, b.columns, b.rows, b.empty);
  else if (b.kind === 'paragraph') paragraph(f, b.text, b.strong);
  else list(f, b.items, b.numbered);
  f.doc.y += 4;
}

/** How tall a block will be, so a section that fits on one page is not split. */
export function measureBlock(f: Frame, b: SheetBlock): number {
  const gap = 4;
  if (b.kind === 'facts') return gap + b.rows.reduce((n, r) => n + Math.max(heightOf(f, r.label, LABEL_WIDTH - 6, true), heightOf(f, r.value, f.width - LABEL_WIDTH)) + PAD, 0);
  if (b.kind === 'paragraph') return gap + heightOf(f, b.text, f.width, b.strong) + PAD;
  if (b.kind === 'list') return gap + b.items.reduce((n, item) => n + heightOf(f, item, f.width - 16) + PAD, 0);
  if (b.rows.length === 0) return gap + heightOf(f, b.empty, f.width) + PAD;
  return gap + PAD + rowHeight(f, b.columns.map((c) => c.label), b.columns, true) + b.rows.reduce((n, r) => n + rowHeight(f, r, b.columns), 0);
}

/**
 * A section heading with a rule under it. The heading moves to a new page with its section
 * when the whole section fits on one page but not on what is left of this one; a longer section
 * keeps at least a few lines with its heading.
 */
export function drawHeading(f: Frame, text: string, sectionHeight: number): void {
  const headingHeight = 30;
  ensure(f, headingHeight + (sectionHeight <= f.bottom - f.top - headingHeight ? sectionHeight : 50));
  const y = f.doc.y + 6;
  f.doc.font(FONT.bold).fontSize(13).fillColor(ACCENT).text(text, f.left, y, { width: f.width });
  const under = y + heightOf(f, text, f.width, true, 13) + 1;
  f.doc.moveTo(f.left, under).lineTo(f.left + f.width, under).lineWidth(0.75).strokeColor(ACCENT).stroke();
  f.doc.y = under + 5;
}
