import { existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
const dir = mkdtempSync(join(tmpdir(), 'seamrun-uploads-'));
let app: Awaited<ReturnType<typeof buildTestApp>>['app'];
let owner: Agent;
beforeAll(async () => {
  ({ app } = await buildTestApp({ env: { DATABASE_PATH: join(dir, 'seamrun.sqlite'), UPLOAD_MAX_BYTES: '4096' } }));
  owner = await signIn(app, DEMO.owner);
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

// The smallest valid PNG: signature, IHDR 1×1, IDAT, IEND (PNG specification, ISO/IEC 15948).
const PNG = Buffer.from('89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000d49444154789c6360000002000154a24f5d0000000049454e44ae426082', 'hex');
const upload = (kind: string, name: string, bytes: Buffer, agent = owner) =>
  agent.post('/api/uploads').set('X-Seamrun-Csrf', '1').field('kind', kind).field('styleId', '1').attach('file', bytes, name);

describe('uploads', () => {
  it('stores a sketch under data/uploads with a server-made name, never the client\'s', async () => {
    const res = await upload('sketch', '../../etc/passwd.png', PNG);
    expect(res.status).toBe(201);
    expect(res.body.upload).toMatchObject({ kind: 'sketch', mimeType: 'image/png', originalName: 'passwd.png', styleId: 1 });
    const files = readdirSync(join(dir, 'uploads'));
    expect(files).toHaveLength(1);
    expect(files[0]).toMatch(/^[0-9a-f-]{36}\.png$/);
    const back = await owner.get(res.body.upload.url);
    expect(back.status).toBe(200);
    expect(back.headers['x-content-type-options']).toBe('nosniff');
  });

  it('judges the type from the content: text named .png is refused, a CSV packing list is accepted', async () => {
    const fake = await upload('photo', 'swatch.png', Buffer.from('hello, this is not an image'));
    expect(fake.status).toBe(400);
    expect(fake.body.error.fields.file).toMatch(/Accepted for photo/);
    const csv = await upload('packing-list', 'packing.xlsx', Buffer.from('roll,length_m,shade\nMV-1,50.0,A\nMV-2,48.5,A\n'));
    expect(csv.status).toBe(201);
    expect(csv.body.upload.mimeType).toBe('text/csv');
    expect((await upload('packing-list', 'list.csv', PNG)).status).toBe(400);
  });

  it('refuses an SVG that carries a script, an event handler or an outside link, and keeps a plain one', async () => {
    const bad = [
      '<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>',
      '<svg xmlns="http://www.w3.org/2000/svg"><rect width="1" height="1" onload="x()"/></svg>',
      '<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink"><image xlink:href="https://tracker.example/p.png"/></svg>',
    ];
    for (const svg of bad) {
      const res = await upload('sketch', 'front.svg', Buffer.from(svg));
      expect(res.status, svg).toBe(400);
      expect(res.body.error.fields.file).toMatch(/^SVG refused/);
    }
    const ok = await upload('sketch', 'front.svg', Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 10 10"><path d="M0 0L10 10"/></svg>'));
    expect(ok.status).toBe(201);
    expect(ok.body.upload.mimeType).toBe('image/svg+xml');
  });

  it('answers 413 with a clear message past UPLOAD_MAX_BYTES', async () => {
    const res = await upload('packing-list', 'big.csv', Buffer.from(`a,b\n${'1,2\n'.repeat(2000)}`));
    expect(res.status).toBe(413);
    expect(res.body.error).toMatchObject({ code: 'too_large' });
    expect(res.body.error.message).toBe('The file is larger than the 4 KB limit; make it smaller and try again');
  });

  it('is owner-only and checks its fields', async () => {
    const cutter = await signIn(app, DEMO.cutter);
    expect((await upload('packing-list', 'p.csv', Buffer.from('a,b\n1,2\n'), cutter)).status).toBe(403);
    const noKind = await owner.post('/api/uploads').set('X-Seamrun-Csrf', '1').attach('file', PNG, 'a.png');
    expect(noKind.status).toBe(400);
    expect(noKind.body.error.fields.kind).toBeTruthy();
    const list = (await owner.get('/api/uploads?kind=sketch')).body.uploads;
    expect(list.length).toBe(2);
    expect((await owner.delete(`/api/uploads/${list[0].id}`).set('X-Seamrun-Csrf', '1')).status).toBe(204);
    expect(existsSync(join(dir, 'uploads'))).toBe(true);
  });
});
