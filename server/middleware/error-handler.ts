import type { ErrorRequestHandler, Request, RequestHandler } from 'express';
import { isUniqueViolation } from '../db/data-source';
import { AppError } from '../errors';
import { speaker, type Speaker } from '../../shared/i18n/speak';
import { logger } from '../observability/logger';

/** The request id pino-http gave this request, quoted in every error answer so a studio can report it. */
const requestIdOf = (req: { id?: unknown }) => (typeof req.id === 'string' ? { requestId: req.id } : {});

export const notFoundHandler: RequestHandler = (_req, _res, next) => {
  next(new AppError(404, 'not_found', 'No such API route'));
};

/** Who an answer speaks to; English when no one says otherwise. */
export type SpeakerOf = (req: Request) => Promise<Speaker>;
const ENGLISH = speaker({ language: 'en' });

/**
 * Shapes every error as { error: { code, message, fields? } } in the person's language (English answers are
 * the same bytes as ever); no stack trace outside development.
 */
export function errorHandler(isDevelopment: boolean, speakerOf: SpeakerOf = async () => ENGLISH): ErrorRequestHandler {
  return async (err, req, res, _next) => {
    const who = await speakerOf(req).catch(() => ENGLISH);
    const rid = requestIdOf(req);
    const e = err as { type?: string; status?: number; code?: string; message?: string; stack?: string };
    let known: AppError | undefined;
    if (err instanceof AppError) known = err;
    else if (e.type === 'entity.too.large' || e.code === 'LIMIT_FILE_SIZE') known = new AppError(413, 'too_large', 'The request or file is too large');
    else if (e.type === 'entity.parse.failed') known = new AppError(400, 'validation', 'The body is not valid JSON', { body: 'Invalid JSON' });
    else if (isUniqueViolation(err)) known = new AppError(409, 'conflict', 'That record conflicts with one already saved');
    if (known) {
      const { message, fields } = known.speak(who);
      res.status(known.status).json({ error: { code: known.code, message, ...(fields ? { fields } : {}), ...rid } });
      return;
    }
    if (process.env.NODE_ENV !== 'test' || process.env.SEAMRUN_LOG_ERRORS) {
      const log = (req as { log?: typeof logger }).log ?? logger;
      log.error({ err }, 'Unexpected error');
    }
    res.status(500).json({
      error: {
        code: 'internal',
        message: new AppError(500, 'internal', 'Something went wrong on the server').speak(who).message,
        ...rid,
        ...(isDevelopment && e.stack ? { stack: e.stack } : {}),
      },
    });
  };
}
