import request from 'supertest';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { buildTestApp, DEMO, DEMO_PASSWORD, signIn } from '../fixtures/test-app';

let app: Awaited<ReturnType<typeof buildTestApp>>['app'];
beforeAll(async () => {
  ({ app } = await buildTestApp());
});

describe('auth contract', () => {
  it('answers health without a session', async () => {
    const res = await request(app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true });
  });

  it('signs in with email and password and returns the user and a session cookie', async () => {
    const res = await request(app).post('/api/auth/login').send({ email: DEMO.owner, password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ email: DEMO.owner, name: 'Zawadi Kerubo', role: 'owner' });
    expect(typeof res.body.user.id).toBe('number');
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/seamrun\.sid=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
  });

  it('moves a signed-in session on every five minutes of use, not with a new cookie on every answer', async () => {
    const agent = await signIn(app, DEMO.machinist);
    const first = await agent.get('/api/auth/me');
    const second = await agent.get('/api/auth/me');
    expect(first.status).toBe(200);
    expect(second.headers['set-cookie']).toBeUndefined();
    const later = Date.now() + 5 * 60 * 1000;
    const clock = vi.spyOn(Date, 'now').mockReturnValue(later);
    try {
      const renewed = await agent.get('/api/auth/me');
      expect(renewed.status).toBe(200);
      const cookie = String(renewed.headers['set-cookie']);
      expect(cookie).toMatch(/seamrun\.sid=/);
      const expires = new Date(/Expires=([^;]+)/i.exec(cookie)![1]).getTime();
      // The 12-hour expiry counts from this request, to the second of the cookie's date.
      expect(Math.abs(expires - (later + 12 * 60 * 60 * 1000))).toBeLessThan(2000);
    } finally {
      clock.mockRestore();
    }
  });

  it('refuses bad credentials with 401 and the error envelope', async () => {
    const res = await request(app).post('/api/auth/login').send({ email: DEMO.owner, password: 'wrong-password' });
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });

  it('reports the failing field paths for invalid sign-in input', async () => {
    const res = await request(app).post('/api/auth/login').send({ email: '', password: 42 });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'password']);
  });

  it('answers /me with 401 when signed out and the user when signed in', async () => {
    expect((await request(app).get('/api/auth/me')).status).toBe(401);
    const agent = await signIn(app, DEMO.cutter);
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user.role).toBe('cutter');
  });

  it('regenerates the session id at sign-in', async () => {
    const agent = request.agent(app);
    const first = await agent.post('/api/auth/login').send({ email: DEMO.owner, password: DEMO_PASSWORD });
    const second = await agent.post('/api/auth/login').send({ email: DEMO.owner, password: DEMO_PASSWORD });
    const sid = (r: typeof first) => /seamrun\.sid=([^;]+)/.exec(String(r.headers['set-cookie']))?.[1];
    expect(sid(first)).toBeTruthy();
    expect(sid(second)).not.toBe(sid(first));
  });

  it('signs out and the old cookie no longer works', async () => {
    const agent = await signIn(app, DEMO.owner);
    expect((await agent.post('/api/auth/logout')).status).toBe(200);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });

  it('refuses a cross-site state-changing request', async () => {
    const agent = await signIn(app, DEMO.owner);
    const res = await agent.post('/api/styles').set('Sec-Fetch-Site', 'cross-site').send({});
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf');
    const form = await agent.post('/api/styles').type('form').send('code=X');
    expect(form.status).toBe(403);
  });

  it('signs a floor worker in with a PIN', async () => {
    const res = await request(app).post('/api/auth/pin').send({ email: DEMO.machinist, pin: '4011' });
    expect(res.status).toBe(200);
    expect(res.body.user.role).toBe('machinist');
  });

  it('locks an account after repeated failures', async () => {
    const { app: fresh } = await buildTestApp({ env: { LOGIN_LOCK_AFTER: '3' } });
    for (let i = 0; i < 3; i++) {
      await request(fresh).post('/api/auth/pin').send({ email: DEMO.machinist, pin: '0000' });
    }
    const res = await request(fresh).post('/api/auth/pin').send({ email: DEMO.machinist, pin: '4011' });
    expect(res.status).toBe(429);
  });

  it('rate limits sign-in attempts', async () => {
    const { app: fresh } = await buildTestApp({ env: { LOGIN_RATE_LIMIT: '3', LOGIN_LOCK_AFTER: '100' } });
    const codes: number[] = [];
    for (let i = 0; i < 5; i++) {
      codes.push((await request(fresh).post('/api/auth/login').send({ email: 'x@y.z', password: 'nope' })).status);
    }
    expect(codes.slice(0, 3)).toEqual([401, 401, 401]);
    expect(codes[4]).toBe(429);
  });

  it('opens a new studio whose owner sees only that studio', async () => {
    const agent = request.agent(app);
    const res = await agent.post('/api/auth/studios').send({
      studioName: 'Juniper Lane Atelier',
      currency: 'EUR',
      unitSystem: 'metric',
      ownerName: 'Test Owner',
      email: 'owner@juniper.example',
      password: 'a-long-password',
    });
    expect(res.status).toBe(201);
    expect(res.body.user.role).toBe('owner');
    const users = await agent.get('/api/users');
    expect(users.body.users.map((u: { email: string }) => u.email)).toEqual(['owner@juniper.example']);
    expect((await agent.get('/api/batches')).body.batches).toEqual([]);
    expect((await agent.get('/api/styles/1')).status).toBe(404);
  });

  it('changes a password, drops other sessions, and never logs a stack trace', async () => {
    const { app: fresh } = await buildTestApp();
    const a = await signIn(fresh, DEMO.finisher);
    const b = await signIn(fresh, DEMO.finisher);
    const bad = await a.post('/api/auth/password').send({ currentPassword: 'nope', newPassword: 'short' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.newPassword).toBeTruthy();
    expect(JSON.stringify(bad.body)).not.toMatch(/at .*\.ts/);
    const ok = await a.post('/api/auth/password').send({ currentPassword: DEMO_PASSWORD, newPassword: 'another-long-one' });
    expect(ok.status).toBe(200);
    expect((await a.get('/api/auth/me')).status).toBe(200);
    expect((await b.get('/api/auth/me')).status).toBe(401);
  });
});
