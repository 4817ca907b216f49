import type session from 'express-session';
import { describe, expect, it } from 'vitest';
import type { SessionRepository } from '../modules/sessions/session.repository';
import { DatabaseSessionStore } from './session-store';

/** A repository over a Map that counts reads, with a clock the test moves. */
function fakeRepo() {
  const rows = new Map<string, { data: string; expiresAt: number }>();
  let reads = 0;
  const repo = {
    find: async (id: string, now: number) => {
      reads += 1;
      const r = rows.get(id);
      return r && r.expiresAt > now ? r.data : null;
    },
    save: async (id: string, data: string, expiresAt: number) => void rows.set(id, { data, expiresAt }),
    replace: async (id: string, data: string, expiresAt: number) => void (rows.has(id) && rows.set(id, { data, expiresAt })),
    extend: async (id: string, expiresAt: number) => void (rows.get(id) && (rows.get(id)!.expiresAt = expiresAt)),
    remove: async (id: string) => void rows.delete(id),
    purgeExpired: async () => undefined,
  } as unknown as SessionRepository;
  return { repo, rows, reads: () => reads };
}

const get = (s: DatabaseSessionStore, sid: string) =>
  new Promise<session.SessionData | null | undefined>((resolve, reject) => s.get(sid, (e, v) => (e ? reject(e) : resolve(v))));
const set = (s: DatabaseSessionStore, sid: string, v: object) => new Promise<void>((resolve) => s.set(sid, v as session.SessionData, () => resolve()));
const destroy = (s: DatabaseSessionStore, sid: string) => new Promise<void>((resolve) => s.destroy(sid, () => resolve()));

describe('database session store with a one-second memory', () => {
  const cookie = (expires: number) => ({ cookie: { expires: new Date(expires).toISOString(), originalMaxAge: 1 }, passport: { user: { id: 1, v: 1 } } });

  it('answers repeated reads from memory for cacheMs, then reads the database again', async () => {
    let t = 1_000_000;
    const { repo, reads } = fakeRepo();
    const store = new DatabaseSessionStore(repo, () => t, 1000);
    await set(store, 'a', cookie(t + 3_600_000));
    expect(await get(store, 'a')).toMatchObject({ passport: { user: { id: 1 } } });
    expect(await get(store, 'a')).toMatchObject({ passport: { user: { id: 1 } } });
    expect(reads()).toBe(0);
    t += 1000;
    await get(store, 'a');
    expect(reads()).toBe(1);
  });

  it('forgets a session at once when it is destroyed here, and within cacheMs when removed elsewhere', async () => {
    let t = 1_000_000;
    const { repo, rows } = fakeRepo();
    const store = new DatabaseSessionStore(repo, () => t, 1000);
    await set(store, 'a', cookie(t + 3_600_000));
    await destroy(store, 'a');
    expect(await get(store, 'a')).toBeNull();

    await set(store, 'b', cookie(t + 3_600_000));
    rows.delete('b'); // another web process signed it out
    expect(await get(store, 'b')).not.toBeNull();
    t += 1000;
    expect(await get(store, 'b')).toBeNull();
  });

  it('never answers an expired session from memory, and reads every time with cacheMs 0', async () => {
    let t = 1_000_000;
    const { repo } = fakeRepo();
    const store = new DatabaseSessionStore(repo, () => t, 1000);
    await set(store, 'a', cookie(t + 500));
    t += 600;
    expect(await get(store, 'a')).toBeNull();

    const plain = fakeRepo();
    const uncached = new DatabaseSessionStore(plain.repo, () => t, 0);
    await set(uncached, 'c', cookie(t + 3_600_000));
    await get(uncached, 'c');
    await get(uncached, 'c');
    expect(plain.reads()).toBe(2);
  });

  it('never brings back a session signed out in another process by a late write of a request still running', async () => {
    let t = 1_000_000;
    const { repo, rows } = fakeRepo();
    const other = new DatabaseSessionStore(repo, () => t, 1000);
    const here = new DatabaseSessionStore(repo, () => t, 1000);
    await set(other, 's', cookie(t + 3_600_000));
    const read = await get(here, 's');
    await destroy(other, 's');
    // The request that read it here ends after the sign-out and writes the session back (renewed expiry).
    await set(here, 's', { ...read, renewal: 1 });
    expect(rows.has('s')).toBe(false);
    t += 1000;
    expect(await get(here, 's')).toBeNull();
  });
});
