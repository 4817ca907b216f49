import { said, translate } from '../../../shared/i18n/speak';
import { createHash, randomBytes } from 'node:crypto';
import { Router, type Request, type Response } from 'express';
import rateLimit, { ipKeyGenerator, type Store } from 'express-rate-limit';
import type { configurePassport } from '../../auth/passport';
import {
  bindFloorDeviceInput,
  changePasswordInput,
  createStudioInput,
  floorPinLoginInput,
  loginInput,
  normaliseEmail,
  pinLoginInput,
  updateMeInput,
  type FloorListDto,
} from '../../../shared/schemas/auth';
import { actorOf, requireAuth, requirePermission, type Actor } from '../../auth/require';
import { AppError, refusedSignIn } from '../../errors';
import { validate } from '../../middleware/validate';
import { presentMe } from '../users/user.presenter';
import type { AuthService } from './auth.service';
import type { FloorDeviceRepository } from './floor-device.repository';

/** The cookie a studio tablet keeps its floor binding in (httpOnly: page scripts never see the token). */
export const FLOOR_DEVICE_COOKIE = 'seamrun.floor';
/** Browsers cap cookie lifetimes at 400 days (RFC 6265bis); the owner binds the tablet again after that. */
/** From this many wrong PINs left, a floor tablet's refusal says how many remain before the lock. */
const PIN_WARN_AT = 2;
const FLOOR_DEVICE_MAX_AGE_MS = 400 * 24 * 60 * 60 * 1000;
const tokenHash = (token: string) => createHash('sha256').update(token).digest('hex');

/** One cookie's value from the request header, without a cookie parser. */
function cookieValue(req: Request, name: string): string | null {
  for (const part of (req.headers.cookie ?? '').split(';')) {
    const i = part.indexOf('=');
    if (i > 0 && part.slice(0, i).trim() === name) return decodeURIComponent(part.slice(i + 1).trim());
  }
  return null;
}

const logIn = (req: Request, user: Express.User) =>
  new Promise<void>((resolve, reject) => req.logIn(user, (err) => (err ? reject(err) : resolve())));

export function authRoutes(
  auth: AuthService,
  passport: ReturnType<typeof configurePassport>,
  // `throttleStore(name)`: a store shared by every web process (server/auth/throttle-store.ts), one per limiter.
  opts: { loginLimit: number; ipFailureLimit: number; devices: FloorDeviceRepository; throttleStore?: (name: string) => Store },
) {
  const r = Router();
  const { devices } = opts;
  const refuse = async (req: Request, res: Response) => {
    const message = 'Too many sign-in attempts; wait a few minutes';
    const who = await req.speaker?.().catch(() => undefined);
    res.status(429).json({ error: { code: 'rate_limited', message: who ? (translate(message, who) ?? message) : message } });
  };
  // Per address and account: the e-mail is normalised exactly as the lookup does, so padding or capitals
  // never open a fresh bucket; a tablet's PIN sign-in is keyed by the person picked.
  const limiter = rateLimit({
    windowMs: 15 * 60 * 1000,
    limit: opts.loginLimit,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    store: opts.throttleStore?.('login'),
    keyGenerator: (req) => {
      const who = req.body?.email !== undefined ? normaliseEmail(req.body.email) : `person:${String(req.body?.userId ?? '')}`;
      return `${ipKeyGenerator(req.ip ?? '')}|${who}`;
    },
    handler: refuse,
  });
  // Per address alone, counting failed sign-ins only: one address cannot try PINs across the whole studio,
  // and a studio's morning sign-ins from one shared connection never reach it.
  const ipLimiter = rateLimit({
    windowMs: 15 * 60 * 1000,
    limit: opts.ipFailureLimit,
    standardHeaders: false,
    legacyHeaders: false,
    skipSuccessfulRequests: true,
    store: opts.throttleStore?.('ip'),
    keyGenerator: (req) => `ip|${ipKeyGenerator(req.ip ?? '')}`,
    handler: refuse,
  });

  /** The studio this device is bound to as a floor tablet, or null. */
  const boundDevice = async (req: Request) => {
    const token = cookieValue(req, FLOOR_DEVICE_COOKIE);
    return token && token.length >= 32 ? devices.byTokenHash(tokenHash(token)) : null;
  };

  const respondMe = async (req: Request, res: Response) => {
    const { user, studio } = await auth.me(actorOf(req));
    res.json({ user: { ...presentMe(user, studio), mustChangePassword: Boolean(actorOf(req).mustChangePassword) } });
  };

  r.post('/login', ipLimiter, limiter, validate({ body: loginInput }), async (req, res) => {
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

  r.post('/pin', ipLimiter, limiter, validate({ body: pinLoginInput }), async (req, res) => {
    const user = await auth.verifyPin(req.body.email, req.body.pin);
    if (!user) throw new AppError(401, 'unauthenticated', 'Email or PIN is wrong');
    await logIn(req, user);
    await respondMe(req, res);
  });

  // A studio tablet: the owner binds it once; then it lists the floor's names and takes only a PIN.
  r.post('/floor-device', requirePermission('people:manage'), validate({ body: bindFloorDeviceInput }), async (req, res) => {
    const actor = actorOf(req);
    const token = randomBytes(32).toString('base64url');
    const device = await devices.insert({
      studioId: actor.studioId,
      tokenHash: tokenHash(token),
      label: req.body.label || 'Floor tablet',
      createdById: actor.id,
    });
    res.cookie(FLOOR_DEVICE_COOKIE, token, {
      httpOnly: true,
      sameSite: 'strict',
      secure: req.secure,
      path: '/api/auth',
      maxAge: FLOOR_DEVICE_MAX_AGE_MS,
    });
    res.status(201).json({ device: { id: device.id, label: device.label } });
  });
  r.delete('/floor-device', requirePermission('people:manage'), async (req, res) => {
    const device = await boundDevice(req);
    if (device && device.studioId === actorOf(req).studioId) await devices.remove(device.studioId, device.id);
    res.clearCookie(FLOOR_DEVICE_COOKIE, { path: '/api/auth' });
    res.status(204).end();
  });
  r.get('/floor', async (req, res) => {
    const device = await boundDevice(req);
    // Not a floor tablet: an ordinary answer (null), not an error, since every sign-in page asks.
    if (!device) return void res.json(null);
    const list: FloorListDto = await auth.floorList(device.studioId);
    res.json(list);
  });
  r.post('/floor/pin', ipLimiter, limiter, validate({ body: floorPinLoginInput }), async (req, res) => {
    const device = await boundDevice(req);
    if (!device) throw new AppError(401, 'unauthenticated', 'This device is not a floor tablet; sign in with your e-mail and PIN');
    const { actor: user, left } = await auth.verifyFloorPin(device.studioId, req.body.userId, req.body.pin);
    if (!user) {
      // A warning before the lock: the last tries say how many remain; the one that locks says so.
      if (left === 0) throw new AppError(429, 'locked', 'Too many failed attempts; try again in 15 minutes');
      const warning = left !== null && left <= PIN_WARN_AT ? said('wrongNamePinLeft', { n: left }) : null;
      const fields = { pin: said('triesLeft', { n: left ?? 0 }) };
      if (warning) throw refusedSignIn(warning, fields);
      throw new AppError(401, 'unauthenticated', 'Name or PIN is wrong');
    }
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
  r.patch('/me', requireAuth, validate({ body: updateMeInput }), async (req, res) => {
    await auth.setLanguage(actorOf(req), req.body.language);
    await respondMe(req, res);
  });

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
