import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { binary, buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
const dir = mkdtempSync(join(tmpdir(), 'seamrun-downloads-'));
let owner: Agent;
beforeAll(async () => {
  const { app } = await buildTestApp({ env: { DATABASE_PATH: join(dir, 'seamrun.sqlite'), UPLOAD_MAX_BYTES: '4096' } });
  owner = await signIn(app, DEMO.owner);
}, 60_000);
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const PNG = Buffer.from('89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000d49444154789c6360000002000154a24f5d0000000049454e44ae426082', 'hex');

describe('the one download helper', () => {
  it.each([
    ['a cut plan marker list', '/api/batches/1/marker-list.xlsx'],
    ['a costing workbook', '/api/batches/1/costing.xlsx'],
    ['a size chart export', '/api/styles/1/grading/chart/export?format=csv'],
    ['a piece drawing', '/api/styles/1/grading/pieces/front/svg'],
  ])('keeps %s out of shared and disk caches (RFC 9111 private, no-store) when it is downloaded', async (_what, url) => {
    const res = await owner.get(url).buffer(true).parse(binary);
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('private, no-store');
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename=/);
  });

  it('serves an uploaded file in a sandbox, uncached, when it is shown inline', async () => {
    const up = await owner.post('/api/uploads').set('X-Seamrun-Csrf', '1').field('kind', 'sketch').attach('file', PNG, 'sketch.png');
    expect(up.status).toBe(201);
    const back = await owner.get(up.body.upload.url);
    expect(back.headers['cache-control']).toBe('private, no-store');
    expect(back.headers['content-security-policy']).toContain('sandbox');
    expect(back.headers['content-disposition']).toMatch(/^inline; /);
  });
});

describe('the one upload middleware', () => {
  it('answers a packing list sent under another field name with a 400 on file, not a server error', async () => {
    const res = await owner.post('/api/fabrics/1/rolls/import').set('X-Seamrun-Csrf', '1').attach('list', Buffer.from('Roll\n'), 'p.csv');
    expect(res.status).toBe(400);
    expect(res.body.error.fields.file).toBe('Attach one file, in the field named file');
  });

  it('refuses a packing list past UPLOAD_MAX_BYTES with 413 naming the limit', async () => {
    const res = await owner.post('/api/fabrics/1/rolls/import').set('X-Seamrun-Csrf', '1').attach('file', Buffer.alloc(5000, 'a'), 'p.csv');
    expect(res.status).toBe(413);
    expect(res.body.error).toMatchObject({ code: 'too_large', message: 'The file is larger than the 4 KB limit; make it smaller and try again' });
  });
});
