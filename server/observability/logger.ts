import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import { pino, type Logger } from 'pino';
import { pinoHttp } from 'pino-http';

/**
 * Paths removed from every log line: credentials, PINs, session ids, payment keys and cookies, wherever
 * they appear in a logged object (request bodies are never logged; this is the second line of defence).
 */
export const REDACTED_PATHS = [
  'password',
  'pin',
  'newPassword',
  'currentPassword',
  'secret',
  'token',
  'sessionId',
  'sid',
  'idempotencyKey',
  'paymentKey',
  'apiKey',
  '*.password',
  '*.pin',
  '*.newPassword',
  '*.currentPassword',
  '*.secret',
  '*.token',
  '*.sessionId',
  '*.sid',
  '*.idempotencyKey',
  '*.paymentKey',
  '*.apiKey',
  'req.headers.cookie',
  'req.headers.authorization',
  'res.headers["set-cookie"]',
];

/** Silent under tests unless LOG_LEVEL asks; info otherwise. */
function defaultLevel(): string {
  if (process.env.LOG_LEVEL) return process.env.LOG_LEVEL;
  return process.env.NODE_ENV === 'test' || process.env.VITEST ? 'silent' : 'info';
}

/** One JSON line per event on stdout (or the given stream), secrets redacted. */
export function createLogger(options: { level?: string; stream?: NodeJS.WritableStream } = {}): Logger {
  return pino(
    {
      level: options.level ?? defaultLevel(),
      base: { service: 'seamrun' },
      redact: { paths: REDACTED_PATHS, censor: '[redacted]' },
      timestamp: pino.stdTimeFunctions.isoTime,
    },
    options.stream as pino.DestinationStream | undefined,
  );
}

/** The process-wide logger for start-up, jobs and unexpected errors. */
export const logger: Logger = createLogger();

/** A request id from the proxy when it looks like one, else a new UUID. */
function requestIdOf(req: IncomingMessage): string {
  const incoming = req.headers['x-request-id'];
  if (typeof incoming === 'string' && /^[A-Za-z0-9._:-]{8,100}$/.test(incoming)) return incoming;
  return randomUUID();
}

/** The path as the client sent it (Express rewrites `req.url` inside mounted routers), without the query. */
const pathOf = (req: IncomingMessage) => String((req as { originalUrl?: string }).originalUrl ?? req.url).split('?')[0];

interface SignedInRequest extends IncomingMessage {
  user?: { id?: number; studioId?: number };
}

/**
 * pino-http: one line per request when its answer is sent, with the request id (also returned in the
 * `X-Request-Id` header), method, path, status, time, and the studio and person ids once signed in.
 * Headers and bodies are not logged.
 */
export function requestLogger(log: Logger = logger) {
  return pinoHttp({
    logger: log,
    genReqId: (req: IncomingMessage, res: ServerResponse) => {
      const id = requestIdOf(req);
      res.setHeader('X-Request-Id', id);
      return id;
    },
    serializers: {
      req: (req: { id: string; method: string; url: string; raw?: IncomingMessage }) => ({
        id: req.id,
        method: req.method,
        path: req.raw ? pathOf(req.raw) : String(req.url).split('?')[0],
      }),
      res: (res: { statusCode: number }) => ({ status: res.statusCode }),
    },
    customProps: (req: IncomingMessage) => {
      const user = (req as SignedInRequest).user;
      return user ? { studioId: user.studioId, personId: user.id } : {};
    },
    customLogLevel: (_req, res, err) => (err || res.statusCode >= 500 ? 'error' : res.statusCode >= 400 ? 'warn' : 'info'),
    customSuccessMessage: (req, res) => `${req.method} ${pathOf(req)} ${res.statusCode}`,
    customErrorMessage: (req, res) => `${req.method} ${pathOf(req)} ${res.statusCode}`,
    autoLogging: { ignore: (req) => req.url === '/api/health' },
  });
}
