import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp, type AppControl } from '../../server/app';
import { openDatabase } from '../../server/db/data-source';
import { loadEnv } from '../../server/env';
import { createGradingSetRepository } from '../../server/modules/grading/grading-set.repository';
import type { MarkerQueueOptions } from '../../server/modules/markers/marker-queue';
import { seedDemoStudio } from '../../server/seed/demo-studio';
import { freshDatabaseTarget } from '../fixtures/fresh-database';
import { DEMO, DEMO_PASSWORD, signIn, TEST_TODAY } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;

// Two studios share the one marker queue. Studio A (the demo studio) fills its share of places; studio B
// then starts one marker. The queue is given one core, so it runs one marker at a time and the order markers
// finish in is the order they ran in (recorded through the queue's onDone hook).
let ctx: AppControl;
let ownerA: Agent, ownerB: Agent;
let fabricB: number, styleB: number;
const finished: number[] = [];
const MAX_WAITING = 3;

beforeAll(async () => {
  const ds = await openDatabase(await freshDatabaseTarget());
  await seedDemoStudio(ds, { password: DEMO_PASSWORD, pinPrefix: '40', today: TEST_TODAY });
  const env = loadEnv({ NODE_ENV: 'test', LOGIN_RATE_LIMIT: '1000', NESTING_SECONDS: '1' });
  const control: { current?: AppControl } = {};
  const options: MarkerQueueOptions = { maxQueuedPerStudio: MAX_WAITING, cores: 1, onDone: async (_studio, id) => void finished.push(id) };
  const app = createApp({ ds, env, clientDir: '/nonexistent', control, markerQueue: options });
  ctx = control.current!;
  ownerA = await signIn(app, DEMO.owner);
  ownerB = request.agent(app);
  const created = await ownerB.post('/api/auth/studios').send({
    studioName: 'Second Bench Studio', currency: 'EUR', unitSystem: 'metric',
    ownerName: 'Second Owner', email: 'owner@second.example', password: 'another-long-password',
  });
  expect(created.status).toBe(201);
  // Studio B gets the same style and grading as the demo studio, through its own style and fabric.
  const style = await ownerB.post('/api/styles').send({ code: 'B-1', name: 'Shirt dress', sizeRun: ['XS', 'S', 'M', 'L', 'XL'], baseSize: 'M' });
  expect(style.status).toBe(201);
  styleB = style.body.style.id;
  const fabric = await ownerB.post('/api/fabrics').send({ name: 'Poplin', widthMm: 1500 });
  expect(fabric.status).toBe(201);
  fabricB = fabric.body.fabric.id;
  const sets = createGradingSetRepository(ds);
  const demo = (await sets.byStyle(1, 1))!;
  await sets.save(created.body.user.studioId, styleB, { sizeChart: demo.sizeChart, pieces: demo.pieces, gradeRules: demo.gradeRules });
}, 120_000);

describe('marker queue shared between studios', () => {
  it("runs another studio's first marker at its turn when one studio has filled its share of the queue", async () => {
    const ratiosA = [{ XS: 1 }, { S: 1 }, { M: 1 }, { L: 1 }];
    const idsA: number[] = [];
    for (const ratio of ratiosA) {
      const res = await ownerA.post('/api/markers').send({ styleId: 1, fabricId: 1, ratio, seconds: 1 });
      expect(res.status).toBe(202);
      idsA.push(res.body.marker.id);
    }
    // A's first marker runs, its other three wait: A's share is full.
    const full = await ownerA.post('/api/markers').send({ styleId: 1, fabricId: 1, ratio: { XL: 1 }, seconds: 1 });
    expect(full.status).toBe(429);
    expect(full.body.error.message).toMatch(/already has 3 markers waiting to run; wait for one to finish or cancel one/);
    expect((await ownerA.get('/api/markers')).body.markers).toHaveLength(idsA.length);

    const b = await ownerB.post('/api/markers').send({ styleId: styleB, fabricId: fabricB, ratio: { XS: 1 }, seconds: 1 });
    expect(b.status).toBe(202);
    await ctx.services.markers.queue().idle();

    // Round robin: A's running marker, then A's turn, then B's; first come, first served would put B last.
    expect(finished).toEqual([idsA[0], idsA[1], b.body.marker.id, idsA[2], idsA[3]]);
  }, 180_000);

  it('frees a place in the queue once a waiting marker has run', async () => {
    const again = await ownerA.post('/api/markers').send({ styleId: 1, fabricId: 1, ratio: { XL: 1 }, seconds: 1 });
    expect(again.status).toBe(202);
    await ctx.services.markers.queue().idle();
  }, 120_000);
});
