import { idempotencyKeyAuthor, type LogWorkInput, type LogWorkResult } from '@shared/schemas/floor';
import { api, ApiError } from '@/lib/api-client';
import { i18n } from '@/lib/i18n';

/**
 * Logs waiting on this device for the network, oldest first. Kept in localStorage so a reload loses none.
 * A phone or tablet may be shared: each log keeps the person who made it and is sent only while that
 * person is signed in on this device, never under the next person's session.
 */
const STORAGE_KEY = 'seamrun.floor.outbox';

export interface QueuedLog {
  input: LogWorkInput;
  queuedAt: string;
  label: string;
  /** Who made the log (user id); logs saved before this field read it from their key. */
  authorId?: number;
  /** Their name, to say whose logs wait on a shared phone. */
  authorName?: string;
}

export function readOutbox(): QueuedLog[] {
  try {
    return JSON.parse(localStorage.getItem(STORAGE_KEY) ?? '[]') as QueuedLog[];
  } catch {
    return [];
  }
}

/** The person a queued log belongs to; null when it cannot be told (it is then kept, never sent). */
export const authorOf = (q: QueuedLog) => q.authorId ?? idempotencyKeyAuthor(q.input.idempotencyKey);

/** Logs waiting on this device that `userId` made. */
export const waitingFor = (userId: number) => readOutbox().filter((q) => authorOf(q) === userId);

/** Logs waiting on this device that someone other than `userId` made. */
export const waitingForOthers = (userId: number) => readOutbox().filter((q) => authorOf(q) !== userId);

/** Other people's waiting logs, counted per person, oldest first: "2 logs waiting for Imani Wairimu". */
export function othersWaiting(userId: number): { key: string; name: string; count: number }[] {
  const byAuthor = new Map<string, { key: string; name: string; count: number }>();
  for (const q of waitingForOthers(userId)) {
    const key = String(authorOf(q) ?? q.authorName ?? '');
    const entry = byAuthor.get(key) ?? { key, name: q.authorName ?? i18n.t('floor.someoneElse'), count: 0 };
    entry.count += 1;
    byAuthor.set(key, entry);
  }
  return [...byAuthor.values()];
}

function writeOutbox(items: QueuedLog[]) {
  localStorage.setItem(STORAGE_KEY, JSON.stringify(items));
  window.dispatchEvent(new Event('seamrun-outbox'));
}

/** A key unique to this log attempt; retries reuse it, so the server never doubles the log. */
export function newIdempotencyKey(userId: number) {
  const bytes = crypto.getRandomValues(new Uint8Array(9));
  const rand = Array.from(bytes, (b) => b.toString(16).padStart(2, '0')).join('');
  return `u${userId}-${Date.now().toString(36)}-${rand}`;
}

/** No answer at all (offline, dropped connection) or a gateway error: worth sending again later. */
export const isRetryable = (e: unknown) => !(e instanceof ApiError) || e.status >= 500 || e.status === 0;

/** The server's refusal of a log made by someone other than the person signed in. */
const isOtherAuthorsLog = (e: unknown) => e instanceof ApiError && e.status === 409 && Boolean(e.fields.idempotencyKey);

export type SendResult = { kind: 'sent'; result: LogWorkResult } | { kind: 'queued' };

/** Send a log now; if the network is down, keep it on the device with its key and its author, and say so. */
export async function sendLog(input: LogWorkInput, label: string, author: { id: number; name: string }): Promise<SendResult> {
  try {
    return { kind: 'sent', result: await api.post<LogWorkResult>('/floor/logs', input) };
  } catch (e) {
    if (!isRetryable(e)) throw e;
    const queuedAt = new Date().toISOString();
    writeOutbox([
      ...readOutbox().filter((q) => q.input.idempotencyKey !== input.idempotencyKey),
      { input: { ...input, doneAt: input.doneAt ?? queuedAt }, label, authorId: author.id, authorName: author.name, queuedAt },
    ]);
    return { kind: 'queued' };
  }
}

/**
 * A refused log as one sentence: the server's refusal names the bundle and operation itself ("Bundle 12 · OP04
 * Join shoulders was already logged by …"), so the log's label is put in front only when the refusal does not
 * already say it.
 */
export function refusalText(label: string, message: string): string {
  const said = message.toLowerCase();
  const bundle = /^(\S+\s+\d+)/.exec(label)?.[1]?.toLowerCase();
  return said.includes(label.toLowerCase()) || (bundle !== undefined && said.includes(bundle)) ? message : `${label}: ${message}`;
}

let flushing: Promise<{ sent: number; refused: string[] }> | null = null;

/**
 * Send what `userId` (the person signed in now) left waiting, in order, each with its own key. Other
 * people's logs stay on the device for when they sign in. Stops at the first network failure.
 */
export function flushOutbox(userId: number) {
  flushing ??= (async () => {
    let sent = 0;
    const refused: string[] = [];
    for (const item of waitingFor(userId)) {
      try {
        // Dated when it was done, not when the network came back (logs queued before doneAt use their queue time).
        await api.post<LogWorkResult>('/floor/logs', { ...item.input, doneAt: item.input.doneAt ?? item.queuedAt });
        sent += 1;
      } catch (e) {
        // Not now (offline), or the session changed hands mid-send: keep it for its author.
        if (isRetryable(e) || isOtherAuthorsLog(e)) break;
        refused.push(refusalText(item.label, (e as Error).message));
      }
      writeOutbox(readOutbox().filter((q) => q.input.idempotencyKey !== item.input.idempotencyKey));
    }
    return { sent, refused };
  })().finally(() => {
    flushing = null;
  });
  return flushing;
}

/** What to say before `userId` signs out while logs they made still wait on this device; null when none. */
export function outboxSignOutWarning(userId: number): string | null {
  const n = waitingFor(userId).length;
  if (!n) return null;
  return i18n.t('floor.signOutWaiting', { count: n });
}
