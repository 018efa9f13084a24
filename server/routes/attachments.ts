/**
 * Coil attachments: list and upload under /api/coils/:coilId/attachments, download and preview links and delete
 * under /api/attachments/:id. Never mounted under /api/review: review links do not expose attachments.
 */
import type { Request, Response } from 'express';
import { Router } from 'express';
import multer from 'multer';
import { AppError } from '@/server/errors';
import { signedIn } from '@/server/middleware/session';
import { param } from '@/server/routes/helpers';
import { attachmentService, fileTooLarge, MAX_ATTACHMENT_BYTES } from '@/server/services/attachments';
import type { ServiceDeps } from '@/server/services/context';
import { createObjectStore, type ObjectStore } from '@/server/storage/object-store';

const parseUpload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_ATTACHMENT_BYTES, files: 1, fields: 4, parts: 5 },
  // Browsers send file names as raw UTF-8; busboy's default would read them as Latin-1.
  defParamCharset: 'utf8',
}).single('file');

function uploadError(err: unknown): AppError {
  if (err instanceof multer.MulterError) {
    switch (err.code) {
      case 'LIMIT_FILE_SIZE':
        return fileTooLarge();
      case 'LIMIT_FILE_COUNT':
        return new AppError(400, 'one_file_only', 'Attach one file at a time.');
      case 'LIMIT_UNEXPECTED_FILE':
        return new AppError(400, 'file_missing', 'Send the file in the form field "file".', { file: 'Required' });
      default:
        return new AppError(400, 'bad_upload', 'The upload could not be read. Try again.');
    }
  }
  return new AppError(400, 'bad_upload', 'The upload could not be read. Try again.');
}

/** The single "file" part, held in memory (at most 20 MB); undefined when the form has none. */
function readFile(req: Request, res: Response): Promise<Express.Multer.File | undefined> {
  return new Promise((resolve, reject) => {
    parseUpload(req, res, (err?: unknown) => (err ? reject(uploadError(err)) : resolve(req.file)));
  });
}

export function attachmentRouter(deps: ServiceDeps, store: ObjectStore = createObjectStore(deps.config.s3)): Router {
  const attachments = attachmentService(deps, store);
  if (!deps.config.s3.endpoint && deps.config.s3.accessKeyId === 'S3RVER' && !deps.config.fakeServices) {
    deps.logger.warn('attachments: no S3_ENDPOINT or S3 credentials set (and FAKE_SERVICES is off), so uploads will fail');
  }
  const r = Router();

  r.get('/coils/:coilId/attachments', async (req, res) => {
    res.json({ attachments: await attachments.list(signedIn(req).userId, param(req, 'coilId')) });
  });

  r.post('/coils/:coilId/attachments', async (req, res) => {
    const { userId } = signedIn(req);
    const coilId = param(req, 'coilId');
    // Refuse before reading up to 20 MB for someone who may not attach anything here.
    await attachments.assertCanUpload(userId, coilId);
    const file = await readFile(req, res);
    if (!file) throw new AppError(400, 'file_missing', 'Choose a file to attach (form field "file").', { file: 'Required' });
    const attachment = await attachments.upload(userId, coilId, { originalName: file.originalname, bytes: file.buffer });
    res.status(201).json({ attachment });
  });

  r.get('/attachments/:id/download', async (req, res) => {
    res.json(await attachments.downloadLink(signedIn(req).userId, param(req, 'id')));
  });

  r.get('/attachments/:id/thumbnail', async (req, res) => {
    res.json(await attachments.thumbnailLink(signedIn(req).userId, param(req, 'id')));
  });

  r.delete('/attachments/:id', async (req, res) => {
    await attachments.remove(signedIn(req).userId, param(req, 'id'));
    res.status(204).end();
  });

  return r;
}
