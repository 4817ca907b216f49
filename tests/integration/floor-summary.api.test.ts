import { beforeAll, describe, expect, it } from 'vitest';
import { UserEntity, WorkLogEntity } from '../../server/entities';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent, machinist: Agent;
let ds: Awaited<ReturnType<typeof buildTestApp>>['ds'];
let me: number;
// TEST_TODAY is Tuesday 1 Dec 2026 (UTC studio); the demo logs work on 26, 27 and 30 Nov.

beforeAll(async () => {
  const built = await buildTestApp();
  ds = built.ds;
  owner = await signIn(built.app, DEMO.owner);
  machinist = await signIn(built.app, DEMO.machinist);
  me = (await ds.getRepository(UserEntity).findOneByOrFail({ email: DEMO.machinist })).id;
}, 60_000);

/** Pieces and pay of the machinist's first-attempt logs made from `from` (UTC), straight from the table. */
async function expected(from: string) {
  const logs = (await ds.getRepository(WorkLogEntity).findBy({ userId: me })).filter((l) => l.attempt === 0 && new Date(l.createdAt).getTime() >= Date.parse(`${from}T00:00:00Z`));
  return { pieces: logs.reduce((a, l) => a + l.pieces, 0), earningsMinor: logs.reduce((a, l) => a + l.payMinor, 0) };
}

describe("a machinist's week and pay period on the floor", () => {
  it('gives this week from Monday and the pay period since the first unpaid day, not only today', async () => {
    const res = await machinist.get('/api/floor/me/summary');
    expect(res.status).toBe(200);
    const s = res.body;
    expect(s.today).toMatchObject({ fromDay: '2026-12-01', toDay: '2026-12-01', pieces: 0 });
    expect(s.week).toMatchObject({ fromDay: '2026-11-30', toDay: '2026-12-01', ...(await expected('2026-11-30')) });
    expect(s.week.pieces).toBeGreaterThan(0);
    const mine = await ds.getRepository(WorkLogEntity).findBy({ userId: me });
    const firstDay = mine.map((l) => new Date(l.createdAt).toISOString().slice(0, 10)).sort()[0];
    expect(s.payPeriod).toMatchObject({ fromDay: firstDay, toDay: '2026-12-01', ...(await expected('2026-11-01')) });
  });

  it('starts the pay period the day after the last approved one', async () => {
    expect((await owner.post('/api/pay/periods').send({ fromDay: '2026-11-23', toDay: '2026-11-30' })).status).toBe(201);
    const s = (await machinist.get('/api/floor/me/summary')).body;
    expect(s.payPeriod).toMatchObject({ fromDay: '2026-12-01', pieces: 0, earningsMinor: 0 });
    expect(s.week.pieces).toBeGreaterThan(0);
  });

  it('is for signed-in people only', async () => {
    const { app } = await buildTestApp({ seed: false });
    const request = (await import('supertest')).default;
    expect((await request(app).get('/api/floor/me/summary')).status).toBe(401);
  });
});
