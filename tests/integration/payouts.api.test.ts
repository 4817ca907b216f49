import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp, type AppControl } from '../../server/app';
import type { ApiModule } from '../../server/modules/module';
import { openDatabase } from '../../server/db/data-source';
import { PayoutEntity } from '../../server/entities';
import { loadEnv } from '../../server/env';
import { createPaymentsFake, type PaymentsFake } from '../../server/modules/pay/payments-fake';
import { seedDemoStudio } from '../../server/seed/demo-studio';
import { freshDatabaseTarget } from '../fixtures/fresh-database';
import { DEMO, DEMO_PASSWORD, signIn, TEST_TODAY } from '../fixtures/test-app';

// The idempotency rules tried here are the payments service's own ("Idempotent requests" in its API
// reference): the same key returns the first answer; the same key with other parameters is refused.
type Agent = Awaited<ReturnType<typeof signIn>>;
type PeriodLine = { userId: number; name: string; amountMinor: number };
const dir = mkdtempSync(join(tmpdir(), 'seamrun-payouts-'));
const env = loadEnv({ NODE_ENV: 'test', LOGIN_RATE_LIMIT: '1000', LOCAL_PAYMENTS_PATH: join(dir, 'payments.sqlite') });
let ds: Awaited<ReturnType<typeof openDatabase>>;
let owner: Agent;
let fake: PaymentsFake;
let period: { id: number; lines: PeriodLine[] };

/** An app on the shared database; a second call is the server after a restart (new module context, new stand-in on the same file). */
async function boot() {
  const control: { current?: AppControl } = {};
  const app = createApp({ ds, env, clientDir: '/nonexistent', control });
  const f = await control.current!.services.pay.fake!();
  const booted = { app, pay: control.current!.modules.pay, fake: f };
  apps.push(booted);
  return booted;
}
const apps: { pay: ApiModule }[] = [];
const stopPay = async () => {
  for (const a of apps) await a.pay.stop?.();
};

const payoutOf = (userId: number) => ds.getRepository(PayoutEntity).findOneByOrFail({ payPeriodId: period.id, userId });
const transfersTo = (f: PaymentsFake, line: PeriodLine) => f.transfers.filter((t) => t.description.endsWith(`: ${line.name}`));
const pay = (line: PeriodLine) => owner.post(`/api/pay/periods/${period.id}/payouts`).send({ userId: line.userId });

beforeAll(async () => {
  ds = await openDatabase(await freshDatabaseTarget());
  await seedDemoStudio(ds, { password: DEMO_PASSWORD, pinPrefix: '40', today: TEST_TODAY });
  const booted = await boot();
  fake = booted.fake;
  owner = await signIn(booted.app, DEMO.owner);
  period = (await owner.post('/api/pay/periods').send({ fromDay: '2026-11-23', toDay: '2026-11-30' })).body.period;
  expect(period.lines.length).toBeGreaterThanOrEqual(4);
});

afterAll(async () => {
  await stopPay();
  await ds.destroy();
  rmSync(dir, { recursive: true, force: true });
});

describe('payouts under lost and unclear answers', () => {
  it('pays once, with the same key and the account frozen at the first attempt, when a retry follows a lost answer and the account changed meanwhile', async () => {
    const line = period.lines[0];
    expect((await owner.patch(`/api/users/${line.userId}`).send({ payoutAccount: 'acct_1FirstAccount' })).status).toBe(200);
    // The service takes the transfer, but neither the SDK's own retry nor the first request hears back.
    fake.loseAnswers(2);
    const first = (await pay(line)).body.payout;
    expect(first.status).toBe('to_check');
    expect(first.error).toContain('It may have paid');
    const { idempotencyKey } = await payoutOf(line.userId);
    expect(transfersTo(fake, line)).toHaveLength(1);

    expect((await owner.patch(`/api/users/${line.userId}`).send({ payoutAccount: 'acct_1SecondAccount' })).status).toBe(200);
    const second = (await pay(line)).body.payout;
    const third = (await pay(line)).body.payout;
    expect(second.status).toBe('paid');
    expect(third).toMatchObject({ status: 'paid', providerRef: second.providerRef });
    const made = transfersTo(fake, line);
    expect(made).toHaveLength(1);
    expect(made[0]).toMatchObject({ destination: 'acct_1FirstAccount', idempotencyKey, id: second.providerRef });
    expect(await payoutOf(line.userId)).toMatchObject({ idempotencyKey, destination: 'acct_1FirstAccount', status: 'paid' });
  });

  it('leaves the payout to check, never failed, when the service says the key was used with other parameters', async () => {
    const line = period.lines[1];
    const key = 'seamrun-payout-reused-elsewhere';
    // The key went out once with other parameters (another amount and account), and that answer was lost.
    await ds.getRepository(PayoutEntity).save({
      studioId: 1, payPeriodId: period.id, userId: line.userId, amountMinor: line.amountMinor, currency: 'KES', status: 'to_check',
      idempotencyKey: key, destination: `acct_seamrun_1_${line.userId}`, description: `Piece-rate pay: ${line.name}`, attempts: 1,
    });
    const sent = await fetch(`http://127.0.0.1:${fake.port}/v1/transfers`, {
      method: 'POST',
      headers: { 'content-type': 'application/x-www-form-urlencoded', 'idempotency-key': key },
      body: new URLSearchParams({ amount: '1', currency: 'kes', destination: 'acct_someone_else', description: 'other' }).toString(),
    });
    expect(sent.status).toBe(200);
    const before = fake.transfers.length;
    for (let i = 0; i < 2; i++) {
      const res = (await pay(line)).body.payout;
      expect(res.status).toBe('to_check');
      expect(res.error).toMatch(/same parameters/);
    }
    expect(fake.transfers).toHaveLength(before);
    expect((await payoutOf(line.userId)).idempotencyKey).toBe(key);
  });

  it('settles payouts a crash left pending by asking the payments service at start-up', async () => {
    const [, , taken, neverSent] = period.lines;
    fake.loseAnswers(2);
    await pay(taken);
    // The process died between the call and the write: the row still says pending.
    await ds.getRepository(PayoutEntity).update({ payPeriodId: period.id, userId: taken.userId }, { status: 'pending', error: '', attempts: 0 });
    // And one row was written just before the call that never went out.
    await ds.getRepository(PayoutEntity).save({
      studioId: 1, payPeriodId: period.id, userId: neverSent.userId, amountMinor: neverSent.amountMinor, currency: 'KES', status: 'pending',
      idempotencyKey: 'seamrun-payout-never-sent', destination: `acct_seamrun_1_${neverSent.userId}`, description: `Piece-rate pay: ${neverSent.name}`, attempts: 0,
    });
    const made = transfersTo(fake, taken);
    expect(made).toHaveLength(1);

    await stopPay();
    const restarted = await boot();
    await restarted.pay.start!();
    expect(await payoutOf(taken.userId)).toMatchObject({ status: 'paid', providerRef: made[0].id });
    const left = await payoutOf(neverSent.userId);
    expect(left.status).toBe('to_check');
    expect(left.error).toContain('holds no transfer');
    expect(transfersTo(restarted.fake, taken)).toHaveLength(1);
    expect(transfersTo(restarted.fake, neverSent)).toHaveLength(0);
    fake = restarted.fake;
  });
});

describe('the local payments stand-in', () => {
  it('keeps its idempotency keys across a restart, in its own SQLite file', async () => {
    const path = join(dir, 'stand-in.sqlite');
    const send = (f: PaymentsFake, amount: string) =>
      fetch(`http://127.0.0.1:${f.port}/v1/transfers`, {
        method: 'POST',
        headers: { 'content-type': 'application/x-www-form-urlencoded', 'idempotency-key': 'key-across-restart' },
        body: new URLSearchParams({ amount, currency: 'kes', destination: 'acct_1Restart' }).toString(),
      });
    const a = createPaymentsFake({ path });
    await a.start(0);
    const first = await (await send(a, '500')).json();
    await a.stop();
    const b = createPaymentsFake({ path });
    await b.start(0);
    const again = await send(b, '500');
    expect(again.headers.get('idempotent-replayed')).toBe('true');
    expect((await again.json()).id).toBe(first.id);
    const other = await send(b, '700');
    expect(other.status).toBe(400);
    expect((await other.json()).error.type).toBe('idempotency_error');
    expect(b.transfers).toHaveLength(1);
    await b.stop();
  });
});
