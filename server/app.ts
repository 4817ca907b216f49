import 'reflect-metadata';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import express, { Router, type Express } from 'express';
import session from 'express-session';
import helmet from 'helmet';
import type { DataSource } from 'typeorm';
import { configurePassport } from './auth/passport';
import { requirePasswordChanged } from './auth/require';
import { DatabaseSessionStore } from './auth/session-store';
import { createThrottleCounter, SharedThrottleStore } from './auth/throttle-store';
import type { Env } from './env';
import { csrfGuard } from './middleware/csrf';
import { errorHandler, notFoundHandler } from './middleware/error-handler';
import { createAuditRepository } from './modules/audit/audit.repository';
import { auditRoutes } from './modules/audit/audit.routes';
import { authRoutes } from './modules/auth/auth.routes';
import { createAuthService } from './modules/auth/auth.service';
import { createFloorDeviceRepository } from './modules/auth/floor-device.repository';
import { createSignInThrottleRepository } from './modules/auth/sign-in-throttle.repository';
import { createBatchRepository } from './modules/batches/batch.repository';
import { batchRoutes } from './modules/batches/batch.routes';
import { createSessionRepository } from './modules/sessions/session.repository';
import { createStudioRepository, studioRoutes } from './modules/studios/studio.routes';
import { createStyleRepository } from './modules/styles/style.repository';
import { styleRoutes } from './modules/styles/style.routes';
import { createUserRepository } from './modules/users/user.repository';
import { userRoutes } from './modules/users/user.routes';
import { createFeatureModules } from './modules';
import type { MarkerQueueOptions } from './modules/markers/marker-queue';
import type { ApiModule, ModuleContext } from './modules/module';
import { createUserService } from './modules/users/user.service';
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
  /** Stops it in reverse order, then the job runner and the sign-in throttle counter. */
  stop(): Promise<void>;
}

export type AppServices = ReturnType<typeof createFeatureModules>['services'];

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

  const audit = createAuditRepository(ds);
  const users = createUserRepository(ds);
  const styles = createStyleRepository(ds);
  const batches = createBatchRepository(ds);
  const studios = createStudioRepository(ds);
  const auth = createAuthService({ ds, users, audit, lockAfter: env.LOGIN_LOCK_AFTER, now });
  const passport = configurePassport(auth);

  const api = Router();
  api.use(express.json({ limit: '2mb' }));
  // Liveness: the process answers. Readiness (below, once the job runner exists): the database, and
  // Redis and the queues when configured, answer too.
  api.get('/health', (_req, res) => {
    res.json({ ok: true });
  });
  api.get('/health/ready', async (_req, res) => {
    const report = await readiness({ ds, redisUrl: env.REDIS_URL || undefined });
    res.status(report.ready ? 200 : 503).json(report);
  });
  api.use(
    session({
      name: 'seamrun.sid',
      secret: env.SESSION_SECRET,
      store: new DatabaseSessionStore(createSessionRepository(ds)),
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
  api.use(csrfGuard);
  api.use(requirePasswordChanged);

  // Sign-in attempts are counted where every web process sees them (the database, or Redis when set).
  const throttle = createThrottleCounter({ repo: createSignInThrottleRepository(ds), redisUrl: env.REDIS_URL || undefined });
  const throttleStore = (name: string) => new SharedThrottleStore(throttle, name);
  api.use(
    '/auth',
    authRoutes(auth, passport, {
      loginLimit: env.LOGIN_RATE_LIMIT,
      ipFailureLimit: env.LOGIN_IP_FAILURE_LIMIT,
      devices: createFloorDeviceRepository(ds),
      throttleStore,
    }),
  );
  api.use('/users', userRoutes(createUserService({ users, audit })));
  api.use('/studio', studioRoutes(studios, audit));
  api.use('/styles', styleRoutes(styles, audit));
  api.use('/batches', batchRoutes(batches, styles, audit));
  api.use('/audit', auditRoutes(audit));
  const ctx: ModuleContext = { ds, env, audit, now, jobs: deps.jobs ?? lazyJobRunner(env.REDIS_URL || undefined) };
  const { modules, services } = createFeatureModules(ctx, { styles, batches, markerQueue: deps.markerQueue });
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
        await ctx.jobs.stop();
        await throttle.close();
      },
    };
  }
  api.use(notFoundHandler);
  api.use(errorHandler(env.NODE_ENV === 'development'));
  app.use('/api', api);

  const clientDir = deps.clientDir ?? resolve('dist/client');
  if (existsSync(join(clientDir, 'index.html'))) serveClient(app, clientDir);
  return app;
}
