import multer from 'multer';
import type { RequestHandler } from 'express';
import { ApiError } from './errors.js';

function megabytes(bytes: number): string {
  const mb = bytes / (1024 * 1024);
  return `${mb >= 10 ? Math.round(mb) : Math.round(mb * 10) / 10} MB`;
}

/**
 * Receives one multipart file (field `file`) into `dir`, as `req.file`. A file over the limit is
 * answered 413 with the limit in the message; multer removes what it had written.
 */
export function receiveFile(dir: string, maxBytes: number, what: string): RequestHandler {
  const receive = multer({ dest: dir, limits: { fileSize: maxBytes, files: 1, fields: 2, parts: 3 } }).single('file');
  return (req, res, next) =>
    receive(req, res, (err: unknown) => {
      if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') {
        return next(new ApiError(413, 'payload_too_large', `The file is larger than ${megabytes(maxBytes)}, the most this server accepts for ${what}.`, { file: `Larger than ${megabytes(maxBytes)}.` }));
      }
      next(err);
    });
}
