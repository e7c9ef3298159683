import { randomUUID } from 'node:crypto';
import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import type { DataSource, EntityManager } from 'typeorm';
import type { PhotoDto } from '../../shared/schemas/nursery.schema.js';
import type { PhotoStore } from '../adapters/photo-store.js';
import { Photo } from '../db/entities/photo.entity.js';
import { NotFoundError, ValidationError } from '../errors.js';

/** Types we keep, decided by the bytes (magic numbers), never by the file name or the client's header. */
const ALLOWED = new Map([
  ['image/jpeg', 'jpg'],
  ['image/png', 'png'],
  ['image/webp', 'webp'],
]);
export const PHOTO_MAX_BYTES = 8 * 1024 * 1024;
const THUMB_PX = 320;

const thumbName = (storedName: string) => `${storedName.replace(/\.[a-z]+$/, '')}.thumb.jpg`;
export const toPhotoDto = (id: string): PhotoDto => ({ id, url: `/api/photos/${id}`, thumbUrl: `/api/photos/${id}/thumb` });

/** A 320 px JPEG that fits the ledger's rows; rotated upright from EXIF first. */
async function thumbnail(data: Buffer): Promise<Buffer> {
  try {
    return await sharp(data).rotate().resize({ width: THUMB_PX, height: THUMB_PX, fit: 'inside', withoutEnlargement: true }).jpeg({ quality: 80 }).toBuffer();
  } catch {
    throw new ValidationError('The image could not be read', { photo: ['is damaged or not a readable image'] });
  }
}

/** Photo uploads: checked by content, stored outside the web root under a generated name. */
export function createPhotoService(deps: { db: DataSource; store: PhotoStore }) {
  const repo = deps.db.getRepository(Photo);

  async function find(id: string): Promise<Photo> {
    const photo = await repo.findOneBy({ id });
    if (!photo) throw new NotFoundError('Photo');
    return photo;
  }

  return {
    async upload(file: { buffer: Buffer } | undefined, userId: string): Promise<PhotoDto> {
      if (!file || file.buffer.length === 0) throw new ValidationError('Choose a photo to upload', { photo: ['is required'] });
      const type = await fileTypeFromBuffer(file.buffer);
      const ext = type && ALLOWED.get(type.mime);
      if (!type || !ext) throw new ValidationError('Only JPEG, PNG or WebP photos can be uploaded', { photo: ['must be a JPEG, PNG or WebP image'] });
      const thumb = await thumbnail(file.buffer);
      const storedName = `${randomUUID()}.${ext}`;
      await deps.store.write(storedName, file.buffer);
      try {
        await deps.store.write(thumbName(storedName), thumb);
        const photo = await repo.save(repo.create({ storedName, mimeType: type.mime, sizeBytes: file.buffer.length, uploadedById: userId }));
        return toPhotoDto(photo.id);
      } catch (err) {
        await Promise.all([deps.store.remove(storedName), deps.store.remove(thumbName(storedName))]);
        throw err;
      }
    },

    /** The image (or its thumbnail) and its content type. */
    async read(id: string, variant: 'original' | 'thumb'): Promise<{ data: Buffer; mimeType: string }> {
      const photo = await find(id);
      const data = await deps.store.read(variant === 'thumb' ? thumbName(photo.storedName) : photo.storedName);
      if (!data) throw new NotFoundError('Photo file');
      return { data, mimeType: variant === 'thumb' ? 'image/jpeg' : photo.mimeType };
    },

    /** Throws a 400 on `field` unless the photo exists (for records that point at one). */
    async requireExists(tx: EntityManager, photoId: string | null | undefined, field = 'photoId'): Promise<void> {
      if (photoId && !(await tx.getRepository(Photo).existsBy({ id: photoId }))) throw new ValidationError('Unknown photo', { [field]: ['is not an uploaded photo'] });
    },
  };
}
export type PhotoService = ReturnType<typeof createPhotoService>;
