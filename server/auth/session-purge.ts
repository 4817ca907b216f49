import type { SessionRepository } from '../modules/sessions/session.repository';

/** How often expired sessions are deleted while the server runs. */
export const SESSION_PURGE_EVERY_MS = 60 * 60 * 1000;

/**
 * Deletes expired sessions once at start, then every `everyMs`: an expired row is never served (the
 * store reads `expiresAt > now`), but left alone the table only grows. The timer does not hold the
 * process open. Returns `stop`.
 */
export async function startSessionPurge(
  sessions: Pick<SessionRepository, 'purgeExpired'>,
  opts: { everyMs?: number; now?: () => number; onError?: (err: unknown) => void } = {},
): Promise<{ stop: () => void }> {
  const now = opts.now ?? Date.now;
  const onError = opts.onError ?? ((err: unknown) => console.error('Purging expired sessions failed:', err));
  await sessions.purgeExpired(now());
  const timer = setInterval(() => void sessions.purgeExpired(now()).catch(onError), opts.everyMs ?? SESSION_PURGE_EVERY_MS);
  timer.unref();
  return { stop: () => clearInterval(timer) };
}
