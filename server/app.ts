import 'reflect-metadata';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import express, { Router, type Express } from 'express';
import session from 'express-session';
import helmet from 'helmet';
import type { DataSource } from 'typeorm';
import { requirePasswordChanged } from './auth/require';
import type { Env } from './env';
import { csrfGuard } from './middleware/csrf';
import { errorHandler, notFoundHandler } from './middleware/error-handler';
import { attachSpeaker, requestSpeaker } from './i18n/request-speaker';
import { createModules } from './modules';
import type { MarkerQueueOptions } from './modules/markers/marker-queue';
import type { ApiModule } from './modules/module';
import { lazyJobRunner, type JobRunner } from './jobs/job-runner';
import { requestLogger } from './observability/logger';
import type { Logger } from 'pino';
import { readiness } from './observability/readiness';
import { serveClient } from './observability/static-client';

export interface AppDeps {
  ds: DataSource;
  env: Pick<Env, 'NODE_ENV' | 'SESSION_SECRET' | 'TRUST_PROXY' | 'LOGIN_RATE_LIMIT' | 'LOGIN_LOCK_AFTER' | 'LOGIN_IP_FAILURE_LIMIT'> &
    Partial<Env>;
  now?: () => Date;
  /** Folder of the built client; served with an SPA fallback when present. */
  clientDir?: string;
  /** Filled by createApp: the caller starts and stops the modules' background work, tests reach the services. */
  control?: { current?: AppControl };
  /** Marker queue settings (tests pass a worker entry, an overrun, a per-studio cap). */
  markerQueue?: MarkerQueueOptions;
  /** Job runner override; by default in-process, or BullMQ on Redis with REDIS_URL. */
  jobs?: JobRunner;
  /** Request log destination (tests pass one to read the lines); the process logger by default. */
  logger?: Logger;
}

/** What createApp built, for the process that runs it (server/index.ts) and for tests. */
export interface AppControl {
  services: AppServices;
  modules: Record<string, ApiModule>;
  /** Starts every module's background work, in mount order. */
  start(): Promise<void>;
  /** Stops it in reverse order (auth last: its sign-in throttle counter), then the job runner. */
  stop(): Promise<void>;
}

export type AppServices = ReturnType<typeof createModules>['services'];

/** How often a signed-in session's 12-hour expiry is moved on (cookie re-issued, store written). */
const RENEW_SESSION_EVERY_MS = 5 * 60 * 1000;

/** Mark a signed-in session changed once per renewal period, so express-session re-issues its cookie. */
const renewSession: express.RequestHandler = (req, _res, next) => {
  const s = req.session as (typeof req.session & { passport?: { user?: unknown }; renewal?: number }) | undefined;
  const period = Math.floor(Date.now() / RENEW_SESSION_EVERY_MS);
  if (s?.passport?.user && s.renewal !== period) {
    s.renewal = period;
    s.touch();
  }
  next();
};

/** Build the Express app. Never listens: server/index.ts does, tests use supertest. */
export function createApp(deps: AppDeps): Express {
  const { ds, env } = deps;
  const now = deps.now ?? (() => new Date());
  const app = express();
  app.disable('x-powered-by');
  if (env.TRUST_PROXY) app.set('trust proxy', 1);
  app.use(requestLogger(deps.logger));

  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'", "'unsafe-inline'"],
          fontSrc: ["'self'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          connectSrc: ["'self'"],
          mediaSrc: ["'self'", 'blob:'],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          upgradeInsecureRequests: null,
        },
      },
      crossOriginEmbedderPolicy: false,
    }),
  );

  const jobs = deps.jobs ?? lazyJobRunner(env.REDIS_URL || undefined);
  const { modules, services } = createModules({ ds, env, now, jobs }, { limits: env, markerQueue: deps.markerQueue });
  const { passport, sessionStore } = services.auth;
  const database = { driver: String(ds.options.type), ping: () => ds.query('SELECT 1') };

  const api = Router();
  api.use(express.json({ limit: '2mb' }));
  // Liveness: the process answers. Readiness (below, once the job runner exists): the database, and
  // Redis and the queues when configured, answer too.
  api.get('/health', (_req, res) => {
    res.json({ ok: true });
  });
  api.get('/health/ready', async (_req, res) => {
    const report = await readiness({ database, redisUrl: env.REDIS_URL || undefined });
    res.status(report.ready ? 200 : 503).json(report);
  });
  api.use(
    session({
      name: 'seamrun.sid',
      secret: env.SESSION_SECRET,
      store: sessionStore,
      resave: false,
      saveUninitialized: false,
      // Rolling expiry, renewed once per RENEW_SESSION_EVERY_MS of use (below) rather than a new signed
      // cookie on every answer: a phone logging bundles all day stays signed in at a fraction of the cost.
      rolling: false,
      proxy: env.TRUST_PROXY,
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        secure: 'auto',
        maxAge: 12 * 60 * 60 * 1000,
      },
    }),
  );
  api.use(renewSession);
  api.use(passport.initialize());
  api.use(passport.session());
  const speakerOf = requestSpeaker((id) => services.studio.studios.get(id));
  api.use(attachSpeaker(speakerOf));
  api.use(csrfGuard);
  api.use(requirePasswordChanged);

  const list: ApiModule[] = Object.values(modules);
  for (const m of list) m.mount(api);
  if (deps.control) {
    deps.control.current = {
      services,
      modules,
      async start() {
        for (const m of list) await m.start?.();
      },
      async stop() {
        for (const m of [...list].reverse()) await m.stop?.();
        await jobs.stop();
      },
    };
  }
  api.use(notFoundHandler);
  api.use(errorHandler(env.NODE_ENV === 'development', speakerOf));
  app.use('/api', api);

  const clientDir = deps.clientDir ?? resolve('dist/client');
  if (existsSync(join(clientDir, 'index.html'))) serveClient(app, clientDir);
  return app;
}
