import { unlink } from 'node:fs/promises';
import multer from 'multer';
import type { RequestHandler } from 'express';
import { characterProblem } from '../../shared/schemas/text.js';
import { ApiError } from './errors.js';

function megabytes(bytes: number): string {
  const mb = bytes / (1024 * 1024);
  return `${mb >= 10 ? Math.round(mb) : Math.round(mb * 10) / 10} MB`;
}

const malformed = (message: string, fields?: Record<string, string>) => new ApiError(400, 'malformed_upload', message, fields);

/** A multipart Content-Type without a usable boundary (RFC 2046 section 5.1.1 requires one). */
function lacksBoundary(contentType: string | undefined): boolean {
  return /^\s*multipart\//i.test(contentType ?? '') && !/;\s*boundary\s*=\s*("[^"]+"|[^\s;"]+)/i.test(contentType ?? '');
}

/** busboy's errors about the body are plain Errors; the disk's carry a `code` such as ENOSPC. */
function isParseError(err: unknown): err is Error {
  return err instanceof Error && !('code' in err) && !('syscall' in err);
}

function uploadProblem(err: unknown): ApiError | null {
  if (err instanceof multer.MulterError) {
    return malformed(`The upload could not be read: ${err.message.toLowerCase()}. Send one file in the field “file”.`, err.field ? { [err.field]: 'Unexpected.' } : undefined);
  }
  if (!isParseError(err)) return null;
  if (/boundary/i.test(err.message)) return malformed('The upload has no multipart boundary. Send the file as multipart/form-data with a boundary, as a browser form does. Nothing was kept.');
  if (/unexpected end/i.test(err.message)) return malformed('The upload ended before its last part was complete, so it was not read. Nothing was kept; send the file again.');
  if (/part header/i.test(err.message)) {
    return malformed('A part header of the upload could not be read (for example a control character or a line break inside the file name). Nothing was kept.', { file: 'Its part header could not be read.' });
  }
  return malformed(`The upload could not be read as multipart/form-data (${err.message}). Nothing was kept.`);
}

/**
 * Receives one multipart file (field `file`) into `dir`, as `req.file`. A file over the limit is
 * answered 413 with the limit in the message; a body that is not well-formed multipart, or a file
 * name with a character the text rule refuses, 400 `malformed_upload`. multer removes what it had
 * written on every error, and the received file never outlives its request.
 */
export function receiveFile(dir: string, maxBytes: number, what: string): RequestHandler {
  const receive = multer({
    dest: dir,
    limits: { fileSize: maxBytes, files: 1, fields: 2, parts: 3 },
    fileFilter: (_req, file, accept) => {
      const problem = characterProblem(file.originalname, 'line', 'The file name');
      if (problem) accept(malformed(`${problem} Rename the file and upload it again.`, { file: problem }));
      else accept(null, true);
    },
  }).single('file');
  return (req, res, next) => {
    if (lacksBoundary(req.headers['content-type'])) return next(uploadProblem(new Error('Boundary not found')));
    res.once('close', () => {
      if (req.file) void unlink(req.file.path).catch(() => undefined);
    });
    receive(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') {
        return next(new ApiError(413, 'payload_too_large', `The file is larger than ${megabytes(maxBytes)}, the most this server accepts for ${what}.`, { file: `Larger than ${megabytes(maxBytes)}.` }));
      }
      next(err instanceof ApiError ? err : (uploadProblem(err) ?? err));
    });
  };
}
