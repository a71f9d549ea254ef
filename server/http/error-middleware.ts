import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { Logger } from 'pino';
import { AppError } from '../core/app-error.ts';
import { isDatabaseUnavailable } from '../db/is-database-unavailable.ts';

/** Unknown /api paths answer in the API's own error shape rather than with the client app. */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new AppError('not_found', `No API endpoint ${req.method} ${req.originalUrl}.`));
};

/**
 * The one error middleware: `{ error: { code, message, details } }`. Known errors keep their
 * code; unknown ones become a generic 500 with the request id, logged with the stack.
 */
export function errorMiddleware(logger: Logger): ErrorRequestHandler {
  return (err, req, res, _next) => {
    const requestId = String(req.id ?? '');
    if (err instanceof AppError) {
      for (const [k, v] of Object.entries(err.headers)) res.setHeader(k, v);
      res.status(err.status).json({ error: { code: err.code, message: err.message, details: err.details ?? null } });
      return;
    }
    // Malformed JSON and oversized bodies from express.json().
    if (err && typeof err === 'object' && 'type' in err && (err as { type: string }).type === 'entity.parse.failed') {
      res.status(400).json({ error: { code: 'bad_request', message: 'The request body is not valid JSON.', details: null } });
      return;
    }
    if (err && typeof err === 'object' && 'type' in err && (err as { type: string }).type === 'entity.too.large') {
      res.status(413).json({ error: { code: 'bad_request', message: 'The request body is too large.', details: null } });
      return;
    }
    if (isDatabaseUnavailable(err)) {
      logger.warn({ err, requestId }, 'database unavailable');
      res.status(503).json({
        error: { code: 'database_unavailable', message: 'The database is not reachable. Try again shortly.', details: { requestId } },
      });
      return;
    }
    logger.error({ err, requestId }, 'unhandled error');
    res.status(500).json({
      error: { code: 'internal', message: `Something went wrong on our side (request ${requestId}).`, details: { requestId } },
    });
  };
}
