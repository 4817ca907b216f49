import request from 'supertest';
import type { Express } from 'express';
import { beforeAll, describe, expect, it } from 'vitest';
import { can, ROLES, type Role } from '../../shared/auth/permissions';
import { listApiRoutes, type RouteInfo } from '../fixtures/route-list';
import { buildTestApp, signIn } from '../fixtures/test-app';

// Routes that end the caller's own session are tried in the auth tests instead.
const SKIP = new Set(['post /api/auth/logout', 'post /api/auth/password']);
const ROLE_GATE = 'Your role cannot do this';

let app: Express;
let routes: RouteInfo[];
const agents = {} as Record<Role | 'stranger', Awaited<ReturnType<typeof signIn>>>;

beforeAll(async () => {
  ({ app } = await buildTestApp());
  routes = listApiRoutes(app).filter((r) => !SKIP.has(`${r.method} ${r.path}`));
  agents.owner = await signIn(app, 'owner@tamarind.example');
  agents.cutter = await signIn(app, 'cutter@tamarind.example');
  agents.machinist = await signIn(app, 'machinist3@tamarind.example');
  agents.finisher = await signIn(app, 'finisher2@tamarind.example');
  const stranger = request.agent(app);
  await stranger.post('/api/auth/studios').send({
    studioName: 'Other Bench Studio', currency: 'EUR', unitSystem: 'metric',
    ownerName: 'Other Owner', email: 'owner@other.example', password: 'another-long-password',
  });
  agents.stranger = stranger;
}, 120_000);

const concrete = (path: string) => path.replace(/:[A-Za-z]+/g, '1');
const call = (agent: ReturnType<typeof request.agent> | ReturnType<typeof request>, r: RouteInfo) =>
  (agent as unknown as Record<string, (p: string) => request.Test>)[r.method](concrete(r.path)).send({});

describe('route-by-role matrix generated from the permission map', () => {
  it('finds the API routes and their permissions', () => {
    expect(routes.length).toBeGreaterThan(80);
    console.log(JSON.stringify({ routes: routes.length, callers: ROLES.length + 2 }));
    expect(routes.find((r) => r.path === '/api/users' && r.method === 'get')?.permissions).toEqual(['people:manage']);
  });

  it('answers every route for anonymous callers with 401 where a sign-in is needed, and never 5xx', async () => {
    const bad: string[] = [];
    for (const r of routes) {
      const res = await call(request(app), r);
      if (res.status >= 500 || (r.requiresAuth && res.status !== 401)) bad.push(`${r.method} ${r.path} → ${res.status}`);
    }
    expect(bad).toEqual([]);
  }, 120_000);

  for (const role of ROLES) {
    it(`gives ${role} exactly what the map allows on every route`, async () => {
      const bad: string[] = [];
      let tried = 0;
      for (const r of routes) {
        if (!r.requiresAuth) continue;
        tried++;
        const res = await call(agents[role], r);
        const allowed = r.permissions === null || r.permissions.some((p) => can(role, p));
        if (res.status >= 500) bad.push(`${r.method} ${r.path} → ${res.status}`);
        else if (allowed && (res.status === 401 || (res.status === 403 && res.body?.error?.message === ROLE_GATE)))
          bad.push(`${r.method} ${r.path} → ${res.status} (allowed by the map)`);
        else if (!allowed && res.status !== 403) bad.push(`${r.method} ${r.path} → ${res.status} (not allowed by the map)`);
      }
      expect(tried).toBeGreaterThan(80);
      expect(bad).toEqual([]);
    }, 180_000);
  }

  it("never shows another studio's records to a member of a different studio", async () => {
    const leaks: string[] = [];
    for (const r of routes) {
      if (r.method !== 'get' || !r.path.includes(':')) continue;
      const res = await call(agents.stranger, r);
      if (res.status >= 500 || (res.status >= 200 && res.status < 300)) leaks.push(`${r.method} ${r.path} → ${res.status}`);
    }
    expect(leaks).toEqual([]);
  }, 120_000);
});
