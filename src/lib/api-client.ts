import type { ApiErrorBody } from '@shared/types/api';
import { clearSignOutPending, signOutPending } from './offline-session';

/** An API failure carrying the server's stable code and the failing fields. */
export class ApiError extends Error {
  constructor(
    public readonly status: number,
    public readonly code: string,
    message: string,
    public readonly fields: Record<string, string> = {},
  ) {
    super(message);
  }
}

/** Status 0: the request never reached the server (no network, or the server is down). */
export const OFFLINE_MESSAGE = 'No network: this needs the Seamrun server, which this device cannot reach right now. Try again when the network is back.';

async function send(input: string, init: RequestInit) {
  try {
    return await fetch(input, init);
  } catch {
    throw new ApiError(0, 'offline', OFFLINE_MESSAGE);
  }
}

/** A sign-out made with no network ends the server session before this device sends anything else. */
async function endPendingSignOut() {
  if (!signOutPending()) return;
  const res = await send('/api/auth/logout', { method: 'POST', credentials: 'same-origin', headers: { Accept: 'application/json', 'Content-Type': 'application/json' }, body: '{}' });
  if (res.ok || res.status === 401) clearSignOutPending();
}

if (typeof window !== 'undefined') window.addEventListener('online', () => void endPendingSignOut().catch(() => {}));

async function request<T>(method: string, url: string, body?: unknown): Promise<T> {
  if (url !== '/auth/logout') await endPendingSignOut();
  const isForm = typeof FormData !== 'undefined' && body instanceof FormData;
  const res = await send(`/api${url}`, {
    method,
    credentials: 'same-origin',
    headers: {
      Accept: 'application/json',
      ...(body !== undefined && !isForm ? { 'Content-Type': 'application/json' } : {}),
      ...(isForm ? { 'X-Seamrun-Csrf': '1' } : {}),
    },
    body: body === undefined ? undefined : isForm ? body : JSON.stringify(body),
  });
  if (res.status === 204) return undefined as T;
  const data = (await res.json().catch(() => ({}))) as T & Partial<ApiErrorBody>;
  if (!res.ok) {
    const e = data.error;
    throw new ApiError(res.status, e?.code ?? 'internal', e?.message ?? res.statusText, e?.fields ?? {});
  }
  return data;
}

export const api = {
  get: <T>(url: string) => request<T>('GET', url),
  post: <T>(url: string, body?: unknown) => request<T>('POST', url, body ?? {}),
  put: <T>(url: string, body: unknown) => request<T>('PUT', url, body),
  patch: <T>(url: string, body: unknown) => request<T>('PATCH', url, body),
  del: <T>(url: string) => request<T>('DELETE', url),
};

/** Download a file from the API (a GET that returns bytes) under a given name. */
export async function downloadFile(url: string, filename: string) {
  await endPendingSignOut();
  const res = await send(`/api${url}`, { credentials: 'same-origin' });
  if (!res.ok) {
    const data = (await res.json().catch(() => ({}))) as Partial<ApiErrorBody>;
    throw new ApiError(res.status, data.error?.code ?? 'internal', data.error?.message ?? 'Download failed');
  }
  const blob = await res.blob();
  const a = document.createElement('a');
  a.href = URL.createObjectURL(blob);
  a.download = filename;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(a.href), 1000);
}
