import type { LogWorkInput, LogWorkResult } from '@shared/schemas/floor';
import { api, ApiError } from '@/lib/api-client';

/** Logs waiting on this device for the network, oldest first. Kept in localStorage so a reload loses none. */
const STORAGE_KEY = 'seamrun.floor.outbox';

export interface QueuedLog {
  input: LogWorkInput;
  queuedAt: string;
  label: string;
}

export function readOutbox(): QueuedLog[] {
  try {
    return JSON.parse(localStorage.getItem(STORAGE_KEY) ?? '[]') as QueuedLog[];
  } catch {
    return [];
  }
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

export type SendResult = { kind: 'sent'; result: LogWorkResult } | { kind: 'queued' };

/** Send a log now; if the network is down, keep it on the device with its key and say so. */
export async function sendLog(input: LogWorkInput, label: string): Promise<SendResult> {
  try {
    return { kind: 'sent', result: await api.post<LogWorkResult>('/floor/logs', input) };
  } catch (e) {
    if (!isRetryable(e)) throw e;
    writeOutbox([...readOutbox().filter((q) => q.input.idempotencyKey !== input.idempotencyKey), { input, label, queuedAt: new Date().toISOString() }]);
    return { kind: 'queued' };
  }
}

let flushing: Promise<{ sent: number; refused: string[] }> | null = null;

/** Send what is waiting, in order, each with its own key. Stops at the first network failure. */
export function flushOutbox() {
  flushing ??= (async () => {
    let sent = 0;
    const refused: string[] = [];
    for (const item of readOutbox()) {
      try {
        await api.post<LogWorkResult>('/floor/logs', item.input);
        sent += 1;
      } catch (e) {
        if (isRetryable(e)) break;
        refused.push(`${item.label}: ${(e as Error).message}`);
      }
      writeOutbox(readOutbox().filter((q) => q.input.idempotencyKey !== item.input.idempotencyKey));
    }
    return { sent, refused };
  })().finally(() => {
    flushing = null;
  });
  return flushing;
}
