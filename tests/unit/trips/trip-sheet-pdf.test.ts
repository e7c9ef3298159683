import { describe, expect, it } from 'vitest';
import type { PrintableSheet } from '../../../server/domain/trips/trip-sheet-types.js';
import { renderSheetPdf } from '../../../server/services/trip-sheet-pdf.js';

async function pages(pdf: Buffer): Promise<{ text: string; size: number[] }[]> {
  const pdfjs = await import('pdfjs-dist/legacy/build/pdf.mjs');
  const doc = await pdfjs.getDocument({ data: new Uint8Array(pdf) }).promise;
  const out = [];
  for (let i = 1; i <= doc.numPages; i += 1) {
    const page = await doc.getPage(i);
    const items = (await page.getTextContent()).items.map((item) => ('str' in item ? item.str : ''));
    out.push({ text: items.join(' ').replace(/\s+/g, ' '), size: page.view.map(Math.round) });
  }
  return out;
}

const longSheet = (paper: PrintableSheet['paper']): PrintableSheet => ({
  title: 'Trip sheet',
  organisation: 'Test Shoreline Trust',
  subtitle: 'Spring planting',
  footer: 'Trip sheet footer',
  fileName: 'trip-sheet.pdf',
  paper,
  sections: [
    { heading: 'The day', blocks: [{ kind: 'facts', rows: [{ label: 'Site', value: 'Heron Point' }] }] },
    {
      heading: 'Runs',
      blocks: [{
        kind: 'table',
        columns: [{ label: 'Run', width: 0.2 }, { label: 'Aboard', width: 0.8 }],
        rows: Array.from({ length: 90 }, (_, i) => [String(i + 1), `Paddler number ${i + 1}`]),
        empty: 'No runs.',
      }],
    },
  ],
});

describe('renderSheetPdf', () => {
  it('repeats the organisation, the title and the table header on every page, and numbers the pages', async () => {
    const read = await pages(await renderSheetPdf(longSheet('LETTER')));
    expect(read.length).toBeGreaterThan(1);
    read.forEach((page, i) => {
      expect(page.text).toContain('Test Shoreline Trust');
      expect(page.text).toContain('Trip sheet');
      expect(page.text).toContain(`Page ${i + 1} of ${read.length}`);
      expect(page.text).toMatch(/Run Aboard/);
    });
    const all = read.map((p) => p.text).join(' ');
    for (const n of [1, 45, 90]) expect(all).toContain(`${n} Paddler number ${n} `);
  });

  // ISO 216 A4 is 210 × 297 mm = 595.28 × 841.89 pt; US Letter is 8.5 × 11 in = 612 × 792 pt.
  it.each([
    ['A4', [0, 0, 595, 842]],
    ['LETTER', [0, 0, 612, 792]],
  ] as const)('prints on %s paper', async (paper, size) => {
    const [first] = await pages(await renderSheetPdf({ ...longSheet(paper), sections: [] }));
    expect(first?.size).toEqual(size);
  });
});
