import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { PhotoIdParams } from '../../shared/schemas/nursery.schema.js';
import { AppError, ValidationError } from '../errors.js';
import { currentUser, requireAuth, requireRole } from '../middleware/auth.js';
import { PHOTO_MAX_BYTES, type PhotoService } from '../services/photo.service.js';

/**
 * multer with memory storage (the bytes are checked before anything is written); its errors are
 * turned into AppErrors here so the shared error handler answers 413/400 in the shared shape.
 */
function photoUpload(): RequestHandler {
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: PHOTO_MAX_BYTES, files: 1, fields: 5, parts: 6 } }).single('photo');
  return (req, res, next) => {
    upload(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return next(new AppError(413, 'payload_too_large', `Photos may be at most ${PHOTO_MAX_BYTES / 1024 / 1024} MB`, { photo: ['is too large'] }));
        return next(new ValidationError('The upload could not be read', { [err.field ?? 'photo']: [err.message] }));
      }
      next(new ValidationError('The upload could not be read', { photo: ['send one image as multipart/form-data field "photo"'] }));
    });
  };
}

/** `/api/photos`: coordinators and admins upload; everyone signed in views. */
export function photoRouter(deps: { photos: PhotoService }): Router {
  const r = Router();
  r.use(requireAuth);

  r.post('/', requireRole('coordinator', 'admin'), photoUpload(), async (req, res) => {
    res.status(201).json({ photo: await deps.photos.upload(req.file, currentUser(req).id) });
  });
  r.get('/:id', async (req, res) => {
    const { data, mimeType } = await deps.photos.read(PhotoIdParams.parse(req.params).id, 'original');
    res.type(mimeType).set('Cache-Control', 'private, max-age=86400').send(data);
  });
  r.get('/:id/thumb', async (req, res) => {
    const { data, mimeType } = await deps.photos.read(PhotoIdParams.parse(req.params).id, 'thumb');
    res.type(mimeType).set('Cache-Control', 'private, max-age=86400').send(data);
  });
  return r;
}
