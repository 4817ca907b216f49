import session from 'express-session';
import type { SessionRepository } from '../modules/sessions/session.repository';

const DAY_MS = 24 * 60 * 60 * 1000;
/** A rolling session's expiry is written back at most this often (it moves on every request). */
const TOUCH_EVERY_MS = 5 * 60 * 1000;

/** express-session store over the application database, so sessions survive restarts. */
export class DatabaseSessionStore extends session.Store {
  /** Expiry last written per session id, so touches that barely move it cost no write. */
  private readonly written = new Map<string, number>();

  constructor(
    private readonly repo: SessionRepository,
    private readonly now: () => number = Date.now,
  ) {
    super();
  }

  private expiryOf(s: session.SessionData) {
    return s.cookie?.expires ? new Date(s.cookie.expires).getTime() : this.now() + DAY_MS;
  }

  override get(sid: string, cb: (err: unknown, s?: session.SessionData | null) => void) {
    this.repo
      .find(sid, this.now())
      .then((row) => cb(null, row ? (JSON.parse(row) as session.SessionData) : null))
      .catch(cb);
  }

  override set(sid: string, s: session.SessionData, cb?: (err?: unknown) => void) {
    const expires = this.expiryOf(s);
    this.repo
      .save(sid, JSON.stringify(s), expires)
      .then(() => {
        this.written.set(sid, expires);
        cb?.();
      })
      .catch((e) => cb?.(e));
  }

  override destroy(sid: string, cb?: (err?: unknown) => void) {
    this.written.delete(sid);
    this.repo
      .remove(sid)
      .then(() => cb?.())
      .catch((e) => cb?.(e));
  }

  override touch(sid: string, s: session.SessionData, cb?: () => void) {
    const expires = this.expiryOf(s);
    const last = this.written.get(sid);
    if (last !== undefined && Math.abs(expires - last) < TOUCH_EVERY_MS) return cb?.();
    this.repo
      .extend(sid, expires)
      .then(() => this.written.set(sid, expires))
      .finally(() => cb?.());
  }
}
