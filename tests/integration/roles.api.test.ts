import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { can, ROLES, type Permission, type Role } from '../../shared/auth/permissions';
import { buildStyleInput } from '../fixtures/factories';
import { buildTestApp, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let app: Awaited<ReturnType<typeof buildTestApp>>['app'];
const agents = {} as Record<Role, Agent>;

/** Every route of the foundation, with the permission the map says it needs (null: any signed-in person). */
const ROUTES: { method: 'get' | 'post' | 'put' | 'patch'; path: string; permission: Permission | null; body?: () => object }[] = [
  { method: 'get', path: '/api/auth/me', permission: null },
  { method: 'get', path: '/api/studio', permission: null },
  { method: 'patch', path: '/api/studio', permission: 'studio:manage', body: () => ({ workingDayHours: 8 }) },
  { method: 'get', path: '/api/users', permission: 'people:manage' },
  { method: 'post', path: '/api/users', permission: 'people:manage', body: () => ({ name: 'New Hand', email: `hand${Math.random().toString(36).slice(2)}@tamarind.example`, role: 'machinist', pin: '4831' }) },
  { method: 'patch', path: '/api/users/3', permission: 'people:manage', body: () => ({ name: 'Achieng Mwende' }) },
  { method: 'get', path: '/api/styles', permission: 'styles:read' },
  { method: 'get', path: '/api/styles/1', permission: 'styles:read' },
  { method: 'post', path: '/api/styles', permission: 'styles:write', body: () => buildStyleInput() },
  { method: 'put', path: '/api/styles/1', permission: 'styles:write', body: () => ({ code: 'SR-101', name: 'Sable shirt dress', description: '', sizeRun: ['XS', 'S', 'M', 'L', 'XL'], baseSize: 'M', status: 'approved' }) },
  { method: 'get', path: '/api/batches', permission: 'batches:read' },
  { method: 'get', path: '/api/batches/1', permission: 'batches:read' },
  { method: 'post', path: '/api/batches', permission: 'batches:write', body: () => ({ styleId: 1, quantities: { M: 2 }, dueDate: '2026-12-30' }) },
  { method: 'patch', path: '/api/batches/1', permission: 'batches:write', body: () => ({ notes: 'checked' }) },
  { method: 'get', path: '/api/audit', permission: 'audit:read' },
];

beforeAll(async () => {
  ({ app } = await buildTestApp());
  agents.owner = await signIn(app, 'owner@tamarind.example');
  agents.cutter = await signIn(app, 'cutter@tamarind.example');
  agents.machinist = await signIn(app, 'machinist2@tamarind.example');
  agents.finisher = await signIn(app, 'finisher2@tamarind.example');
});

describe('every role against every foundation route', () => {
  for (const route of ROUTES) {
    it(`${route.method.toUpperCase()} ${route.path} refuses anonymous callers with 401`, async () => {
      const res = await request(app)[route.method](route.path).send(route.body?.() ?? {});
      expect(res.status).toBe(401);
    });
    for (const role of ROLES) {
      const allowed = route.permission === null || can(role, route.permission);
      it(`${route.method.toUpperCase()} ${route.path} as ${role} → ${allowed ? '2xx' : '403'}`, async () => {
        const res = await agents[role][route.method](route.path).send(route.body?.() ?? {});
        if (allowed) expect(res.status, JSON.stringify(res.body)).toBeLessThan(300);
        else {
          expect(res.status).toBe(403);
          expect(res.body.error.code).toBe('forbidden');
        }
      });
    }
  }
});
