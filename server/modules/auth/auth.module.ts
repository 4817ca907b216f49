import type { Env } from '../../env';
import { configurePassport } from '../../auth/passport';
import { DatabaseSessionStore } from '../../auth/session-store';
import { createThrottleCounter, SharedThrottleStore } from '../../auth/throttle-store';
import type { ApiModule, ModuleContext } from '../module';
import { createSessionRepository } from '../sessions/session.repository';
import type { StudioRepository } from '../studios/studio.repository';
import type { UserRepository } from '../users/user.repository';
import { authRoutes } from './auth.routes';
import { createAuthService } from './auth.service';
import { createFloorDeviceRepository } from './floor-device.repository';
import { createSignInThrottleRepository } from './sign-in-throttle.repository';

export interface AuthModuleDeps {
  users: UserRepository;
  studios: StudioRepository;
  limits: Pick<Env, 'LOGIN_RATE_LIMIT' | 'LOGIN_LOCK_AFTER' | 'LOGIN_IP_FAILURE_LIMIT'>;
}

/**
 * Signing in and out (password, PIN, a bound floor tablet), opening a studio, changing a password at
 * /api/auth. Hands createApp the `passport` and the `sessionStore` its session middleware runs on.
 */
export function createAuthModule(ctx: ModuleContext, deps: AuthModuleDeps) {
  const auth = createAuthService({ users: deps.users, studios: deps.studios, audit: ctx.audit, lockAfter: deps.limits.LOGIN_LOCK_AFTER, now: ctx.now });
  const passport = configurePassport(auth);
  // Sign-in attempts are counted where every web process sees them (the database, or Redis when set).
  const throttle = createThrottleCounter({ repo: createSignInThrottleRepository(ctx.ds), redisUrl: ctx.env.REDIS_URL || undefined });
  const throttleStore = (name: string) => new SharedThrottleStore(throttle, name);
  return {
    name: 'auth',
    services: { passport, sessionStore: new DatabaseSessionStore(createSessionRepository(ctx.ds)) },
    mount(api) {
      api.use(
        '/auth',
        authRoutes(auth, passport, {
          loginLimit: deps.limits.LOGIN_RATE_LIMIT,
          ipFailureLimit: deps.limits.LOGIN_IP_FAILURE_LIMIT,
          devices: createFloorDeviceRepository(ctx.ds),
          throttleStore,
        }),
      );
    },
    async stop() {
      await throttle.close();
    },
  } satisfies ApiModule & { services: unknown };
}
