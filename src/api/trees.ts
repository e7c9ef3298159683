import { z } from 'zod';
import {
  BatchDto,
  ImportPreview,
  PhotoDto,
  SiteReadinessDto,
  TreeDetail,
  TreeReadinessDto,
  TreeRow,
  type BulkMoveBody,
  type CreateBatchBody,
  type ImportBatchBody,
  type MeasurementBody,
  type TreeStage,
  type UpdateTreeBody,
} from '@shared/schemas/nursery.schema';
import { get, patch, post, postForm, queryString } from './http';

const TreesResponse = z.object({ trees: z.array(TreeRow), total: z.number() });
export type TreePage = z.infer<typeof TreesResponse>;
const TreeResponse = z.object({ tree: TreeRow });
const MoveResponse = z.object({ changed: z.number(), trees: z.array(TreeRow) });
const CreatedBatch = z.object({ batch: BatchDto, trees: z.array(z.object({ id: z.string(), tag: z.string() })) });
export type CreatedBatch = z.infer<typeof CreatedBatch>;
const PhotoResponse = z.object({ photo: PhotoDto });

export interface TreeQuery {
  stage: TreeStage | '';
  tankId: string;
  q: string;
  page: number;
  pageSize: number;
}

const treePath = (id: string) => `/api/trees/${encodeURIComponent(id)}`;

/** Everyone signed in: one page of the ledger. */
export function listTrees(query: TreeQuery): Promise<TreePage> {
  const { stage, tankId, q, page, pageSize } = query;
  return get(`/api/trees${queryString({ stage, tankId, q: q.trim(), page: String(page), pageSize: String(pageSize) })}`, TreesResponse);
}

/** Everyone signed in: a tree with its history and measurements. */
export function fetchTree(id: string): Promise<TreeDetail> {
  return get(treePath(id), TreeDetail);
}

/** Coordinators and admins. */
export async function recordMeasurement(id: string, body: MeasurementBody): Promise<TreeRow> {
  return (await post(`${treePath(id)}/measurements`, body, TreeResponse)).tree;
}

/** Coordinators and admins: pot details, health (with a note for the history) or photo. */
export async function updateTree(id: string, body: UpdateTreeBody): Promise<TreeRow> {
  return (await patch(treePath(id), body, TreeResponse)).tree;
}

/** Everyone signed in: up to 500 trees standing in one tank, in tag order (for a measurement round). */
export async function listTreesInTank(tankId: string): Promise<TreeRow[]> {
  return (await get(`/api/trees${queryString({ tankId, pageSize: '500' })}`, TreesResponse)).trees;
}

/** Coordinators and admins: all listed trees move, or none. */
export function moveTrees(body: BulkMoveBody): Promise<z.infer<typeof MoveResponse>> {
  return post('/api/trees/bulk/move', body, MoveResponse);
}

/** Coordinators and admins: a batch with `count` freshly tagged trees. */
export function createBatch(body: CreateBatchBody): Promise<CreatedBatch> {
  return post('/api/batches', body, CreatedBatch);
}

/** Coordinators and admins: a preview (`commit: false`) or the stored batch (`commit: true`, all rows or none). */
export function previewImport(body: Omit<ImportBatchBody, 'commit'>): Promise<ImportPreview> {
  return post('/api/batches/import', { ...body, commit: false }, ImportPreview);
}

export function commitImport(body: Omit<ImportBatchBody, 'commit'>): Promise<CreatedBatch> {
  return post('/api/batches/import', { ...body, commit: true }, CreatedBatch);
}

/** The printable label sheet (an HTML page, opened in a new tab). */
export function labelsPath(by: { batchId: string } | { ids: string[] }): string {
  return `/api/trees/labels${'batchId' in by ? queryString({ batchId: by.batchId }) : queryString({ ids: by.ids.join(',') })}`;
}

/** Everyone signed in: every tree judged against one site. */
export function fetchSiteReadiness(siteId: string): Promise<SiteReadinessDto> {
  return get(`/api/sites/${encodeURIComponent(siteId)}/readiness`, SiteReadinessDto);
}

/** Everyone signed in: one tree against one site (left out: its tank's target site). */
export function fetchTreeReadiness(treeId: string, siteId?: string): Promise<TreeReadinessDto> {
  return get(`${treePath(treeId)}/readiness${queryString({ siteId })}`, TreeReadinessDto);
}

/** Coordinators and admins: one image, checked by content on the server. */
export async function uploadPhoto(file: File): Promise<PhotoDto> {
  const form = new FormData();
  form.append('photo', file);
  return (await postForm('/api/photos', form, PhotoResponse)).photo;
}

/** The small JPEG the server makes of every uploaded photo. */
export function photoThumbPath(photoId: string): string {
  return `/api/photos/${encodeURIComponent(photoId)}/thumb`;
}
