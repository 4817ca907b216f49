import { beforeAll, describe, expect, it } from 'vitest';
import { UserEntity } from '../../server/entities';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent, machinist: Agent;
let ds: Awaited<ReturnType<typeof buildTestApp>>['ds'];
// TEST_TODAY is 1 Dec 2026 08:00 UTC: the studio's today.
const TODAY = '2026-12-01';

beforeAll(async () => {
  const built = await buildTestApp();
  ds = built.ds;
  owner = await signIn(built.app, DEMO.owner);
  machinist = await signIn(built.app, DEMO.machinist);
}, 60_000);

const machinists = () => ds.getRepository(UserEntity).find({ where: { studioId: 1, role: 'machinist', active: true }, order: { id: 'ASC' } });

describe('attendance', () => {
  it('lists the floor people of today with nothing recorded, and is the owner’s only', async () => {
    const res = await owner.get('/api/floor/attendance');
    expect(res.status).toBe(200);
    expect(res.body.day).toBe(TODAY);
    expect(res.body.people.length).toBeGreaterThan(0);
    expect(res.body.people.every((p: { minutes: number | null }) => p.minutes === null)).toBe(true);
    expect((await machinist.get('/api/floor/attendance')).status).toBe(403);
    expect((await machinist.put('/api/floor/attendance').send({ day: TODAY, entries: [{ userId: 1, minutes: 480 }] })).status).toBe(403);
  });

  it('answers a 400 naming the field for more than 24 hours, an impossible date or someone not on the floor', async () => {
    const [m] = await machinists();
    const long = await owner.put('/api/floor/attendance').send({ day: TODAY, entries: [{ userId: m.id, minutes: 2000 }] });
    expect(long.status).toBe(400);
    expect(long.body.error.fields['entries.0.minutes']).toBe('At most 24 hours');
    expect((await owner.put('/api/floor/attendance').send({ day: '2026-11-31', entries: [{ userId: m.id, minutes: 60 }] })).body.error.fields.day).toBeTruthy();
    const owners = await ds.getRepository(UserEntity).findOneByOrFail({ email: DEMO.owner });
    const notFloor = await owner.put('/api/floor/attendance').send({ day: TODAY, entries: [{ userId: owners.id, minutes: 60 }] });
    expect(notFloor.status).toBe(400);
    expect(notFloor.body.error.fields['entries.0.userId']).toBe('Not an active person of the floor');
  });

  it('plans the line with only the machinists recorded in today when attendance was taken', async () => {
    const all = await machinists();
    expect(all.length).toBeGreaterThan(2);
    const entries = all.map((m, i) => ({ userId: m.id, minutes: i < 2 ? 480 : 0 }));
    const saved = await owner.put('/api/floor/attendance').send({ day: TODAY, entries });
    expect(saved.status).toBe(200);
    expect(saved.body.people.filter((p: { role: string; minutes: number }) => p.role === 'machinist' && p.minutes > 0)).toHaveLength(2);
    const plan = (await owner.get('/api/line/batches/1/plan?mode=people')).body.plan;
    expect(plan.assumptions.some((a: string) => /today's attendance/.test(a))).toBe(true);
    const planned = plan.staffing.people.map((p: { personId: number | null }) => p.personId);
    expect(planned.sort()).toEqual([all[0].id, all[1].id].sort());
  }, 60_000);

  it('gives the pay preview the attended minutes recorded, and freezes a day once a pay period covering it is approved', async () => {
    const [m] = await machinists();
    // The demo's work is logged on 26, 27 and 30 Nov 2026 (tests/integration/pay.api.test.ts).
    expect((await owner.put('/api/floor/attendance').send({ day: '2026-11-30', entries: [{ userId: m.id, minutes: 450 }] })).status).toBe(200);
    const preview = (await owner.get('/api/pay/preview?from=2026-11-30&to=2026-11-30')).body.preview;
    expect(preview.people.find((p: { userId: number }) => p.userId === m.id).attendedMinutes).toBe(450);
    expect((await owner.post('/api/pay/periods').send({ fromDay: '2026-11-23', toDay: '2026-11-30' })).status).toBe(201);
    const late = await owner.put('/api/floor/attendance').send({ day: '2026-11-30', entries: [{ userId: m.id, minutes: 600 }] });
    expect(late.status).toBe(409);
    const day = (await owner.get('/api/floor/attendance?day=2026-11-30')).body;
    expect(day.frozenByPeriodId).not.toBeNull();
    expect(day.people.find((p: { userId: number }) => p.userId === m.id).minutes).toBe(450);
  });
});
