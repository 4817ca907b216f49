import ExcelJS from 'exceljs';
import { beforeAll, describe, expect, it } from 'vitest';
import { cachedOf, evaluateCell, findRow } from '../../exports/xlsx/workbook-reader.testing';
import { binary, buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent;
beforeAll(async () => {
  const { app } = await buildTestApp();
  owner = await signIn(app, DEMO.owner);
}, 120_000);

/** Cost per garment by size and on average, as the workbook caches it and as it recalculates. */
async function workbookFigures(sizes: string[]) {
  const res = await owner.get('/api/batches/1/costing.xlsx').buffer(true).parse(binary);
  expect(res.status).toBe(200);
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.load(res.body as unknown as ArrayBuffer);
  const sheet = wb.getWorksheet('Costing sheet')!;
  const unitRow = sheet.getRow(findRow(sheet, 'Unit cost'));
  const firstCostCol = 5 + sizes.length;
  const kinds: Record<string, string> = {};
  sheet.eachRow((r) => {
    if (r.number > unitRow.number) return;
    kinds[String(r.getCell(1).value)] = String(r.getCell(2).value);
  });
  const avg = sheet.getRow(findRow(sheet, 'Average unit cost')).getCell(4);
  return {
    unitCost: sizes.map((_, i) => Math.round((cachedOf(unitRow.getCell(firstCostCol + i)) as number) * 100)),
    recalculated: sizes.map((_, i) => Math.round(evaluateCell(sheet, unitRow.getCell(firstCostCol + i).address) * 100)),
    average: Math.round((cachedOf(avg) as number) * 100),
    kinds,
  };
}

describe('costing agrees with itself', () => {
  it('gives the same cost per garment on the costing page, the batch page and the workbook once piece rates are chosen, and labels the labour line labour', async () => {
    // The owner picks piece rates on the costing page: the choice is saved with the style's settings.
    const saved = await owner.put('/api/costing/styles/1/settings').send({ labourBasis: 'piece-rates' });
    expect(saved.status).toBe(200);
    expect(saved.body.settings.labourBasis).toBe('piece-rates');
    // Costing page and batch page read the same sheet (GET without a basis: the saved one).
    const page = (await owner.get('/api/batches/1/costing')).body.costing;
    expect(page.labour.basis).toBe('piece-rates');
    const labour = page.lines.filter((l: { kind: string }) => l.kind === 'labour');
    expect(labour).toHaveLength(1);
    expect(labour[0].costMinor.M).toBe(page.labour.pieceRateMinor);
    const sizes = page.sizes.map((s: { size: string }) => s.size) as string[];
    const book = await workbookFigures(sizes);
    expect(book.unitCost).toEqual(page.sizes.map((s: { unitCostMinor: number }) => s.unitCostMinor));
    expect(book.recalculated).toEqual(book.unitCost);
    expect(book.average).toBe(page.totals.averageUnitCostMinor);
    expect(book.kinds[labour[0].description]).toBe('Labour');
  });

  it('rejects an unknown labour basis by field and keeps the saved one', async () => {
    const bad = await owner.put('/api/costing/styles/1/settings').send({ labourBasis: 'hourly' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.labourBasis).toBeTruthy();
    expect((await owner.get('/api/costing/styles/1/settings')).body.settings.labourBasis).toBe('piece-rates');
  });

  it('goes back to standard minutes everywhere when the owner chooses them again', async () => {
    await owner.put('/api/costing/styles/1/settings').send({ labourBasis: 'sam' });
    const page = (await owner.get('/api/batches/1/costing')).body.costing;
    expect(page.labour.basis).toBe('sam');
    const book = await workbookFigures(page.sizes.map((s: { size: string }) => s.size));
    expect(book.unitCost).toEqual(page.sizes.map((s: { unitCostMinor: number }) => s.unitCostMinor));
    expect(book.average).toBe(page.totals.averageUnitCostMinor);
  });
});
