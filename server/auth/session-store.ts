import session from 'express-session';
import type { SessionRepository } from '../modules/sessions/session.repository';

const DAY_MS = 24 * 60 * 60 * 1000;
/** A rolling session's expiry is written back at most this often (it moves on every request). */
const TOUCH_EVERY_MS = 5 * 60 * 1000;

/**
 * express-session store over the application database, so sessions survive restarts.
 *
 * A session read in the last `cacheMs` (1 s by default) is answered from memory, so a phone logging
 * bundles costs no session read per log. Saving or ending a session here updates the memory at once; on a
 * host with several web processes, a sign-out in one is seen by the others within `cacheMs`. Whether the
 * person may still act (active, role, password changed) is read from the database on every request.
 */
export class DatabaseSessionStore extends session.Store {
  /** Expiry last written per session id, so touches that barely move it cost no write. */
  private readonly written = new Map<string, number>();
  /**
   * Sessions this process has read from the database. Writing one of them back only rewrites the row:
   * if another process (or a sign-out here) deleted it meanwhile, a late write of a request that was
   * still running must not bring the signed-out session back. New sessions (sign-in) are inserted.
   */
  private readonly fromDatabase = new Set<string>();
  /** Session JSON read or written recently, by id (parsed afresh for every request). */
  private readonly recent = new Map<string, { json: string; at: number }>();

  constructor(
    private readonly repo: SessionRepository,
    private readonly now: () => number = Date.now,
    private readonly cacheMs = 1000,
  ) {
    super();
  }

  private remember(sid: string, json: string) {
    if (!this.cacheMs) return;
    const at = this.now();
    if (this.recent.size > 10_000) for (const [k, v] of this.recent) if (at - v.at >= this.cacheMs) this.recent.delete(k);
    this.recent.set(sid, { json, at });
  }

  private expiryOf(s: session.SessionData) {
    return s.cookie?.expires ? new Date(s.cookie.expires).getTime() : this.now() + DAY_MS;
  }

  override get(sid: string, cb: (err: unknown, s?: session.SessionData | null) => void) {
    const now = this.now();
    const hit = this.recent.get(sid);
    if (hit && now - hit.at < this.cacheMs) {
      const s = JSON.parse(hit.json) as session.SessionData;
      if (this.expiryOf(s) > now) return cb(null, s);
    }
    this.repo
      .find(sid, now)
      .then((row) => {
        if (row) {
          this.remember(sid, row);
          if (this.fromDatabase.size > 50_000) this.fromDatabase.clear();
          this.fromDatabase.add(sid);
        } else this.recent.delete(sid);
        cb(null, row ? (JSON.parse(row) as session.SessionData) : null);
      })
      .catch(cb);
  }

  override set(sid: string, s: session.SessionData, cb?: (err?: unknown) => void) {
    const expires = this.expiryOf(s);
    const json = JSON.stringify(s);
    this.recent.delete(sid);
    const existing = this.fromDatabase.has(sid);
    (existing ? this.repo.replace(sid, json, expires) : this.repo.save(sid, json, expires))
      .then(() => {
        this.written.set(sid, expires);
        // A rewrite may have found no row (signed out meanwhile): only a new session is remembered unread.
        if (!existing) this.remember(sid, json);
        cb?.();
      })
      .catch((e) => cb?.(e));
  }

  override destroy(sid: string, cb?: (err?: unknown) => void) {
    this.written.delete(sid);
    this.recent.delete(sid);
    // Kept as known: a write still in flight for this session must not insert it again.
    this.fromDatabase.add(sid);
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
