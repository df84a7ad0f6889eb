import { Router, type ErrorRequestHandler } from 'express';
import multer from 'multer';
import { AppError } from '../../middleware/appError';
import { requireRole } from '../../middleware/requireAuth';
import { validate } from '../../middleware/validate';
import { designParamsSchema, UPLOAD_MAX_BYTES, uploadParamsSchema } from './schemas';
import type { UploadsService } from './service';

// Memory storage: a file is only written after every check passed, so a refused one leaves nothing.
const receive = multer({ storage: multer.memoryStorage(), limits: { fileSize: UPLOAD_MAX_BYTES, files: 1, fields: 0, parts: 1 }, preservePath: true }).single('file');

const multerErrors: ErrorRequestHandler = (error, _req, _res, next) => {
  if (error instanceof multer.MulterError) {
    if (error.code === 'LIMIT_FILE_SIZE') return next(new AppError(413, 'file_too_large', 'A file is at most 10 MB.', { fields: { file: 'A file is at most 10 MB' } }));
    return next(new AppError(400, 'invalid_upload', 'Send one file in the form field "file".', { fields: { file: error.message } }));
  }
  next(error);
};

/** /api/designs/:designId/uploads — list and attach (owner, designer). */
export function designUploadsRouter(uploads: UploadsService): Router {
  const router = Router({ mergeParams: true });
  router.use(requireRole('owner', 'designer'));

  router.get('/', validate({ params: designParamsSchema }), async (req, res) => {
    const { designId } = req.params;
    res.json({ uploads: await uploads.list(designId) });
  });

  router.route('/').post(receive, multerErrors).post(validate({ params: designParamsSchema }), async (req, res) => {
    const { designId } = req.params;
    if (!req.file) throw new AppError(400, 'invalid_upload', 'Send one file in the form field "file".', { fields: { file: 'Choose a file' } });
    const upload = await uploads.add(req.user!, designId, { originalName: req.file.originalname, claimedType: req.file.mimetype, bytes: req.file.buffer });
    res.status(201).json({ upload });
  });
  return router;
}

/** /api/uploads/:id — download, thumbnail, delete (owner, designer). */
export function uploadsRouter(uploads: UploadsService): Router {
  const router = Router();
  router.use(requireRole('owner', 'designer'));

  router.get('/:id/file', validate({ params: uploadParamsSchema }), async (req, res) => {
    const { id } = req.params;
    const { upload, bytes } = await uploads.file(id);
    res.attachment(upload.originalName);
    res.set({ 'Content-Type': upload.mimeType, 'X-Content-Type-Options': 'nosniff', 'Content-Security-Policy': "default-src 'none'; sandbox" }).send(bytes);
  });

  router.get('/:id/thumbnail', validate({ params: uploadParamsSchema }), async (req, res) => {
    const { id } = req.params;
    const bytes = await uploads.thumbnail(id);
    res.set({ 'Content-Type': 'image/webp', 'X-Content-Type-Options': 'nosniff', 'Cache-Control': 'private, max-age=3600', 'Content-Security-Policy': "default-src 'none'; sandbox" }).send(bytes);
  });

  router.delete('/:id', validate({ params: uploadParamsSchema }), async (req, res) => {
    const { id } = req.params;
    await uploads.remove(req.user!, id);
    res.status(204).end();
  });
  return router;
}
