import ExcelJS from 'exceljs';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp, type AppControl } from '../../server/app';
import { openDatabase } from '../../server/db/data-source';
import { freshDatabaseTarget } from '../fixtures/fresh-database';
import { AttendanceEntity, OperationEntity, PayPeriodEntity, UserEntity, WorkLogEntity } from '../../server/entities';
import { loadEnv } from '../../server/env';
import { logEarnedMinutes } from '../../server/modules/floor/floor-math';
import type { PaymentsFake } from '../../server/modules/pay/payments-fake';
import { payeeAccount } from '../../server/modules/pay/pay.service';
import { seedDemoStudio } from '../../server/seed/demo-studio';
import { buildTestApp, DEMO, DEMO_PASSWORD, signIn, TEST_TODAY } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent, machinist: Agent;
let fake: PaymentsFake;
let ds: Awaited<ReturnType<typeof openDatabase>>;
// The demo seed logs work on the three working days before TEST_TODAY (1 Dec 2026): 26, 27 and 30 Nov.
const PERIOD = { fromDay: '2026-11-23', toDay: '2026-11-30' };

beforeAll(async () => {
  ds = await openDatabase(await freshDatabaseTarget());
  await seedDemoStudio(ds, { password: DEMO_PASSWORD, pinPrefix: '40', today: TEST_TODAY });
  const control: { current?: AppControl } = {};
  const app = createApp({ ds, env: loadEnv({ NODE_ENV: 'test', LOGIN_RATE_LIMIT: '1000' }), clientDir: '/nonexistent', control });
  fake = await control.current!.services.pay.fake!();
  owner = await signIn(app, DEMO.owner);
  machinist = await signIn(app, DEMO.machinist);
});

describe('pay periods', () => {
  it('says payments are in test mode without a secret key', async () => {
    expect((await owner.get('/api/pay/mode')).body).toEqual({ testMode: true, message: 'Test payments: no money moves.' });
  });

  it('previews pieces × rate per person and refuses floor roles', async () => {
    const res = await owner.get(`/api/pay/preview?from=${PERIOD.fromDay}&to=${PERIOD.toDay}`);
    expect(res.status).toBe(200);
    const { people, totalMinor } = res.body.preview;
    expect(people.length).toBeGreaterThan(0);
    for (const p of people) expect(p.amountMinor).toBe(p.operations.reduce((a: number, o: { pieces: number; rateMinor: number }) => a + o.pieces * o.rateMinor, 0));
    expect(totalMinor).toBe(people.reduce((a: number, p: { amountMinor: number }) => a + p.amountMinor, 0));
    expect((await machinist.get(`/api/pay/preview?from=${PERIOD.fromDay}&to=${PERIOD.toDay}`)).status).toBe(403);
    expect((await machinist.get('/api/pay/periods')).status).toBe(403);
    const bad = await owner.get('/api/pay/preview?from=2026-11-30&to=2026-11-01');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.to).toBeTruthy();
  });

  it('shows a machinist their own pay only', async () => {
    const me = (await machinist.get(`/api/pay/me?from=${PERIOD.fromDay}&to=${PERIOD.toDay}`)).body.pay;
    const me1 = await ds.getRepository(UserEntity).findOneByOrFail({ email: DEMO.machinist });
    const logs = await ds.getRepository(WorkLogEntity).findBy({ userId: me1.id });
    expect(me.amountMinor).toBe(logs.reduce((a, l) => a + l.payMinor, 0));
  });

  it('computes efficiency as earned ÷ attended minutes on the textbook example', async () => {
    // Source: ../shared/reference/production-and-costing.md §2.2 E2 (onlineclothingstudy.com 2017/01):
    // 400 pieces of a 0.5 min job in 480 min → 200 min produced → 41.67 %.
    const user = await ds.getRepository(UserEntity).findOneByOrFail({ email: 'machinist6@tamarind.example' });
    const op = (await ds.getRepository(OperationEntity).find())[0];
    await ds.getRepository(AttendanceEntity).save({ studioId: 1, userId: user.id, day: '2026-10-05', minutes: 480 });
    await ds.getRepository(WorkLogEntity).save({
      studioId: 1, bundleId: 9999, operationId: op.id, attempt: 0, userId: user.id, pieces: 400,
      earnedMinutes: logEarnedMinutes(400, 0.5, 0), payMinor: 0, idempotencyKey: 'textbook-e2', createdAt: new Date('2026-10-05T10:00:00Z'),
    });
    const p = (await owner.get('/api/pay/preview?from=2026-10-05&to=2026-10-05')).body.preview.people;
    expect(p.find((x: { userId: number }) => x.userId === user.id)).toMatchObject({ earnedMinutes: 200, attendedMinutes: 480, efficiencyPercent: 41.67 });
  });

  it('approves a period once, pays each person once however often the button is pressed', async () => {
    const res = await owner.post('/api/pay/periods').send(PERIOD);
    expect(res.status).toBe(201);
    const period = res.body.period;
    expect(period.status).toBe('approved');
    expect((await owner.post('/api/pay/periods').send({ fromDay: '2026-11-30', toDay: '2026-12-02' })).status).toBe(409);
    const bad = await owner.post('/api/pay/periods').send({ fromDay: '2026-12-09', toDay: '2026-12-01' });
    expect(bad.body.error.fields.toDay).toBe('The end must not be before the start');

    const [first, ...rest] = period.lines;
    const clicks = await Promise.all(Array.from({ length: 6 }, () => owner.post(`/api/pay/periods/${period.id}/payouts`).send({ userId: first.userId })));
    expect(clicks.every((c) => c.status === 200 && c.body.payout.status === 'paid')).toBe(true);
    expect(new Set(clicks.map((c) => c.body.payout.providerRef)).size).toBe(1);
    const later = await owner.post(`/api/pay/periods/${period.id}/payouts`).send({ userId: first.userId });
    expect(later.body.payout.providerRef).toBe(clicks[0].body.payout.providerRef);
    expect(fake.transfers.filter((t) => t.destination === payeeAccount(1, first.userId))).toHaveLength(1);
    expect(fake.transfers[0].amount).toBe(first.amountMinor);

    // A refused payout says why and can be retried; the retry pays exactly once.
    const second = rest[0];
    fake.failFor(payeeAccount(1, second.userId), 'Account details are incomplete');
    const failed = (await owner.post(`/api/pay/periods/${period.id}/payouts`).send({ userId: second.userId })).body.payout;
    expect(failed).toMatchObject({ status: 'failed', error: expect.stringContaining('Account details are incomplete') });
    fake.clearFailures();
    const retried = (await owner.post(`/api/pay/periods/${period.id}/payouts`).send({ userId: second.userId })).body.payout;
    expect(retried).toMatchObject({ status: 'paid', attempts: 2, error: '' });
    expect(fake.transfers.filter((t) => t.destination === payeeAccount(1, second.userId))).toHaveLength(1);

    // A person whose own payments account the owner has set is paid into it.
    const third = rest[1];
    const badAccount = await owner.patch(`/api/users/${third.userId}`).send({ payoutAccount: 'acct 1; DROP' });
    expect(badAccount.status).toBe(400);
    expect(badAccount.body.error.fields.payoutAccount).toMatch(/Letters, digits and _/);
    expect((await owner.patch(`/api/users/${third.userId}`).send({ payoutAccount: 'acct_1TamarindTest' })).status).toBe(200);
    expect((await machinist.patch(`/api/users/${third.userId}`).send({ payoutAccount: 'acct_mine' })).status).toBe(403);
    await owner.post(`/api/pay/periods/${period.id}/payouts`).send({ userId: third.userId });
    expect(fake.transfers.filter((t) => t.destination === 'acct_1TamarindTest')).toHaveLength(1);

    for (const l of rest.slice(2)) await owner.post(`/api/pay/periods/${period.id}/payouts`).send({ userId: l.userId });
    const done = (await owner.get(`/api/pay/periods/${period.id}`)).body.period;
    expect(done.status).toBe('paid');
    expect(done.payouts.every((p: { status: string }) => p.status === 'paid')).toBe(true);
  });

  it('refuses a live payout to a person with no payments account, before anything is sent', async () => {
    const live = await openDatabase(await freshDatabaseTarget());
    await seedDemoStudio(live, { password: DEMO_PASSWORD, pinPrefix: '40', today: TEST_TODAY });
    const app = createApp({ ds: live, env: loadEnv({ NODE_ENV: 'test', LOGIN_RATE_LIMIT: '1000', PAYMENTS_SECRET_KEY: 'sk_test_not_a_real_key' }), clientDir: '/nonexistent' });
    const liveOwner = await signIn(app, DEMO.owner);
    expect((await liveOwner.get('/api/pay/mode')).body.testMode).toBe(false);
    const period = (await liveOwner.post('/api/pay/periods').send(PERIOD)).body.period;
    const line = period.lines[0];
    const res = await liveOwner.post(`/api/pay/periods/${period.id}/payouts`).send({ userId: line.userId });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ payoutAccount: 'Not set for this person' });
    expect(res.body.error.message).toContain('People page');
    expect((await liveOwner.get(`/api/pay/periods/${period.id}`)).body.period.payouts).toEqual([]);
    await live.destroy();
  });

  it('exports the approved pay sheet as XLSX with the period total', async () => {
    const period = (await owner.get('/api/pay/periods')).body.periods[0];
    const res = await owner.get(`/api/pay/periods/${period.id}/sheet.xlsx`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toContain('spreadsheetml');
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(res.body);
    const text = JSON.stringify(wb.worksheets[0].getSheetValues());
    for (const l of period.lines) expect(text).toContain(l.name);
  });
});

describe('pay periods are whole calendar days', () => {
  it('refuses impossible dates on pay routes with a 400 naming the field, never a 500', async () => {
    const preview = await owner.get('/api/pay/preview?from=2026-13-45&to=2026-12-01');
    expect(preview.status).toBe(400);
    expect(preview.body.error.fields.from).toBe('Not a real date: that day does not exist in the calendar');
    const mine = await machinist.get('/api/pay/me?from=2026-11-01&to=2026-11-31');
    expect(mine.status).toBe(400);
    expect(mine.body.error.fields.to).toBeTruthy();
    const periodsBefore = (await owner.get('/api/pay/periods')).body.periods.length;
    // 2026-11-31 would roll over to 1 December and pay an already-paid day again.
    const approve = await owner.post('/api/pay/periods').send({ fromDay: '2026-11-31', toDay: '2026-12-01' });
    expect(approve.status).toBe(400);
    expect(approve.body.error.fields.fromDay).toBe('Not a real date: that day does not exist in the calendar');
    expect((await owner.post('/api/pay/periods').send({ fromDay: '2026-12-01', toDay: '2026-13-45' })).body.error.fields.toDay).toBeTruthy();
    expect((await owner.get('/api/pay/periods')).body.periods.length).toBe(periodsBefore);
  });

  it('judges overlap on real dates when a period saved before the check ends on a day that does not exist', async () => {
    // Saved by the old pattern check: 2026-10-32 is 1 November once read as a date, and pay was counted that way.
    const legacy = await ds.getRepository(PayPeriodEntity).save({ studioId: 1, number: 900, fromDay: '2026-10-26', toDay: '2026-10-32', status: 'paid', approvedBy: 1, lines: [] });
    const preview = (await owner.get('/api/pay/preview?from=2026-11-01&to=2026-11-01')).body.preview;
    expect(preview.overlapsPeriodId).toBe(legacy.id);
    const res = await owner.post('/api/pay/periods').send({ fromDay: '2026-11-01', toDay: '2026-11-02' });
    expect(res.status).toBe(409);
    expect(res.body.error.fields.fromDay).toBe('Overlaps an approved period');
    await ds.getRepository(PayPeriodEntity).delete({ id: legacy.id });
  });
});

describe('a period closes its days', () => {
  it('pays a log made on an approved day after the approval in the next period, never nowhere', async () => {
    const { app, ds: db } = await buildTestApp();
    const [boss, sewer] = [await signIn(app, DEMO.owner), await signIn(app, DEMO.machinist)];
    // The app's clock stands on 1 December (TEST_TODAY): the owner approves up to and including today.
    const first = (await boss.post('/api/pay/periods').send({ fromDay: '2026-11-23', toDay: '2026-12-01' })).body.period;
    const sewerId = (await db.getRepository(UserEntity).findOneByOrFail({ email: DEMO.machinist })).id;
    const paidBefore = first.lines.find((l: { userId: number }) => l.userId === sewerId)?.amountMinor ?? 0;
    const op = await db.getRepository(OperationEntity).findOneByOrFail({ code: 'OP04' });
    const late = await sewer.post('/api/floor/logs').send({ bundleNumber: 3, batchId: 1, operationId: op.id, idempotencyKey: 'late-after-approval-1' });
    expect(late.status).toBe(201);
    const owed = late.body.log.payMinor;
    expect(owed).toBeGreaterThan(0);

    const preview = (await boss.get('/api/pay/preview?from=2026-12-02&to=2026-12-08')).body.preview;
    expect(preview.carriedLogs).toBe(1);
    expect(preview.people.find((p: { userId: number }) => p.userId === sewerId).amountMinor).toBe(owed);
    const next = await boss.post('/api/pay/periods').send({ fromDay: '2026-12-02', toDay: '2026-12-08' });
    expect(next.status).toBe(201);
    expect(next.body.period.lines).toEqual([expect.objectContaining({ userId: sewerId, amountMinor: owed })]);
    expect((await db.getRepository(WorkLogEntity).findOneByOrFail({ idempotencyKey: 'late-after-approval-1' })).payPeriodId).toBe(next.body.period.id);
    const again = (await boss.get(`/api/pay/periods/${first.id}`)).body.period;
    expect(again.lines.find((l: { userId: number }) => l.userId === sewerId)?.amountMinor ?? 0).toBe(paidBefore);
    await db.destroy();
  });
});
