import type { NextFunction, Request, RequestHandler, Response } from 'express';
import multer from 'multer';
import { UPLOAD_LIMITS } from '#shared/lab/upload-limits.ts';
import { AppError } from '../core/app-error.ts';

const MB = 1024 * 1024;

/**
 * multipart/form-data with repeated `files` and an optional `manifest`, held in memory and
 * bounded: 5 MB a file, 2,000 files, 200 MB a batch. Over a limit: 413 naming the limit; a field
 * of another name: 422.
 */
export function uploadFiles(): RequestHandler {
  const parse = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: UPLOAD_LIMITS.fileBytes, files: UPLOAD_LIMITS.files + 1, fields: 20, parts: UPLOAD_LIMITS.files + 21 },
  }).fields([
    { name: 'files', maxCount: UPLOAD_LIMITS.files },
    { name: 'manifest', maxCount: 1 },
  ]);
  return (req: Request, res: Response, next: NextFunction) => {
    const declared = Number(req.headers['content-length'] ?? 0);
    if (declared > UPLOAD_LIMITS.batchBytes + MB) {
      return next(new AppError('payload_too_large', `A batch may hold at most ${UPLOAD_LIMITS.batchBytes / MB} MB; this one is ${Math.ceil(declared / MB)} MB. Upload it in parts.`, { limit: 'batchBytes', max: UPLOAD_LIMITS.batchBytes }));
    }
    parse(req, res, (err: unknown) => {
      if (!err) {
        const files = (req.files as Record<string, Express.Multer.File[]> | undefined)?.files ?? [];
        const total = files.reduce((s, f) => s + f.size, 0);
        if (total > UPLOAD_LIMITS.batchBytes) {
          return next(new AppError('payload_too_large', `A batch may hold at most ${UPLOAD_LIMITS.batchBytes / MB} MB. Upload it in parts.`, { limit: 'batchBytes', max: UPLOAD_LIMITS.batchBytes }));
        }
        return next();
      }
      if (err instanceof multer.MulterError) {
        switch (err.code) {
          case 'LIMIT_FILE_SIZE':
            return next(new AppError('payload_too_large', `${err.field === 'manifest' ? 'The manifest' : 'A file'} is larger than ${UPLOAD_LIMITS.fileBytes / MB} MB, the limit for one instrument file.`, { limit: 'fileBytes', max: UPLOAD_LIMITS.fileBytes }));
          case 'LIMIT_FILE_COUNT':
          case 'LIMIT_PART_COUNT':
            return next(new AppError('payload_too_large', `A batch may hold at most ${UPLOAD_LIMITS.files} files. Upload it in parts.`, { limit: 'files', max: UPLOAD_LIMITS.files }));
          case 'LIMIT_UNEXPECTED_FILE':
            // multer reports a field over its maxCount with this code too.
            if (err.field === 'files' || err.field === 'manifest') {
              return next(new AppError('payload_too_large', err.field === 'files' ? `A batch may hold at most ${UPLOAD_LIMITS.files} files. Upload it in parts.` : 'Send one manifest at most.', { limit: err.field === 'files' ? 'files' : 'manifest', max: err.field === 'files' ? UPLOAD_LIMITS.files : 1 }));
            }
            return next(new AppError('validation_failed', `Files go in the field "files" (and a manifest in "manifest"), not "${err.field}".`, [{ path: `body.${err.field}`, message: 'Unexpected file field.' }]));
          default:
            return next(new AppError('validation_failed', `The upload could not be read: ${err.message}.`, [{ path: 'body', message: err.message }]));
        }
      }
      // A malformed multipart body (busboy's own errors) is the client's fault, not ours.
      return next(new AppError('bad_request', 'The upload is not a well-formed multipart form.'));
    });
  };
}
