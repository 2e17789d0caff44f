import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { ErrorEnvelope } from '../../shared/schemas/common.js';
import { ApiError } from './errors.js';

function send(res: Parameters<RequestHandler>[1], status: number, error: ErrorEnvelope['error']) {
  if (error.retryAfterSeconds !== undefined) res.setHeader('Retry-After', String(error.retryAfterSeconds));
  res.status(status).json({ error });
}

export const apiNotFound: RequestHandler = (req, res) => {
  send(res, 404, { code: 'not_found', message: `No API route matches ${req.method} ${req.originalUrl.split('?')[0]}.` });
};

export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  if (res.headersSent) return;
  if (req.socket?.destroyed) return; // the client went away mid-request (an interrupted upload): nobody to answer
  if (err instanceof ApiError) {
    const { code, message, fields, retryAfterSeconds } = err;
    return send(res, err.status, { code, message, ...(fields && { fields }), ...(retryAfterSeconds !== undefined && { retryAfterSeconds }) });
  }
  if (err?.code === 'EBADCSRFTOKEN') {
    return send(res, 403, { code: 'csrf', message: 'The security token of this page is missing or out of date. Reload the page and try again.' });
  }
  if (err?.name === 'MulterError') {
    if (err.code === 'LIMIT_FILE_SIZE') return send(res, 413, { code: 'payload_too_large', message: 'The file is larger than this server accepts.', fields: { file: 'Too large.' } });
    return send(res, 400, { code: 'bad_request', message: `The upload could not be read: ${String(err.message).toLowerCase()}.`, ...(err.field && { fields: { [err.field]: 'Unexpected.' } }) });
  }
  if (err?.type === 'entity.parse.failed') {
    return send(res, 400, { code: 'bad_request', message: 'The request body is not valid JSON.' });
  }
  if (err?.type === 'entity.too.large') {
    return send(res, 413, { code: 'payload_too_large', message: 'The request body is too large.' });
  }
  if (typeof err?.status === 'number' && err.status >= 400 && err.status < 500) {
    return send(res, err.status, { code: 'bad_request', message: String(err.message ?? 'Bad request.') });
  }
  req.log?.(err);
  console.error(err);
  send(res, 500, { code: 'internal', message: 'Something went wrong on our side. Nothing was changed; try again.' });
};

declare module 'express-serve-static-core' {
  interface Request {
    log?: (err: unknown) => void;
  }
}
