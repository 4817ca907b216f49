import { dirname, join } from 'node:path';
import type { FloorProgressService } from '../floor/floor-progress.service';
import type { ApiModule, ModuleContext } from '../module';
import { createPaymentsClient, type PaymentsClient } from './payments-client';
import { createPaymentsFake, type PaymentsFake } from './payments-fake';
import { createPayRepository } from './pay.repository';
import { payRoutes } from './pay.routes';
import { createPayService } from './pay.service';

/** Where the stand-in keeps its keys: its own SQLite file, so a restart remembers them as the live service does. */
function fakePath(env: ModuleContext['env']) {
  if (env.LOCAL_PAYMENTS_PATH) return env.LOCAL_PAYMENTS_PATH;
  if (env.NODE_ENV === 'test' || !env.DATABASE_PATH || env.DATABASE_PATH === ':memory:') return ':memory:';
  return join(dirname(env.DATABASE_PATH), 'local-payments.sqlite');
}

/** The pay area: approve a period, pay each person through the payments SDK, export the pay sheet. */
export function createPayModule(ctx: ModuleContext, deps: { floor: FloorProgressService }) {
  const secretKey = ctx.env.PAYMENTS_SECRET_KEY ?? '';
  let fake: PaymentsFake | undefined;
  let started = false;
  /** The local stand-in (test mode); started by start() or, in tests built with createApp, on first use (port 0). */
  const ensureFake = async () => {
    fake ??= createPaymentsFake({ path: fakePath(ctx.env) });
    if (!fake.running) {
      await fake.start(ctx.env.NODE_ENV === 'test' ? 0 : (ctx.env.LOCAL_PAYMENTS_PORT ?? 0));
      started = true;
    }
    return fake;
  };
  let client: PaymentsClient | null = null;
  const payments = async () => (client ??= createPaymentsClient({ secretKey, fakePort: async () => (await ensureFake()).port }));
  const pay = createPayService({
    repo: createPayRepository(ctx.ds),
    audit: ctx.audit,
    floor: () => deps.floor,
    payments,
    live: Boolean(secretKey),
  });
  const mode = () =>
    secretKey
      ? { testMode: false, message: 'Live payments: money moves to each person’s payments account, set on the People page.' }
      : { testMode: true, message: 'Test payments: no money moves.' };
  return {
    name: 'pay',
    /** `fake` is the local payments stand-in (null with a live key); tests tell it to refuse an account. */
    services: { pay, fake: secretKey ? null : ensureFake },
    mount(api) {
      api.use('/pay', payRoutes(pay, mode, ctx.jobs));
    },
    /** Starts the stand-in (test mode), then settles payouts a crash left pending by asking the payments service. */
    async start() {
      if (!secretKey) await ensureFake();
      const { checked, paid } = await pay.reconcile();
      if (checked) console.log(`Payouts checked with the payments service at start-up: ${checked}, found paid: ${paid}`);
    },
    async stop() {
      if (started && fake) await fake.stop();
      started = false;
    },
  } satisfies ApiModule & { services: unknown };
}
