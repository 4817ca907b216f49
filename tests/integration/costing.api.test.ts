import ExcelJS from 'exceljs';
import { beforeAll, describe, expect, it } from 'vitest';
import { cachedOf, evaluateCell, findRow, formulaOf } from '../../exports/xlsx/workbook-reader.testing';
import { buildTestApp, DEMO, signIn, binary } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let app: Awaited<ReturnType<typeof buildTestApp>>['app'];
let owner: Agent;
beforeAll(async () => {
  ({ app } = await buildTestApp());
  owner = await signIn(app, DEMO.owner);
});

const costing = async (agent: Agent = owner) => (await agent.get('/api/batches/1/costing')).body.costing;

describe('costing sheet: who may see it', () => {
  it.each([DEMO.cutter, DEMO.machinist, DEMO.finisher])('refuses %s with 403 on the sheet, workbook, trims and settings', async (email) => {
    const agent = await signIn(app, email);
    for (const url of ['/api/batches/1/costing', '/api/batches/1/costing.xlsx', '/api/costing/styles/1/trims', '/api/costing/styles/1/settings']) {
      const res = await agent.get(url);
      expect(res.status, url).toBe(403);
      expect(res.body.error.code).toBe('forbidden');
    }
    expect((await agent.put('/api/costing/trims/1').send({ unitPriceMinor: 1 })).status).toBe(403);
  });
});

describe('costing sheet of the demo batch', () => {
  it('adds up in integer minor units: lines → unit cost per size → batch, then margin and keystone', async () => {
    const c = await costing();
    expect(c.currency).toBe('KES');
    expect(c.batch.total).toBe(40);
    for (const s of c.sizes) {
      const sum = c.lines.reduce((a: number, l: { costMinor: Record<string, number> }) => a + l.costMinor[s.size], 0);
      expect(s.unitCostMinor).toBe(sum);
      expect(Number.isInteger(s.unitCostMinor)).toBe(true);
      expect(s.batchCostMinor).toBe(s.unitCostMinor * s.quantity);
    }
    const batchCost = c.sizes.reduce((a: number, s: { batchCostMinor: number }) => a + s.batchCostMinor, 0);
    expect(c.totals.batchCostMinor).toBe(batchCost);
    expect(c.totals.averageUnitCostMinor).toBe(Math.round(batchCost / 40));
    // Price from a margin on the selling price: price = cost / (1 − margin) (reference §5.1, K4 [quoted]).
    expect(c.totals.wholesaleMinor).toBe(Math.round(c.totals.averageUnitCostMinor / (1 - 0.3)));
    // Keystone: retail = 2 × wholesale (Monash Business School marketing dictionary, "Keystone markup").
    expect(c.totals.retailMinor).toBe(2 * c.totals.wholesaleMinor);
    // Fabric per garment grows with the size (the cut plan's markers, or the graded estimate).
    const fabric = c.sizes.map((s: { fabricMmPerGarment: number }) => s.fabricMmPerGarment);
    expect(fabric[4]).toBeGreaterThan(fabric[0]);
    console.info('demo costing', JSON.stringify({ basis: c.fabric?.basis, sizes: c.sizes.map((s: { size: string; unitCostMinor: number; wholesaleMinor: number; retailMinor: number }) => [s.size, s.unitCostMinor, s.wholesaleMinor, s.retailMinor]), totals: c.totals }));
  });

  it('follows a trim price change: ten buttons at +KES 2.50 add 25.00 + 15 % overheads to every size', async () => {
    const before = await costing();
    const buttons = before.lines.find((l: { description: string }) => l.description.startsWith('Shirt buttons'));
    const res = await owner.put(`/api/costing/trims/${buttons.refId}`).send({ unitPriceMinor: buttons.priceMinor + 250 });
    expect(res.status).toBe(200);
    expect(res.body.trim.supplierName).toBe('Baobab Notions Supply');
    const after = await costing();
    after.sizes.forEach((s: { unitCostMinor: number }, i: number) => expect(s.unitCostMinor - before.sizes[i].unitCostMinor).toBe(2500 + 375));
    expect(after.totals.batchCostMinor - before.totals.batchCostMinor).toBe(2875 * 40);
    await owner.put(`/api/costing/trims/${buttons.refId}`).send({ unitPriceMinor: buttons.priceMinor });
  });

  it('reports each bad field with its path and changes nothing', async () => {
    const bad = await owner.put('/api/costing/trims/1').send({ unitPriceMinor: 12.5, quantityPerGarment: -1 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toMatchObject({ unitPriceMinor: 'Whole minor units only (e.g. cents)', quantityPerGarment: 'Cannot be negative' });
    const settings = await owner.put('/api/costing/styles/1/settings').send({ marginPercent: 100, retailMultiplier: 0 });
    expect(settings.status).toBe(400);
    expect(Object.keys(settings.body.error.fields).sort()).toEqual(['marginPercent', 'retailMultiplier']);
    expect((await owner.put('/api/costing/trims/999').send({ unitPriceMinor: 1 })).status).toBe(404);
    expect((await owner.get('/api/batches/999/costing')).status).toBe(404);
  });

  it('prices from a 60 % margin on wholesale as cost ÷ 0.40 (reference §5.2 K4, solutioninn.com 7532880 [quoted])', async () => {
    const res = await owner.put('/api/costing/styles/1/settings').send({ marginPercent: 60 });
    expect(res.body.settings.marginPercent).toBe(60);
    const c = await costing();
    expect(c.totals.wholesaleMinor).toBe(Math.round(c.totals.averageUnitCostMinor / 0.4));
    await owner.put('/api/costing/styles/1/settings').send({ marginPercent: 30 });
  });

  it('writes a workbook whose cached results equal the app, whose formulas recalculate, with the studio name', async () => {
    const c = await costing();
    const res = await owner.get('/api/batches/1/costing.xlsx').buffer(true).parse(binary);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toContain('spreadsheetml');
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(res.body as unknown as ArrayBuffer);
    const sheet = wb.getWorksheet('Costing sheet')!;
    const texts: string[] = [];
    sheet.eachRow((r) => r.eachCell((cell) => texts.push(String(cell.value))));
    expect(texts.join(' ')).toContain('Tamarind Row Studio');
    const unitRow = findRow(sheet, 'Unit cost');
    const firstCostCol = 5 + c.sizes.length;
    c.sizes.forEach((s: { unitCostMinor: number }, i: number) => {
      const cell = sheet.getRow(unitRow).getCell(firstCostCol + i);
      expect(formulaOf(cell)).toMatch(/^SUM\(/);
      expect(Math.round((cachedOf(cell) as number) * 100)).toBe(s.unitCostMinor);
      expect(Math.round(evaluateCell(sheet, cell.address) * 100)).toBe(s.unitCostMinor);
    });
    const at = (label: string) => sheet.getRow(findRow(sheet, label)).getCell(4);
    expect(Math.round((cachedOf(at('Average unit cost')) as number) * 100)).toBe(c.totals.averageUnitCostMinor);
    expect(Math.round((cachedOf(at('Wholesale price')) as number) * 100)).toBe(c.totals.wholesaleMinor);
    expect(Math.round((cachedOf(at('Suggested retail price')) as number) * 100)).toBe(c.totals.retailMinor);
    expect(formulaOf(at('Suggested retail price'))).toMatch(/ROUND\(/);
    // Change the buttons' price in the sheet: the retail follows the same way the app's does.
    const buttonsRow = findRow(sheet, 'Shirt buttons 11 mm, 4-hole');
    const priceAddr = sheet.getRow(buttonsRow).getCell(4).address;
    const retail = evaluateCell(sheet, at('Suggested retail price').address, { [priceAddr]: 7.5 });
    const buttons = c.lines.find((l: { description: string }) => l.description.startsWith('Shirt buttons'));
    await owner.put(`/api/costing/trims/${buttons.refId}`).send({ unitPriceMinor: 750 });
    expect(Math.round(retail * 100)).toBe((await costing()).totals.retailMinor);
    await owner.put(`/api/costing/trims/${buttons.refId}`).send({ unitPriceMinor: buttons.priceMinor });
  });

  it('costs labour at the operations\' piece rates when asked', async () => {
    const c = (await owner.get('/api/batches/1/costing?labourBasis=piece-rates')).body.costing;
    const labour = c.lines.filter((l: { kind: string }) => l.kind === 'labour');
    expect(labour).toHaveLength(1);
    expect(labour[0].costMinor.M).toBe(c.labour.basis === 'piece-rates' ? c.labour.pieceRateMinor : Math.round(c.labour.samMinutes * c.settings.labourCostPerMinuteMinor));
    expect((await owner.get('/api/batches/1/costing?labourBasis=hourly')).body.error.fields.labourBasis).toBeTruthy();
  });

  it('records trim and settings changes in the audit trail', async () => {
    const { entries } = (await owner.get('/api/audit')).body;
    expect(entries.some((e: { entity: string }) => e.entity === 'trim')).toBe(true);
    expect(entries.some((e: { entity: string }) => e.entity === 'costing_settings')).toBe(true);
  });
});
