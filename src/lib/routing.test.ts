import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { UserDto } from '@shared/schemas/auth';
import { markSignedOutOffline } from './offline-session';
import { queryClient } from './query-client';
import { lazyPage, requirePermission, requireSignedIn } from './routing';

const user = (role: UserDto['role']): UserDto => ({
  id: 7, email: `${role}@example.test`, name: 'Test Person', role,
  studioId: 1, studioName: 'Test Studio', currency: 'KES', unitSystem: 'metric', language: 'en', ownLanguage: null, studioLanguage: 'en', timeZone: 'UTC', mustChangePassword: false,
});

/** The server as the client sees it: who /api/auth/me says is signed in, or no network at all. */
let server: { me: UserDto | null; online: boolean; logouts: number; asked: string[] };

function memoryStorage(): Storage {
  const m = new Map<string, string>();
  return {
    get length() { return m.size; },
    clear: () => m.clear(),
    getItem: (k) => m.get(k) ?? null,
    key: (i) => [...m.keys()][i] ?? null,
    removeItem: (k) => void m.delete(k),
    setItem: (k, v) => void m.set(k, String(v)),
  };
}

beforeEach(() => {
  server = { me: null, online: true, logouts: 0, asked: [] };
  vi.stubGlobal('localStorage', memoryStorage());
  vi.stubGlobal('fetch', async (url: string) => {
    if (!server.online) throw new TypeError('Failed to fetch');
    server.asked.push(url);
    if (url === '/api/widgets') return Response.json({ widgets: [1, 2] });
    if (url === '/api/auth/logout') {
      server.logouts += 1;
      server.me = null;
      return Response.json({ ok: true });
    }
    if (url === '/api/auth/me') {
      return server.me ? Response.json({ user: server.me }) : Response.json({ error: { code: 'unauthenticated', message: 'Sign in' } }, { status: 401 });
    }
    return Response.json({ error: { code: 'not_found', message: 'Not found' } }, { status: 404 });
  });
  queryClient.clear();
});
afterEach(() => {
  vi.unstubAllGlobals();
  queryClient.clear();
});

/** What a loader did: went on (null) or redirected to a path. */
async function outcome(loader: () => unknown) {
  try {
    return await loader();
  } catch (e) {
    if (e instanceof Response) return `redirect ${e.headers.get('Location')}`;
    throw e;
  }
}

const args = {} as Parameters<ReturnType<typeof requirePermission>>[0];

describe('the page permission check', () => {
  it('lets a role with the permission in and sends the others home when a page is opened', async () => {
    server.me = user('owner');
    expect(await outcome(() => requirePermission('styles:write')(args))).toBeNull();
    queryClient.clear();
    server.me = user('cutter');
    expect(await outcome(() => requirePermission('styles:write')(args))).toBe('redirect /');
    expect(await outcome(() => requirePermission('fabric:read')(args))).toBeNull();
  });

  it('sends a signed-out visitor to sign-in when any page is opened', async () => {
    expect(await outcome(() => requirePermission('styles:write')(args))).toBe('redirect /signin');
    expect(await outcome(() => requireSignedIn())).toBe('redirect /signin');
  });
});

describe('a lazily loaded page', () => {
  const widgets = { queryKey: ['widgets'], queryFn: async () => ((await (await fetch('/api/widgets')).json()) as { widgets: number[] }).widgets };
  const page = lazyPage('/widgets', 'styles:write', async () => () => null, () => queryClient.prefetchQuery(widgets));
  const run = () => outcome(() => (page.loader as (a: typeof args) => unknown)(args));

  it('asks for its data in its loader when the role may open it', async () => {
    server.me = user('owner');
    expect(await run()).toBeNull();
    expect(queryClient.getQueryData(['widgets'])).toEqual([1, 2]);
  });

  it('asks the server for nothing of the page when the role may not open it', async () => {
    server.me = user('machinist');
    expect(await run()).toBe('redirect /');
    expect(server.asked).not.toContain('/api/widgets');
  });
});

describe('signed in with no network', () => {
  it('opens for the person last signed in on this device when the server cannot be reached', async () => {
    server.me = user('machinist');
    expect(await outcome(() => requireSignedIn())).toBeNull();
    queryClient.clear();
    server.online = false;
    expect(await outcome(() => requireSignedIn())).toBeNull();
    expect(queryClient.getQueryData(['auth', 'me'])).toMatchObject({ role: 'machinist' });
    expect(await outcome(() => requirePermission('styles:write')(args))).toBe('redirect /');
  });

  it('lets nobody in offline after an offline sign-out, and ends the session first when the network is back', async () => {
    server.me = user('machinist');
    await requireSignedIn();
    queryClient.clear();
    server.online = false;
    markSignedOutOffline();
    expect(await outcome(() => requireSignedIn())).toBe('redirect /signin');
    server.online = true;
    expect(await outcome(() => requireSignedIn())).toBe('redirect /signin');
    expect(server.logouts).toBe(1);
  });
});
