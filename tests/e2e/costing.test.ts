import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launchBrowser, shot, signInAs } from './browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const apiJson = (page: Page, url: string) =>
  page.evaluate(async (u) => {
    const r = await fetch(u);
    return r.json();
  }, url);

/** Sending builds a workbook and opens an SMTP session: give the UI time. */
const soon = { timeout: 15_000 };

const kes = (minor: number) => new Intl.NumberFormat('en-KE', { style: 'currency', currency: 'KES' }).format(minor / 100);

function findRow(sheet: ExcelJS.Worksheet, label: string): ExcelJS.Row {
  let found: ExcelJS.Row | undefined;
  sheet.eachRow((row) => {
    if (!found && row.getCell(1).value === label) found = row;
  });
  if (!found) throw new Error(`no row ${label}`);
  return found;
}
const cached = (v: ExcelJS.CellValue) => (v && typeof v === 'object' && 'result' in v ? v.result : v);

describe('journey: the owner prices the demo batch and orders its fabric', () => {
  it('changes a trim price, sees the totals follow, downloads the sheet, sends the fabric PO and finds it in the outbox', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 }, acceptDownloads: true });
    const pageErrors: string[] = [];
    page.on('pageerror', (e) => pageErrors.push(e.message));
    await signInAs(page, 'owner@tamarind.example');
    await page.goto(`${baseUrl()}/batches/1`);
    await page.getByRole('link', { name: 'Open costing sheet' }).click();
    await page.waitForURL(/\/batches\/1\/costing$/);
    const average = page.getByTestId('average-unit-cost');
    await expect.poll(() => average.isVisible(), soon).toBe(true);
    const before = (await apiJson(page, '/api/batches/1/costing')).costing;
    expect(await average.textContent()).toBe(kes(before.totals.averageUnitCostMinor));
    await shot(page, 'costing-sheet');

    // Buttons from KES 5.00 to 7.50: ten a garment → +KES 25.00 of materials, + 15 % overheads.
    const price = page.getByLabel('Unit price, Shirt buttons 11 mm, 4-hole');
    await price.fill('7.50');
    await price.press('Enter');
    await expect.poll(async () => average.textContent(), soon).not.toBe(kes(before.totals.averageUnitCostMinor));
    const after = (await apiJson(page, '/api/batches/1/costing')).costing;
    expect(after.totals.averageUnitCostMinor - before.totals.averageUnitCostMinor).toBe(Math.round(2500 * 1.15));
    await expect.poll(async () => average.textContent(), soon).toBe(kes(after.totals.averageUnitCostMinor));
    expect(await page.getByTestId('wholesale').textContent()).toBe(kes(after.totals.wholesaleMinor));
    expect(await page.getByTestId('retail').textContent()).toBe(kes(after.totals.retailMinor));
    await shot(page, 'costing-after-price-change');

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download XLSX' }).click()]);
    const file = join(tmpdir(), `seamrun-e2e-costing-${Date.now()}.xlsx`);
    await download.saveAs(file);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(file);
    const sheet = wb.getWorksheet('Costing sheet')!;
    expect(findRow(sheet, 'Shirt buttons 11 mm, 4-hole').getCell(4).value).toBe(7.5);
    expect(cached(findRow(sheet, 'Average unit cost').getCell(4).value)).toBeCloseTo(after.totals.averageUnitCostMinor / 100, 2);
    expect(cached(findRow(sheet, 'Wholesale price').getCell(4).value)).toBeCloseTo(after.totals.wholesaleMinor / 100, 2);
    expect(cached(findRow(sheet, 'Suggested retail price').getCell(4).value)).toBeCloseTo(after.totals.retailMinor / 100, 2);

    await page.goto(`${baseUrl()}/batches/1`);
    await page.getByRole('button', { name: 'Make purchase orders' }).click();
    await expect.poll(() => page.getByText(/draft purchase orders? made/).isVisible(), soon).toBe(true);
    await shot(page, 'batch-materials-to-order');
    await page.getByRole('link', { name: 'Suppliers and orders' }).click();
    await page.waitForURL(/\/purchasing$/);
    type Po = { id: number; number: string; supplierName: string; lines: { kind: string }[] };
    let orders = (await apiJson(page, '/api/purchasing/orders')).orders as Po[];
    if (!orders.some((o) => o.lines.some((l) => l.kind === 'fabric'))) {
      // The rolls in stock cover this batch, so the owner tops the fabric up by hand for the next run.
      await page.getByLabel('Item', { exact: true }).selectOption({ label: `Fabric: ${after.fabric.name}` });
      await page.getByLabel('Supplier', { exact: true }).selectOption({ label: 'Mvuli Weaving Co.' });
      await page.getByLabel('Quantity to order').fill('30');
      await page.getByLabel('For batch').selectOption({ label: 'B-0001 · Sable shirt dress' });
      await page.getByRole('button', { name: 'Make draft order' }).click();
      await expect.poll(async () => ((await apiJson(page, '/api/purchasing/orders')).orders as Po[]).some((o) => o.lines.some((l) => l.kind === 'fabric')), soon).toBe(true);
      orders = (await apiJson(page, '/api/purchasing/orders')).orders as Po[];
    }
    const fabricPo = orders.find((o) => o.lines.some((l) => l.kind === 'fabric'))!;
    expect(fabricPo.supplierName).toBe('Mvuli Weaving Co.');
    await page.getByRole('button', { name: `Send ${fabricPo.number} to Mvuli Weaving Co.` }).click();
    await expect.poll(() => page.getByText(`Sent ${fabricPo.number} to orders@mvuli-weaving.example`).isVisible(), soon).toBe(true);
    await shot(page, 'purchasing-orders');

    await page.getByRole('link', { name: 'Outbox' }).click();
    await page.waitForURL(/\/outbox$/);
    const row = page.getByRole('row', { name: new RegExp(`Purchase order ${fabricPo.number}`) });
    await expect.poll(() => row.isVisible(), soon).toBe(true);
    expect(await row.textContent()).toContain('orders@mvuli-weaving.example');
    expect(await row.textContent()).toContain(`${fabricPo.number}.xlsx`);
    await row.click();
    await expect.poll(() => page.getByText('Please find our purchase order').isVisible(), soon).toBe(true);
    await shot(page, 'outbox-with-sent-po');
    expect(pageErrors).toEqual([]);
    await page.close();
  });

  it('keeps the costing sheet from the cutter: no menu entry, 403 from the API', async () => {
    const page = await browser.newPage({ viewport: { width: 390, height: 844 } });
    await signInAs(page, 'cutter@tamarind.example');
    await page.goto(`${baseUrl()}/batches/1/costing`);
    await page.waitForURL(`${baseUrl()}/`);
    const res = await page.evaluate(async () => (await fetch('/api/batches/1/costing')).status);
    expect(res).toBe(403);
    await page.close();
  });
});
