import QRCode from 'qrcode';
import { In, type DataSource } from 'typeorm';
import { CollectionBatch } from '../db/entities/collection-batch.entity.js';
import { Tree } from '../db/entities/tree.entity.js';
import { NotFoundError } from '../errors.js';
import { requireAllFound } from './tree-history.js';

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/**
 * 63 × 50 mm labels, 3 across and 5 down: 189 × 250 mm fits inside both A4 (210 × 297) and US
 * Letter (216 × 279) with 10 mm margins, so one sheet layout prints on either paper.
 */
const STYLE = `
@page { margin: 10mm; }
* { box-sizing: border-box; }
body { margin: 0; font-family: Nunito, Arial, sans-serif; color: #000; background: #fff; }
.hint { margin: 8px 0 12px; font-size: 14px; }
.sheet { display: grid; grid-template-columns: repeat(3, 63mm); grid-auto-rows: 50mm; }
.label { display: flex; align-items: center; gap: 3mm; padding: 3mm; border: 0.2mm dashed #999; break-inside: avoid; page-break-inside: avoid; overflow: hidden; }
.label svg { width: 32mm; height: 32mm; flex: none; }
.tag { font-size: 22pt; font-weight: 800; line-height: 1.1; word-break: break-all; }
.batch { font-size: 10pt; margin-top: 2mm; }
@media print { .hint { display: none; } .label { border-color: #ddd; } }
`;

/** Printable QR label sheets for trees. */
export function createTreeLabelService(deps: { db: DataSource; appUrl: string }) {
  const base = deps.appUrl.replace(/\/+$/, '');

  async function label(tree: Tree): Promise<string> {
    const svg = await QRCode.toString(`${base}/nursery/trees/${tree.id}`, { type: 'svg', margin: 0, errorCorrectionLevel: 'M' });
    const batch = tree.batch ? `<div class="batch">Batch ${escapeHtml(tree.batch.code)}</div>` : '';
    return `<div class="label">${svg}<div><div class="tag">${escapeHtml(tree.tag)}</div>${batch}</div></div>`;
  }

  return {
    /** An HTML page of labels (QR code to the tree's page, tag in large type, batch code) with print CSS. */
    async sheet(q: { ids?: string[]; batchId?: string }): Promise<string> {
      const repo = deps.db.getRepository(Tree);
      let trees: Tree[];
      if (q.batchId) {
        if (!(await deps.db.getRepository(CollectionBatch).existsBy({ id: q.batchId }))) throw new NotFoundError('Batch');
        trees = await repo.find({ where: { batchId: q.batchId }, relations: { batch: true }, order: { tag: 'ASC' } });
      } else {
        const ids = [...new Set(q.ids ?? [])];
        trees = await repo.find({ where: { id: In(ids) }, relations: { batch: true }, order: { tag: 'ASC' } });
        requireAllFound(ids, trees, 'ids');
      }
      const labels = await Promise.all(trees.map(label));
      const title = `Tree labels (${trees.length})`;
      return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>${title}</title><style>${STYLE}</style></head>`
        + `<body><p class="hint">${title}: print at 100% scale on A4 or Letter paper.</p><main class="sheet">${labels.join('')}</main></body></html>`;
    },
  };
}
export type TreeLabelService = ReturnType<typeof createTreeLabelService>;
