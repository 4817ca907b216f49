import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { bundleQrText } from '../../shared/schemas/cutting';
import type { SearchHitDto } from '../../shared/schemas/search';
import { BundleEntity } from '../../server/entities';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent;
let cutter: Agent;
let machinist: Agent;
let bundle: BundleEntity;
let app: Awaited<ReturnType<typeof buildTestApp>>['app'];

beforeAll(async () => {
  const built = await buildTestApp();
  app = built.app;
  const ds = built.ds;
  owner = await signIn(app, DEMO.owner);
  cutter = await signIn(app, DEMO.cutter);
  machinist = await signIn(app, DEMO.machinist);
  bundle = (await ds.getRepository(BundleEntity).find({ order: { id: 'ASC' }, take: 1 }))[0];
});

const kinds = (hits: SearchHitDto[]) => hits.map((h) => `${h.kind}:${h.title}`);

describe('the one search box', () => {
  it('finds a style by its code and by part of its name, whatever the capitals', async () => {
    const byCode = await owner.get('/api/search').query({ q: 'sr-101' });
    expect(byCode.status).toBe(200);
    expect(kinds(byCode.body.hits)).toContain('style:SR-101');
    const byName = await cutter.get('/api/search').query({ q: 'SABLE' });
    expect(kinds(byName.body.hits)).toContain('style:SR-101');
  });

  it('finds a roll by its label and a batch by its code', async () => {
    const roll = await cutter.get('/api/search').query({ q: 'SCP-0102' });
    expect(kinds(roll.body.hits)).toContain('roll:SCP-0102');
    const batch = await owner.get('/api/search').query({ q: 'B-0001' });
    expect(kinds(batch.body.hits)).toContain('batch:B-0001');
  });

  it('finds a bundle by the number on its ticket and by the text of its QR code, with the lay to open', async () => {
    expect(bundle, 'the demo has cut bundles').toBeDefined();
    const byNumber = await cutter.get('/api/search').query({ q: String(bundle.number) });
    const hit = (byNumber.body.hits as SearchHitDto[]).find((h) => h.kind === 'bundle' && h.id === bundle.id);
    expect(hit?.layId).toBe(bundle.layId);
    const byQr = await owner.get('/api/search').query({ q: bundleQrText(bundle.batchId, bundle.number) });
    expect((byQr.body.hits as SearchHitDto[]).filter((h) => h.kind === 'bundle').map((h) => h.id)).toEqual([bundle.id]);
  });

  it('finds people only for the owner, never for the cutter', async () => {
    expect(kinds((await owner.get('/api/search').query({ q: 'achieng' })).body.hits)).toContain('person:Achieng Mwende');
    expect(kinds((await cutter.get('/api/search').query({ q: 'achieng' })).body.hits)).toEqual([]);
  });

  it('refuses machinists with 403 and anonymous callers with 401', async () => {
    const res = await machinist.get('/api/search').query({ q: 'SR-101' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
    expect((await request(app).get('/api/search').query({ q: 'SR-101' })).status).toBe(401);
  });

  it('answers 400 naming the field when nothing is typed, and takes a % as itself', async () => {
    const res = await owner.get('/api/search').query({ q: '  ' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/^q: /);
    expect((await owner.get('/api/search').query({ q: '%' })).body.hits).toEqual([]);
  });
});
