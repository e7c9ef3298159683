/** Rows to the nursery's response shapes. */
import type { BatchDto, ReadingDto, TreeEventDto, TreeRow } from '../../shared/schemas/nursery.schema.js';
import type { CollectionBatch } from '../db/entities/collection-batch.entity.js';
import type { SalinityReading } from '../db/entities/salinity-reading.entity.js';
import type { Tree } from '../db/entities/tree.entity.js';
import type { TreeEvent } from '../db/entities/tree-event.entity.js';
import { photoUrl, thumbUrl } from './nursery-context.js';

type Named = { id: string; name: string };

export function toBatchDto(b: CollectionBatch): BatchDto {
  const { createdAt, ...rest } = b;
  return { ...rest, createdAt: createdAt.toISOString() };
}

/** A ledger row; load the tree with its `tank` and `batch` relations. */
export function toTreeRow(t: Tree): TreeRow {
  return {
    id: t.id,
    tag: t.tag,
    stage: t.stage,
    tank: t.tank ? { id: t.tank.id, name: t.tank.name } : null,
    batchId: t.batchId,
    batchCode: t.batch?.code ?? null,
    heightCm: t.heightCm,
    leafCount: t.leafCount,
    potHeightCm: t.potHeightCm,
    potMassKg: t.potMassKg,
    healthy: t.healthy,
    reservedWorkdayId: t.reservedWorkdayId,
    siteId: t.siteId,
    plantedOn: t.plantedOn,
    photoId: t.photoId,
    thumbUrl: thumbUrl(t.photoId),
    updatedAt: t.updatedAt.toISOString(),
  };
}

export function toEventDto(e: TreeEvent, people: ReadonlyMap<string, Named>, tanks: ReadonlyMap<string, Named>): TreeEventDto {
  return {
    id: e.id,
    kind: e.kind,
    at: e.at.toISOString(),
    by: e.byId ? (people.get(e.byId) ?? null) : null,
    fromStage: e.fromStage,
    toStage: e.toStage,
    tank: e.tankId ? (tanks.get(e.tankId) ?? { id: e.tankId, name: '' }) : null,
    heightCm: e.heightCm,
    leafCount: e.leafCount,
    healthy: e.healthy,
    note: e.note,
    photoUrl: photoUrl(e.photoId),
    thumbUrl: thumbUrl(e.photoId),
  };
}

export function toReadingDto(r: SalinityReading): ReadingDto {
  return {
    id: r.id,
    tankId: r.tankId,
    takenAt: r.takenAt.toISOString(),
    method: r.method,
    salinityPpt: r.salinityPpt,
    specificGravity: r.specificGravity,
    temperatureC: r.temperatureC,
    note: r.note,
    takenById: r.takenById,
  };
}
