import type { DataSource, EntityManager } from 'typeorm';
import { TreeStage, type BatchDto, type BatchInfoBody, type CreateBatchBody, type ImportBatchBody, type ImportPreview } from '../../shared/schemas/nursery.schema.js';
import { CollectionBatch } from '../db/entities/collection-batch.entity.js';
import { Tank } from '../db/entities/tank.entity.js';
import { TreeEvent } from '../db/entities/tree-event.entity.js';
import { Tree } from '../db/entities/tree.entity.js';
import { NotFoundError, ValidationError } from '../errors.js';
import { dayIn, nurserySettings } from './nursery-context.js';
import type { PhotoService } from './photo.service.js';
import { readImportCsv, rowErrorFields } from './tree-import-csv.js';
import { batchCode, lockNextNumbers, treeTag } from './tree-tags.js';
import { toBatchDto } from './tree-view.js';

interface NewTree {
  stage: TreeStage;
  tankId: string | null;
  heightCm: number | null;
  potHeightCm: number | null;
  potMassKg: number | null;
  note: string;
}
export interface CreatedBatch {
  batch: BatchDto;
  trees: { id: string; tag: string }[];
}
export type ImportOutcome = { committed: false; preview: ImportPreview } | { committed: true; created: CreatedBatch };

const COLLECTED: NewTree = { stage: 'collected', tankId: null, heightCm: null, potHeightCm: null, potMassKg: null, note: '' };

/** Collection batches and the trees they bring into the ledger. */
export function createTreeBatchService(deps: { db: DataSource; clock: () => Date; photos: PhotoService }) {
  async function checkInfo(tx: EntityManager, info: BatchInfoBody, prefix = ''): Promise<void> {
    const today = dayIn(deps.clock(), (await nurserySettings(tx)).timeZone);
    if (info.collectedOn > today) throw new ValidationError('The collection date is in the future', { [`${prefix}collectedOn`]: ['cannot be after today'] });
    await deps.photos.requireExists(tx, info.photoId, `${prefix}photoId`);
  }

  /** The batch, its trees with fresh tags and each tree's first history entries, in the caller's transaction. */
  async function insertBatch(tx: EntityManager, info: BatchInfoBody, trees: NewTree[], userId: string): Promise<CreatedBatch> {
    const next = await lockNextNumbers(tx);
    const { latitude = null, longitude = null, photoId = null, ...rest } = info;
    const batch = await tx.getRepository(CollectionBatch).save(tx.getRepository(CollectionBatch).create({ ...rest, latitude, longitude, photoId, code: batchCode(next.batch), count: trees.length }));
    const rows = trees.map((t, i) => ({ tag: treeTag(next.tree + i), batchId: batch.id, stage: t.stage, tankId: t.tankId, heightCm: t.heightCm, potHeightCm: t.potHeightCm, potMassKg: t.potMassKg }));
    const inserted = await tx.getRepository(Tree).insert(rows);
    const ids = inserted.identifiers.map((x) => String(x.id));
    const at = deps.clock();
    const events = trees.flatMap((t, i) => {
      const base = { treeId: ids[i]!, at, byId: userId, tankId: t.tankId };
      const first = { ...base, kind: 'stage' as const, fromStage: null, toStage: t.stage, note: t.note || `Entered the ledger with batch ${batch.code}` };
      return t.heightCm === null ? [first] : [first, { ...base, kind: 'measurement' as const, heightCm: t.heightCm }];
    });
    for (let i = 0; i < events.length; i += 1000) await tx.getRepository(TreeEvent).insert(events.slice(i, i + 1000));
    return { batch: toBatchDto(batch), trees: ids.map((id, i) => ({ id, tag: rows[i]!.tag })) };
  }

  async function tanksByName(tx: EntityManager): Promise<Map<string, { id: string }>> {
    return new Map((await tx.getRepository(Tank).find()).map((t) => [t.name.trim().toLowerCase(), { id: t.id }]));
  }

  return {
    async create(body: CreateBatchBody, userId: string): Promise<CreatedBatch> {
      const { count, ...info } = body;
      return deps.db.transaction(async (tx) => {
        await checkInfo(tx, info);
        return insertBatch(tx, info, Array.from({ length: count }, () => COLLECTED), userId);
      });
    },

    async list(): Promise<BatchDto[]> {
      return (await deps.db.getRepository(CollectionBatch).find({ order: { collectedOn: 'DESC', code: 'DESC' } })).map(toBatchDto);
    },

    async get(id: string): Promise<{ batch: BatchDto; trees: { id: string; tag: string; stage: TreeStage }[] }> {
      const batch = await deps.db.getRepository(CollectionBatch).findOneBy({ id });
      if (!batch) throw new NotFoundError('Batch');
      const trees = await deps.db.getRepository(Tree).find({ where: { batchId: id }, order: { tag: 'ASC' }, select: { id: true, tag: true, stage: true } });
      return { batch: toBatchDto(batch), trees: trees.map(({ id: treeId, tag, stage }) => ({ id: treeId, tag, stage })) };
    },

    /** Checks every CSV row; with `commit` and no bad row stores the batch and its trees in one transaction. */
    async importCsv(body: ImportBatchBody, userId: string): Promise<ImportOutcome> {
      return deps.db.transaction(async (tx) => {
        await checkInfo(tx, body.batch, 'batch.');
        const preview = readImportCsv(body.csv, await tanksByName(tx));
        if (!body.commit) return { committed: false, preview };
        if (preview.rows.length === 0) throw new ValidationError('The CSV has no trees', { csv: ['has no rows under the header'] });
        if (!preview.valid) {
          const bad = preview.rows.filter((r) => !r.ok).length;
          throw new ValidationError(`${bad} of ${preview.rows.length} rows have errors; nothing was stored`, rowErrorFields(preview.rows));
        }
        const trees = preview.rows.map(({ values: v }) => ({ ...v, stage: TreeStage.parse(v.stage) }));
        return { committed: true, created: await insertBatch(tx, body.batch, trees, userId) };
      });
    },
  };
}
export type TreeBatchService = ReturnType<typeof createTreeBatchService>;
