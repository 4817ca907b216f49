import { dirname, join } from 'node:path';
import { FLOOR_PROGRESS_SERVICE } from '../floor/floor.module';
import type { FloorProgressService } from '../floor/floor-progress.service';
import type { ApiModule, ModuleContext } from '../module';
import { createPaymentsClient, type PaymentsClient } from './payments-client';
import { createPaymentsFake, type PaymentsFake } from './payments-fake';
import { createPayRepository } from './pay.repository';
import { createCalendarRepository } from '../line/studio-calendar.repository';
import { payRoutes } from './pay.routes';
import { createPayService, type PayService } from './pay.service';

/** ctx.services key of the local payments fake (tests tell it to refuse an account). */
export const PAYMENTS_FAKE_SERVICE = 'pay.fake';

const fakes = new WeakMap<ModuleContext, PaymentsFake>();
const services = new WeakMap<ModuleContext, PayService>();
const started = new Set<PaymentsFake>();

/** Where the stand-in keeps its keys: its own SQLite file, so a restart remembers them as the live service does. */
function fakePath(env: ModuleContext['env']) {
  if (env.LOCAL_PAYMENTS_PATH) return env.LOCAL_PAYMENTS_PATH;
  if (env.NODE_ENV === 'test' || !env.DATABASE_PATH || env.DATABASE_PATH === ':memory:') return ':memory:';
  return join(dirname(env.DATABASE_PATH), 'local-payments.sqlite');
}

/** The fake of this app; started by start() or, in tests built with createApp, on first use (port 0). */
async function ensureFake(ctx: ModuleContext) {
  let fake = fakes.get(ctx);
  if (!fake) fakes.set(ctx, (fake = createPaymentsFake({ path: fakePath(ctx.env) })));
  if (!fake.running) {
    await fake.start(ctx.env.NODE_ENV === 'test' ? 0 : (ctx.env.LOCAL_PAYMENTS_PORT ?? 0));
    started.add(fake);
  }
  return fake;
}

/** The pay area: approve a period, pay each person through the payments SDK, export the pay sheet. */
export const payModule: ApiModule = {
  name: 'pay',
  register(api, ctx) {
    const secretKey = ctx.env.PAYMENTS_SECRET_KEY ?? '';
    let client: PaymentsClient | null = null;
    const payments = async () => (client ??= createPaymentsClient({ secretKey, fakePort: async () => (await ensureFake(ctx)).port }));
    if (!secretKey) ctx.services.set(PAYMENTS_FAKE_SERVICE, () => ensureFake(ctx));
    const repo = createPayRepository(ctx.ds);
    const calendars = createCalendarRepository(ctx.ds);
    const pay = createPayService({
      repo,
      calendar: async (studioId) => (await calendars.get(studioId)).working,
      timeZone: async (studioId) => (await calendars.get(studioId)).calendar.timeZone,
      audit: ctx.audit,
      floor: () => ctx.services.get(FLOOR_PROGRESS_SERVICE) as FloorProgressService,
      payments,
      live: Boolean(secretKey),
    });
    services.set(ctx, pay);
    const mode = () =>
      secretKey
        ? { testMode: false, message: 'Live payments: money moves to each person’s payments account, set on the People page.' }
        : { testMode: true, message: 'Test payments: no money moves.' };
    api.use('/pay', payRoutes(pay, mode, ctx.jobs));
  },
  /** Starts the stand-in (test mode), then settles payouts a crash left pending by asking the payments service. */
  async start(ctx) {
    if (!ctx.env.PAYMENTS_SECRET_KEY) await ensureFake(ctx);
    const { checked, paid } = (await services.get(ctx)?.reconcile()) ?? { checked: 0, paid: 0 };
    if (checked) console.log(`Payouts checked with the payments service at start-up: ${checked}, found paid: ${paid}`);
  },
  async stop() {
    for (const f of started) await f.stop();
    started.clear();
  },
};
