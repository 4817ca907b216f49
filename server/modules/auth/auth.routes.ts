import { Router, type Request } from 'express';
import rateLimit, { ipKeyGenerator, type Store } from 'express-rate-limit';
import type { configurePassport } from '../../auth/passport';
import {
  changePasswordInput,
  createStudioInput,
  loginInput,
  pinLoginInput,
} from '../../../shared/schemas/auth';
import { actorOf, requireAuth, type Actor } from '../../auth/require';
import { AppError } from '../../errors';
import { validate } from '../../middleware/validate';
import { presentMe } from '../users/user.presenter';
import type { AuthService } from './auth.service';

const logIn = (req: Request, user: Express.User) =>
  new Promise<void>((resolve, reject) => req.logIn(user, (err) => (err ? reject(err) : resolve())));

export function authRoutes(
  auth: AuthService,
  passport: ReturnType<typeof configurePassport>,
  // `throttleStore(name)`: a store shared by every web process (server/auth/throttle-store.ts), one per limiter.
  opts: { loginLimit: number; throttleStore?: (name: string) => Store },
) {
  const r = Router();
  const limiter = rateLimit({
    windowMs: 15 * 60 * 1000,
    limit: opts.loginLimit,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    store: opts.throttleStore?.('login'),
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}|${String(req.body?.email ?? '').toLowerCase()}`,
    handler: (_req, res) =>
      res.status(429).json({ error: { code: 'rate_limited', message: 'Too many sign-in attempts; wait a few minutes' } }),
  });

  const respondMe = async (req: Request, res: import('express').Response) => {
    const { user, studio } = await auth.me(actorOf(req));
    res.json({ user: presentMe(user, studio) });
  };

  r.post('/login', limiter, validate({ body: loginInput }), async (req, res) => {
    const user = await new Promise<Actor | false>((resolve, reject) =>
      passport.authenticate('local', { session: false }, (err: unknown, u: Actor | false) =>
        err ? reject(err) : resolve(u),
      )(req, res, () => undefined),
    );
    if (!user) throw new AppError(401, 'unauthenticated', 'Email or password is wrong');
    // passport ≥ 0.6 regenerates the session id inside req.logIn (session fixation).
    await logIn(req, user);
    await respondMe(req, res);
  });

  r.post('/pin', limiter, validate({ body: pinLoginInput }), async (req, res) => {
    const user = await auth.verifyPin(req.body.email, req.body.pin);
    if (!user) throw new AppError(401, 'unauthenticated', 'Email or PIN is wrong');
    await logIn(req, user);
    await respondMe(req, res);
  });

  r.post('/studios', limiter, validate({ body: createStudioInput }), async (req, res) => {
    const owner = await auth.createStudio(req.body);
    await logIn(req, owner);
    res.status(201);
    await respondMe(req, res);
  });

  r.get('/me', requireAuth, respondMe);

  r.post('/logout', (req, res, next) => {
    req.logOut((err) => {
      if (err) return next(err);
      req.session.destroy(() => {
        res.clearCookie('seamrun.sid');
        res.json({ ok: true });
      });
    });
  });

  r.post('/password', requireAuth, validate({ body: changePasswordInput }), async (req, res) => {
    const updated = await auth.changePassword(actorOf(req), req.body);
    await logIn(req, updated); // fresh session carrying the new session version
    await respondMe(req, res);
  });

  return r;
}
