import { In } from 'typeorm';
import { beforeAll, describe, expect, it } from 'vitest';
import { AttendanceEntity, BundleEntity, OperationEntity, UserEntity, WorkLogEntity } from '../../server/entities';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent, machinist: Agent;
let ds: Awaited<ReturnType<typeof buildTestApp>>['ds'];
let machinistId: number;
// A week of its own, after the demo's logs: Monday 4 to Friday 8 January 2027 (days in the studio's calendar).
const WEEK = { fromDay: '2027-01-04', toDay: '2027-01-08' };

/** Log `pieces` of an operation on a bundle for the machinist, at an exact rate, made on `day`. */
async function logWork(opIndex: number, bundleIndex: number, pieces: number, rate: string, day: string, at = `${day}T10:00:00Z`) {
  const ops = await ds.getRepository(OperationEntity).find({ where: { studioId: 1, styleId: 1, section: 'sewing' }, order: { seq: 'ASC' } });
  const bundles = await ds.getRepository(BundleEntity).find({ where: { studioId: 1, number: In([9001, 9002, 9003]) }, order: { number: 'ASC' } });
  await ds.getRepository(WorkLogEntity).save({
    studioId: 1, bundleId: bundles[bundleIndex].id, operationId: ops[opIndex].id, attempt: 0, userId: machinistId, pieces,
    earnedMinutes: 0, payMinor: 0, pieceRate: rate, idempotencyKey: `pay-rules-${opIndex}-${bundleIndex}-${day}`, outcome: '', defect: '', createdAt: new Date(at),
  });
}

beforeAll(async () => {
  const built = await buildTestApp();
  ds = built.ds;
  owner = await signIn(built.app, DEMO.owner);
  machinist = await signIn(built.app, DEMO.machinist);
  machinistId = (await ds.getRepository(UserEntity).findOneByOrFail({ email: DEMO.machinist })).id;
  // Three bundles no one has worked on, so every log here is a first log.
  const any = await ds.getRepository(BundleEntity).findOneByOrFail({ studioId: 1, batchId: 1 });
  for (const number of [9001, 9002, 9003]) {
    await ds.getRepository(BundleEntity).save({ ...any, id: undefined, number, numberScope: 0, reopened: {}, createdAt: undefined });
  }
}, 60_000);

describe('exact piece rates', () => {
  it('stores a rate of 0.125 minor units per piece exactly and gives it back when the owner saves the table', async () => {
    const ops = (await owner.get('/api/styles/1/operations')).body.operations;
    const rows = ops.map((o: Record<string, unknown>, i: number) => ({ code: o.code, name: o.name, section: o.section, machineType: o.machineType, sam: o.sam, predecessors: o.predecessors, pieceRateMinor: i === 5 ? 0.125 : o.pieceRateMinor }));
    const res = await owner.put('/api/styles/1/operations').send({ operations: rows });
    expect(res.status).toBe(200);
    expect(res.body.operations[5].pieceRateMinor).toBe(0.125);
    const stored = await ds.getRepository(OperationEntity).findOneByOrFail({ id: ops[5].id });
    expect(stored.pieceRate).toBe('0.125');
    rows[5].pieceRateMinor = 0.1234567;
    const bad = await owner.put('/api/styles/1/operations').send({ operations: rows });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['operations.5.pieceRateMinor']).toBe('At most 6 decimals of a minor unit');
  });
});

describe('pay rules', () => {
  it('keeps the rules to the owner and says local law decides', async () => {
    expect((await machinist.get('/api/pay/rules')).status).toBe(403);
    expect((await machinist.put('/api/pay/rules').send({ minimumWageOn: false, overtimePremiumPercent: 0 })).status).toBe(403);
    const res = await owner.get('/api/pay/rules');
    expect(res.body.rules).toMatchObject({ minimumWageOn: false, minimumHourlyMinor: null, overtimePremiumPercent: 0 });
    expect(res.body.rules.caution).toMatch(/local law/);
  });

  it('answers a 400 naming the hourly rate when the top-up is turned on without one', async () => {
    const res = await owner.put('/api/pay/rules').send({ minimumWageOn: true, overtimePremiumPercent: 25 });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.minimumHourlyMinor).toBe('Enter the minimum wage per hour to turn the top-up on');
    expect((await owner.get('/api/pay/rules')).body.rules.minimumWageOn).toBe(false);
  });

  it('rounds each pay line once, tops up to the minimum for attended hours, pays the overtime premium, and a re-run computes the same lines', async () => {
    // Three logs of 3 pieces at 0.125: 9 × 0.125 = 1.125 → 1 once (three logs rounded alone would pay 0 + 0 + 0).
    for (const [b, day] of [[0, '2027-01-04'], [1, '2027-01-05'], [2, '2027-01-06']] as const) await logWork(5, b, 3, '0.125', day);
    await logWork(6, 0, 10, '20', '2027-01-04');
    // 8 h on Monday and Tuesday, 10 h on Wednesday (8 h calendar): 1 560 minutes (26 h), 120 of them overtime.
    const att = ds.getRepository(AttendanceEntity);
    for (const [day, minutes] of [['2027-01-04', 480], ['2027-01-05', 480], ['2027-01-06', 600]] as const) await att.save({ studioId: 1, userId: machinistId, day, minutes });
    const rules = await owner.put('/api/pay/rules').send({ minimumWageOn: true, minimumHourlyMinor: 150, overtimePremiumPercent: 25 });
    expect(rules.status).toBe(200);
    const preview = (await owner.get(`/api/pay/preview?from=${WEEK.fromDay}&to=${WEEK.toDay}`)).body.preview;
    const me = preview.people.find((p: { userId: number }) => p.userId === machinistId);
    // Hand arithmetic: pieces 1 + 200 = 201; minimum 26 h × 150 = 3900 → top-up 3699; regular rate max(201/26, 150) = 150 an hour,
    // premium 2 h × 150 × 25 % = 75 (ILO C1 Art. 6(2): overtime at least 1.25 × the regular rate).
    expect(me).toMatchObject({ pieceMinor: 201, topUpMinor: 3699, overtimeMinor: 75, overtimeMinutes: 120, amountMinor: 201 + 3699 + 75 });
    const approved = await owner.post('/api/pay/periods').send(WEEK);
    expect(approved.status).toBe(201);
    const line = approved.body.period.lines.find((l: { userId: number }) => l.userId === machinistId);
    expect(line).toMatchObject({ pieceMinor: 201, topUpMinor: 3699, overtimeMinor: 75, amountMinor: 3975 });
    const again = await owner.get(`/api/pay/periods/${approved.body.period.id}/recompute`);
    expect(again.body.same).toBe(true);
    expect(again.body.lines).toEqual(approved.body.period.lines);
  });

  it('keeps an approved period as approved when the rules change afterwards and refuses to approve its days twice', async () => {
    const period = (await owner.get('/api/pay/periods')).body.periods.find((p: { fromDay: string }) => p.fromDay === WEEK.fromDay);
    await owner.put('/api/pay/rules').send({ minimumWageOn: true, minimumHourlyMinor: 400, overtimePremiumPercent: 50 });
    const again = await owner.get(`/api/pay/periods/${period.id}/recompute`);
    expect(again.body.same).toBe(true);
    expect((await owner.get(`/api/pay/periods/${period.id}`)).body.period.totalMinor).toBe(period.totalMinor);
    expect((await owner.post('/api/pay/periods').send(WEEK)).status).toBe(409);
  });
});

describe('pay days in the studio time zone', () => {
  it('pays a log made at 22:30 UTC on 1 March in the Nairobi studio’s 2 March, not its 1 March', async () => {
    // Africa/Nairobi is UTC+3 all year (IANA tzdata): 22:30 UTC is 01:30 the next day there.
    const cal = await owner.put('/api/line/calendar').send({ timeZone: 'Africa/Nairobi', workdays: [1, 2, 3, 4, 5], shiftStart: '08:00', shiftEnd: '17:00', breakMinutes: 60, holidays: [], overtimeLimitHoursPerWeek: null });
    expect(cal.status).toBe(200);
    await logWork(7, 0, 4, '10', '2027-03-01', '2027-03-01T22:30:00Z');
    const first = (await owner.get('/api/pay/preview?from=2027-03-01&to=2027-03-01')).body.preview;
    expect(first.people.find((p: { userId: number }) => p.userId === machinistId)).toBeUndefined();
    const second = (await owner.get('/api/pay/preview?from=2027-03-02&to=2027-03-02')).body.preview;
    expect(second.people.find((p: { userId: number }) => p.userId === machinistId)).toMatchObject({ pieces: 4, pieceMinor: 40 });
  });
});
