import { beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';
import { zipBombXlsx } from '../fixtures/zip-bomb';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent;
beforeAll(async () => {
  const { app } = await buildTestApp();
  owner = await signIn(app, DEMO.owner);
}, 60_000);

const XLSX = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';
const upload = (url: string, body: Buffer, name: string) =>
  owner.post(url).set('X-Seamrun-Csrf', '1').attach('file', body, { filename: name, contentType: name.endsWith('.xlsx') ? XLSX : 'text/csv' });

describe('uploaded tables past the limits', () => {
  // About 100 KB on disk, 100 MiB unpacked: the shape of the 256 KB workbook that stalled every studio.
  const bomb = zipBombXlsx(100);
  const liar = zipBombXlsx(100, true);

  it.each([
    ['a packing list', '/api/fabrics/1/rolls/import'],
    ['a size chart', '/api/styles/1/grading/chart/import'],
    ['an operations sheet', '/api/styles/1/operations/import'],
  ])('refuses %s workbook that unpacks to 100 MiB with 413 before reading it', async (_what, url) => {
    for (const file of [bomb, liar]) {
      const res = await upload(url, file, 'bomb.xlsx');
      expect(res.status).toBe(413);
      expect(res.body.error.code).toBe('too_large');
    }
  });

  it('answers a 400,000-row packing list with a 400 naming the row cap, not a database error', async () => {
    const csv = ['Roll,Shade lot,Length m', ...Array.from({ length: 400_000 }, (_, i) => `${i},A,1`)].join('\n');
    const res = await upload('/api/fabrics/1/rolls/import', Buffer.from(csv), 'big.csv');
    expect(res.status).toBe(400);
    expect(res.body.error.fields.file).toMatch(/10,000 rows/);
    expect((await owner.get('/api/fabrics/1/rolls')).body.rolls.some((r: { label: string }) => r.label === '1')).toBe(false);
  });

  it('saves a packing list of 3,000 rolls in one go (bound-variable limits are respected)', async () => {
    const csv = ['Roll,Shade lot,Length m', ...Array.from({ length: 3000 }, (_, i) => `BULK-${i},A,1`)].join('\n');
    const res = await upload('/api/fabrics/1/rolls/import', Buffer.from(csv), 'bulk.csv');
    expect(res.status).toBe(201);
    expect(res.body.rolls).toHaveLength(3000);
  });

  it('lists the first 20 problems of a packing list once each and counts the rest', async () => {
    const csv = ['Roll,Shade lot,Length m', ...Array.from({ length: 300 }, (_, i) => `BAD-${i},A,abc`)].join('\n');
    const res = await upload('/api/fabrics/1/rolls/import', Buffer.from(csv), 'bad.csv');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/^300 problems .*first 20/);
    expect(res.body.rows).toHaveLength(20);
    expect(Object.keys(res.body.error.fields)).toHaveLength(20);
    expect(res.body.rows[0]).toEqual({ row: 2, column: 'Length m', message: 'Length "abc" is not a positive number' });
  });

  it('refuses a size-chart CSV of more than 10,000 rows with a 400 on the file', async () => {
    const csv = ['measurement,unit,S,M', ...Array.from({ length: 10_001 }, () => 'bust,mm,800,840')].join('\n');
    const res = await upload('/api/styles/1/grading/chart/import', Buffer.from(csv), 'chart.csv');
    expect(res.status).toBe(400);
    expect(res.body.error.fields.file).toMatch(/10,000 rows/);
  });

  it('lists at most 20 cells of a size chart with hundreds of bad cells', async () => {
    const csv = ['measurement,unit,S,M', ...Array.from({ length: 200 }, () => 'nonsense,mm,x,y')].join('\n');
    const res = await upload('/api/styles/1/grading/chart/import', Buffer.from(csv), 'chart.csv');
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toHaveLength(20);
    expect(res.body.error.message).toMatch(/600 problems, the first 20 listed/);
  });
});
