import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { buildTestApp, DEMO, DEMO_PASSWORD } from '../fixtures/test-app';

// The demo PINs are the prefix 40 plus two digits; Achieng (machinist1) has 4011.
const RIGHT_PIN = '4011';

describe('floor PIN guesses are counted before they are judged', () => {
  it('judges at most the lock threshold of 40 parallel wrong PINs, refuses the rest with 429, and then the right PIN too', async () => {
    const { app } = await buildTestApp({ env: { LOGIN_LOCK_AFTER: '5' } });
    const wrong = Array.from({ length: 40 }, (_, i) => String(1000 + i));
    const answers = await Promise.all(wrong.map((pin) => request(app).post('/api/auth/pin').send({ email: DEMO.machinist, pin })));
    const judged = answers.filter((a) => a.status === 401).length;
    const refused = answers.filter((a) => a.status === 429).length;
    expect(judged).toBe(5);
    expect(judged + refused).toBe(40);
    expect(answers.find((a) => a.status === 429)!.body.error.code).toBe('locked');
    const right = await request(app).post('/api/auth/pin').send({ email: DEMO.machinist, pin: RIGHT_PIN });
    expect(right.status).toBe(429);
  });

  it('counts a padded or upper-cased e-mail in the same rate-limit bucket and account', async () => {
    const { app } = await buildTestApp({ env: { LOGIN_RATE_LIMIT: '3', LOGIN_LOCK_AFTER: '100' } });
    const spellings = [`  ${DEMO.machinist}`, `${DEMO.machinist.toUpperCase()}   `, `\t${DEMO.machinist}\t`];
    for (const email of spellings) expect((await request(app).post('/api/auth/pin').send({ email, pin: '0000' })).status).toBe(401);
    const fourth = await request(app).post('/api/auth/pin').send({ email: DEMO.machinist, pin: RIGHT_PIN });
    expect(fourth.status).toBe(429);
    expect(fourth.body.error.code).toBe('rate_limited');
  });

  it('limits failed sign-ins per address across different accounts', async () => {
    const { app } = await buildTestApp({ env: { LOGIN_IP_FAILURE_LIMIT: '4', LOGIN_LOCK_AFTER: '100' } });
    const people = ['machinist1', 'machinist2', 'machinist3', 'finisher1', 'finisher2'].map((p) => `${p}@tamarind.example`);
    const codes: number[] = [];
    for (const email of people) codes.push((await request(app).post('/api/auth/pin').send({ email, pin: '0000' })).status);
    expect(codes).toEqual([401, 401, 401, 401, 429]);
    // Over the limit, the address is refused every sign-in until the 15 minutes pass.
    expect((await request(app).post('/api/auth/login').send({ email: DEMO.owner, password: DEMO_PASSWORD })).status).toBe(429);
  });

  it('keeps PIN failures apart so PIN guesses never lock the owner out of the password form', async () => {
    const { app } = await buildTestApp({ env: { LOGIN_LOCK_AFTER: '3' } });
    for (let i = 0; i < 6; i++) await request(app).post('/api/auth/pin').send({ email: DEMO.owner, pin: '1234' });
    expect((await request(app).post('/api/auth/pin').send({ email: DEMO.owner, pin: '1234' })).status).toBe(429);
    const password = await request(app).post('/api/auth/login').send({ email: DEMO.owner, password: DEMO_PASSWORD });
    expect(password.status).toBe(200);
    expect(password.body.user.role).toBe('owner');
  });
});

describe('a studio tablet bound by the owner', () => {
  it('shows the floor list only on a bound device, names without e-mails, and signs a machinist in with only a PIN', async () => {
    const { app } = await buildTestApp();
    const tablet = request.agent(app);
    const unbound = await tablet.get('/api/auth/floor');
    expect(unbound.status).toBe(200);
    expect(unbound.body).toBeNull();
    expect((await tablet.post('/api/auth/floor/pin').send({ userId: 3, pin: RIGHT_PIN })).status).toBe(401);

    // Only the owner binds: a machinist is refused.
    await tablet.post('/api/auth/login').send({ email: DEMO.machinist, password: DEMO_PASSWORD });
    expect((await tablet.post('/api/auth/floor-device').send({})).status).toBe(403);
    await tablet.post('/api/auth/logout');
    await tablet.post('/api/auth/login').send({ email: DEMO.owner, password: DEMO_PASSWORD });
    const bound = await tablet.post('/api/auth/floor-device').send({ label: 'Sewing line tablet' });
    expect(bound.status).toBe(201);
    expect(String(bound.headers['set-cookie'])).toMatch(/seamrun\.floor=[^;]{40,};.*HttpOnly/i);
    await tablet.post('/api/auth/logout');

    const list = await tablet.get('/api/auth/floor');
    expect(list.status).toBe(200);
    expect(list.body.studioName).toBeTruthy();
    expect(list.body.people.length).toBeGreaterThanOrEqual(4);
    expect(list.body.people.every((p: { role: string }) => p.role === 'machinist' || p.role === 'finisher')).toBe(true);
    expect(JSON.stringify(list.body)).not.toContain('@');
    const achieng = list.body.people.find((p: { name: string }) => p.name === 'Achieng Mwende');

    expect((await tablet.post('/api/auth/floor/pin').send({ userId: achieng.id, pin: '0000' })).status).toBe(401);
    const signedIn = await tablet.post('/api/auth/floor/pin').send({ userId: achieng.id, pin: RIGHT_PIN });
    expect(signedIn.status).toBe(200);
    expect(signedIn.body.user).toMatchObject({ name: 'Achieng Mwende', role: 'machinist' });
    expect((await tablet.get('/api/auth/me')).body.user.name).toBe('Achieng Mwende');

    // The owner is not on the floor list and cannot sign in there, whatever the PIN.
    const ownerId = (await request(app).post('/api/auth/login').send({ email: DEMO.owner, password: DEMO_PASSWORD })).body.user.id;
    expect((await tablet.post('/api/auth/floor/pin').send({ userId: ownerId, pin: RIGHT_PIN })).status).toBe(401);
  });

  it('refuses a device token of one studio for a person of another', async () => {
    const { app } = await buildTestApp();
    const other = request.agent(app);
    await other.post('/api/auth/studios').send({
      studioName: 'Other Floor Studio', currency: 'EUR', unitSystem: 'metric',
      ownerName: 'Other Owner', email: 'owner@other-floor.example', password: 'another-long-password',
    });
    expect((await other.post('/api/auth/floor-device').send({})).status).toBe(201);
    await other.post('/api/auth/logout');
    expect((await other.get('/api/auth/floor')).body.people).toEqual([]);
    const achiengId = (await request(app).post('/api/auth/pin').send({ email: DEMO.machinist, pin: RIGHT_PIN })).body.user.id;
    expect((await other.post('/api/auth/floor/pin').send({ userId: achiengId, pin: RIGHT_PIN })).status).toBe(401);
  });
});
