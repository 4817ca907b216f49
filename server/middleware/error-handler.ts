import type { ErrorRequestHandler, RequestHandler } from 'express';
import { isUniqueViolation } from '../db/data-source';
import { AppError } from '../errors';
import { logger } from '../observability/logger';

/** The request id pino-http gave this request, quoted in every error answer so a studio can report it. */
const requestIdOf = (req: { id?: unknown }) => (typeof req.id === 'string' ? { requestId: req.id } : {});

export const notFoundHandler: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'not_found', message: 'No such API route', ...requestIdOf(req) } });
};

/** Shapes every error as { error: { code, message, fields? } }; no stack trace outside development. */
export function errorHandler(isDevelopment: boolean): ErrorRequestHandler {
  return (err, req, res, _next) => {
    const rid = requestIdOf(req);
    if (err instanceof AppError) {
      res.status(err.status).json({
        error: { code: err.code, message: err.message, ...(err.fields ? { fields: err.fields } : {}), ...rid },
      });
      return;
    }
    const e = err as { type?: string; status?: number; code?: string; message?: string; stack?: string };
    if (e.type === 'entity.too.large' || e.code === 'LIMIT_FILE_SIZE') {
      res.status(413).json({ error: { code: 'too_large', message: 'The request or file is too large', ...rid } });
      return;
    }
    if (e.type === 'entity.parse.failed') {
      res.status(400).json({ error: { code: 'validation', message: 'The body is not valid JSON', fields: { body: 'Invalid JSON' }, ...rid } });
      return;
    }
    if (isUniqueViolation(err)) {
      res.status(409).json({ error: { code: 'conflict', message: 'That record conflicts with one already saved', ...rid } });
      return;
    }
    if (process.env.NODE_ENV !== 'test' || process.env.SEAMRUN_LOG_ERRORS) {
      const log = (req as { log?: typeof logger }).log ?? logger;
      log.error({ err }, 'Unexpected error');
    }
    res.status(500).json({
      error: {
        code: 'internal',
        message: 'Something went wrong on the server',
        ...rid,
        ...(isDevelopment && e.stack ? { stack: e.stack } : {}),
      },
    });
  };
}
