import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, DEMO, DEMO_PASSWORD, signIn } from '../fixtures/test-app';

/**
 * Floor PINs: a warning before the lock, the owner lifts a lock or gives a new PIN, obvious PINs are refused.
 * The lock after 8 wrong tries is the app's default (LOGIN_LOCK_AFTER); the blocklist rule is NIST SP 800-63B §5.1.1.2.
 */
const RIGHT_PIN = '4011'; // Achieng (machinist1) in the demo seed: prefix 40 + 11.
let app: Awaited<ReturnType<typeof buildTestApp>>['app'];
let owner: Awaited<ReturnType<typeof signIn>>;
let achiengId: number;

beforeAll(async () => {
  ({ app } = await buildTestApp());
  owner = await signIn(app, DEMO.owner);
  achiengId = (await request(app).post('/api/auth/pin').send({ email: DEMO.machinist, pin: RIGHT_PIN })).body.user.id;
});

async function boundTablet() {
  const tablet = request.agent(app);
  await tablet.post('/api/auth/login').send({ email: DEMO.owner, password: DEMO_PASSWORD });
  expect((await tablet.post('/api/auth/floor-device').send({ label: 'PIN care tablet' })).status).toBe(201);
  await tablet.post('/api/auth/logout');
  return tablet;
}
const person = async (id: number) => ((await owner.get('/api/users')).body.users as { id: number; pinLockedUntil: string | null; hasPin: boolean }[]).find((u) => u.id === id)!;

describe('floor PIN lock: warned before, lifted by the owner', () => {
  it('says how many tries are left on the last two wrong PINs, locks on the eighth, and the owner lifts the lock', async () => {
    const tablet = await boundTablet();
    const answers = [];
    for (let i = 0; i < 8; i++) answers.push(await tablet.post('/api/auth/floor/pin').send({ userId: achiengId, pin: String(5000 + i * 7) }));
    expect(answers.slice(0, 5).map((a) => a.body.error.message)).toEqual(Array(5).fill('Name or PIN is wrong'));
    expect(answers[5].status).toBe(401);
    expect(answers[5].body.error.message).toBe('Name or PIN is wrong. Tries left before a 15-minute lock: 2');
    expect(answers[5].body.error.fields.pin).toBe('Tries left: 2');
    expect(answers[6].body.error.message).toBe('Name or PIN is wrong. Tries left before a 15-minute lock: 1');
    expect(answers[7].status).toBe(429);
    expect(answers[7].body.error.code).toBe('locked');
    expect((await tablet.post('/api/auth/floor/pin').send({ userId: achiengId, pin: RIGHT_PIN })).status).toBe(429);

    expect((await person(achiengId)).pinLockedUntil).not.toBeNull();
    const unlocked = await owner.post(`/api/users/${achiengId}/unlock`);
    expect(unlocked.status).toBe(200);
    expect(unlocked.body.user.pinLockedUntil).toBeNull();
    expect((await tablet.post('/api/auth/floor/pin').send({ userId: achiengId, pin: RIGHT_PIN })).status).toBe(200);
  });
});

describe('the owner gives a new PIN', () => {
  it('replaces the PIN: the new one signs in, the old one no longer does, and the old session ends', async () => {
    const machinist2 = await signIn(app, 'machinist2@tamarind.example');
    const id = (await machinist2.get('/api/auth/me')).body.user.id;
    const old = request.agent(app);
    expect((await old.post('/api/auth/pin').send({ email: 'machinist2@tamarind.example', pin: '4012' })).status).toBe(200);
    const set = await owner.post(`/api/users/${id}/pin`).send({ pin: '7305' });
    expect(set.status).toBe(200);
    expect(set.body.user.hasPin).toBe(true);
    expect((await old.get('/api/auth/me')).status).toBe(401);
    expect((await request(app).post('/api/auth/pin').send({ email: 'machinist2@tamarind.example', pin: '4012' })).status).toBe(401);
    expect((await request(app).post('/api/auth/pin').send({ email: 'machinist2@tamarind.example', pin: '7305' })).status).toBe(200);
  });

  it('refuses an obvious PIN with a 400 naming the field, on a new PIN and on a new person', async () => {
    for (const pin of ['1234', '0000', '987654', '12']) {
      const res = await owner.post(`/api/users/${achiengId}/pin`).send({ pin });
      expect(res.status).toBe(400);
      expect(Object.keys(res.body.error.fields)).toEqual(['pin']);
    }
    const made = await owner.post('/api/users').send({ name: 'Easy Pin', email: 'easy-pin@tamarind.example', role: 'machinist', pin: '4321' });
    expect(made.status).toBe(400);
    expect(made.body.error.fields.pin).toBe('Too easy to guess: not one digit repeated or a run like 1234');
    // The PIN she had still signs her in: a refused change changes nothing.
    expect((await request(app).post('/api/auth/pin').send({ email: DEMO.machinist, pin: RIGHT_PIN })).status).toBe(200);
  });

  it('lets only the owner set a PIN or lift a lock, and only for their own studio', async () => {
    const machinist = await signIn(app, DEMO.machinist);
    expect((await machinist.post(`/api/users/${achiengId}/pin`).send({ pin: '7305' })).status).toBe(403);
    expect((await machinist.post(`/api/users/${achiengId}/unlock`)).status).toBe(403);
    const other = request.agent(app);
    await other.post('/api/auth/studios').send({ studioName: 'Pin Care Other', currency: 'EUR', unitSystem: 'metric', ownerName: 'Other Owner', email: 'owner@pin-care-other.example', password: 'another-long-password' });
    expect((await other.post(`/api/users/${achiengId}/pin`).send({ pin: '7305' })).status).toBe(404);
    expect((await other.post(`/api/users/${achiengId}/unlock`)).status).toBe(404);
  });
});
