import session from 'express-session';
import type { SessionRepository } from '../modules/sessions/session.repository';

const DAY_MS = 24 * 60 * 60 * 1000;

/** express-session store over the application database, so sessions survive restarts. */
export class DatabaseSessionStore extends session.Store {
  constructor(
    private readonly repo: SessionRepository,
    private readonly now: () => number = Date.now,
  ) {
    super();
  }

  override get(sid: string, cb: (err: unknown, s?: session.SessionData | null) => void) {
    this.repo
      .find(sid, this.now())
      .then((row) => cb(null, row ? (JSON.parse(row) as session.SessionData) : null))
      .catch(cb);
  }

  override set(sid: string, s: session.SessionData, cb?: (err?: unknown) => void) {
    const expires = s.cookie?.expires ? new Date(s.cookie.expires).getTime() : this.now() + DAY_MS;
    this.repo
      .save(sid, JSON.stringify(s), expires)
      .then(() => cb?.())
      .catch((e) => cb?.(e));
  }

  override destroy(sid: string, cb?: (err?: unknown) => void) {
    this.repo
      .remove(sid)
      .then(() => cb?.())
      .catch((e) => cb?.(e));
  }

  override touch(sid: string, s: session.SessionData, cb?: () => void) {
    this.set(sid, s, () => cb?.());
  }
}
