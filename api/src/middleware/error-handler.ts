import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { Logger } from 'pino';
import { AppError } from '../errors';

interface HttpLikeError {
  type?: string;
  status?: number;
  statusCode?: number;
  code?: string;
  limit?: number;
}

/** Body-parser and csrf-sync errors carry a status; map them onto the API's error codes. */
function fromHttpError(error: HttpLikeError): AppError | undefined {
  if (error.type === 'entity.parse.failed') return new AppError(400, 'malformed_json', 'The request body is not valid JSON.');
  if (error.type === 'entity.too.large') {
    return new AppError(413, 'payload_too_large', `The request body is larger than the limit of ${error.limit ?? '?'} bytes.`);
  }
  if (error.code === 'EBADCSRFTOKEN') {
    return new AppError(403, 'csrf_invalid', 'The security token is missing or out of date. Reload the page and try again.');
  }
  if (error.type === 'encoding.unsupported' || error.type === 'charset.unsupported') {
    return new AppError(415, 'unsupported_encoding', 'The request body must be UTF-8 JSON.');
  }
  return undefined;
}

export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (error: unknown, req, res, _next) => {
    const known = error instanceof AppError ? error : fromHttpError((error ?? {}) as HttpLikeError);
    if (!known) {
      logger.error({ err: error, method: req.method, url: req.originalUrl }, 'unhandled error');
      res.status(500).json({
        error: { code: 'internal', message: 'Something went wrong on our side. Try again; if it keeps happening, tell your admin.' },
      });
      return;
    }
    if ('retryAfterSeconds' in known && typeof known.retryAfterSeconds === 'number') {
      res.setHeader('Retry-After', String(known.retryAfterSeconds));
    }
    res
      .status(known.status)
      .json({ error: { code: known.code, message: known.message, ...(known.details ? { details: known.details } : {}) } });
  };
}

/** Unknown /api routes answer in JSON, never with the web app's HTML. */
export const apiNotFound: RequestHandler = (req, res) => {
  res
    .status(404)
    .json({ error: { code: 'route_not_found', message: `There is no API route ${req.method} ${req.originalUrl.split('?')[0]}.` } });
};
