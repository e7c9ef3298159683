/**
 * Renders a printable sheet (server/domain/trips/trip-sheet-types.ts) to PDF with pdfkit: the
 * organisation's name and the title on every page, page numbers in the footer, the app's Nunito
 * typeface embedded so the print matches the screens.
 */
import { createRequire } from 'node:module';
import PDFDocument from 'pdfkit';
import type { PrintableSheet } from '../domain/trips/trip-sheet-types.js';
import { ACCENT, drawBlock, drawHeading, FONT, INK, measureBlock, type Frame } from './trip-sheet-pdf-blocks.js';

const require = createRequire(import.meta.url);
const NUNITO = {
  regular: require.resolve('@fontsource/nunito/files/nunito-latin-400-normal.woff'),
  bold: require.resolve('@fontsource/nunito/files/nunito-latin-700-normal.woff'),
};

const SIDE = 50;
const TOP = 68;
const BOTTOM = 56;

function furniture(doc: PDFKit.PDFDocument, sheet: PrintableSheet): void {
  const { count, start } = doc.bufferedPageRange();
  for (let i = start; i < start + count; i += 1) {
    doc.switchToPage(i);
    const { width, height } = doc.page;
    const inner = width - 2 * SIDE;
    // Writing inside the margins would make pdfkit start a new page; lift them while drawing.
    const margins = { ...doc.page.margins };
    doc.page.margins = { top: 0, bottom: 0, left: 0, right: 0 };
    doc.font(FONT.bold).fontSize(10).fillColor(INK).text(sheet.organisation, SIDE, 30, { width: inner * 0.6, lineBreak: false, ellipsis: true });
    doc.font(FONT.regular).fontSize(10).text(sheet.title, SIDE + inner * 0.6, 30, { width: inner * 0.4, align: 'right', lineBreak: false });
    doc.moveTo(SIDE, 46).lineTo(width - SIDE, 46).lineWidth(0.75).strokeColor(ACCENT).stroke();
    doc.font(FONT.regular).fontSize(8).fillColor(INK).text(sheet.footer, SIDE, height - 38, { width: inner * 0.75, lineBreak: false, ellipsis: true });
    doc.text(`Page ${i - start + 1} of ${count}`, SIDE + inner * 0.75, height - 38, { width: inner * 0.25, align: 'right', lineBreak: false });
    doc.page.margins = margins;
  }
}

/** The sheet as PDF bytes, on Letter or A4 as the sheet asks. */
export function renderSheetPdf(sheet: PrintableSheet): Promise<Buffer> {
  const doc = new PDFDocument({
    size: sheet.paper,
    margins: { top: TOP, bottom: BOTTOM, left: SIDE, right: SIDE },
    bufferPages: true,
    info: { Title: `${sheet.title}: ${sheet.subtitle}`, Author: sheet.organisation },
  });
  doc.registerFont(FONT.regular, NUNITO.regular);
  doc.registerFont(FONT.bold, NUNITO.bold);
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  const frame: Frame = { doc, left: SIDE, width: doc.page.width - 2 * SIDE, top: TOP, bottom: doc.page.height - BOTTOM };
  doc.font(FONT.bold).fontSize(20).fillColor(INK).text(sheet.title, SIDE, TOP, { width: frame.width });
  doc.font(FONT.regular).fontSize(11).text(sheet.subtitle, { width: frame.width });
  doc.y += 6;
  for (const section of sheet.sections) {
    drawHeading(frame, section.heading, section.blocks.reduce((n, b) => n + measureBlock(frame, b), 0));
    for (const block of section.blocks) drawBlock(frame, block);
  }
  furniture(doc, sheet);
  doc.end();
  return done;
}
