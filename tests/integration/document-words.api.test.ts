import { beforeAll, describe, expect, it } from 'vitest';
import { binary, buildTestApp, DEMO, signIn } from '../fixtures/test-app';
import { findingsIn, pdfWords, workbookWords } from '../fixtures/locale-findings';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent;
/** Each document a studio prints or opens, by name: the path that downloads it. Filled once the records exist. */
const documents: Record<string, string> = {};
/** The style's piece names: records the studio named (drafted in English by the demo), not words of the documents. */
const pieceNames: string[] = [];

async function untilDone(id: number) {
  for (let i = 0; i < 480; i++) {
    const m = (await owner.get(`/api/markers/${id}?drawing=false`)).body.marker;
    if (m.status !== 'queued' && m.status !== 'running') return m;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error('the marker did not finish');
}

beforeAll(async () => {
  const { app } = await buildTestApp({ env: { NESTING_SECONDS: '1' } });
  owner = await signIn(app, DEMO.owner);
  expect((await owner.patch('/api/studio').send({ language: 'fr', unitSystem: 'imperial', currency: 'CAD', timeZone: 'America/Toronto' })).status).toBe(200);
  const marker = await owner.post('/api/markers').send({ styleId: 1, batchId: 1, fabricId: 1, ratio: { S: 1, M: 1 }, seconds: 1 });
  const { items } = (await owner.get('/api/purchasing/items')).body;
  const fabric = items.find((i: { kind: string }) => i.kind === 'fabric');
  const trim = items.find((i: { kind: string }) => i.kind === 'trim');
  const mill = (await owner.get('/api/purchasing/suppliers')).body.suppliers[0];
  const order = (await owner.post('/api/purchasing/orders').send({
    supplierId: mill.id, batchId: 1, lines: [{ kind: 'fabric', refId: fabric.refId, quantity: 29_950 }, { kind: 'trim', refId: trim.refId, quantity: 40 }],
  })).body.order;
  const period = (await owner.post('/api/pay/periods').send({ fromDay: '2026-11-23', toDay: '2026-12-04' })).body.period;
  const style = (await owner.get('/api/styles/1')).body.style;
  const material = Object.keys(style.materialFabrics ?? {})[0] ?? 'self';
  const lay = (await owner.get('/api/lays')).body.lays[0];
  pieceNames.push(...((await owner.get('/api/styles/1/grading')).body.grading.pieces as { name: string }[]).map((p) => p.name));
  Object.assign(documents, {
    'cut ticket': `/api/lays/${lay.id}/cut-ticket.pdf`,
    'material cut ticket': `/api/batches/1/material-cut-ticket.pdf?material=${encodeURIComponent(material)}`,
    'bundle tickets': '/api/batches/1/bundle-tickets.pdf',
    'bundle register': '/api/batches/1/bundle-register.xlsx',
    'marker list (PDF)': '/api/batches/1/marker-list.pdf',
    'marker list (XLSX)': '/api/batches/1/marker-list.xlsx',
    'marker plot': `/api/markers/${(await untilDone(marker.body.marker.id)).id}/plot.pdf`,
    'purchase order': `/api/purchasing/orders/${order?.id}/xlsx`,
    'pay sheet': `/api/pay/periods/${period?.id}/sheet.xlsx`,
    'costing sheet': '/api/batches/1/costing.xlsx',
    'calibration sheet': '/api/styles/1/pattern/calibration-sheet?kind=sheet&paper=Letter',
    'border frame': '/api/styles/1/pattern/calibration-sheet?kind=border&paper=Letter',
  });
}, 180_000);

describe('every document of a studio in French and inches', () => {
  it('holds no English word, no metre, no decimal yard and no UTC time', async () => {
    const found: string[] = [];
    for (const [name, path] of Object.entries(documents)) {
      const res = await owner.get(path).buffer(true).parse(binary);
      if (res.status !== 200) {
        found.push(`${name}: ${res.status} ${String(res.body).slice(0, 200)}`);
        continue;
      }
      const text = path.includes('.pdf') || path.includes('calibration') ? pdfWords(res.body as Buffer) : await workbookWords(res.body as Buffer);
      found.push(...findingsIn(name, text, pieceNames));
    }
    expect(found).toEqual([]);
  });
});
