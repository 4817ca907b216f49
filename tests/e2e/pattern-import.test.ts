import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launchBrowser, shot, signInAs } from './browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

// A 20 cm × 10 cm rectangle with a half-disc (r 10 cm, bulge 1) on its top edge, cutting line, in centimetres
// with no $INSUNITS: the owner must give the units. Area 200 + π·10²/2 = 357.08 cm² (analytic).
const DXF = [
  [0, 'SECTION'], [2, 'ENTITIES'],
  [0, 'LWPOLYLINE'], [8, '1'], [90, 4], [70, 1], [10, 0], [20, 0], [10, 20], [20, 0], [10, 20], [20, 10], [42, 1], [10, 0], [20, 10],
  [0, 'TEXT'], [8, '1'], [10, 2], [20, 2], [40, 1], [1, 'Piece Name: Tab'],
  [0, 'ENDSEC'], [0, 'EOF'],
].map(([c, v]) => `${c}\n${v}`).join('\n') + '\n';

describe('journey: the owner imports a pattern file', () => {
  it('asks for the units, previews the piece to scale with its area, and accepts it as the style\'s piece', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signInAs(page, 'owner@tamarind.example');
    const styleId = await page.evaluate(async () => {
      const h = { 'Content-Type': 'application/json', 'X-Seamrun-Csrf': '1' };
      const s = await (await fetch('/api/styles', { method: 'POST', headers: h, body: JSON.stringify({ code: `IMP-${Date.now() % 100000}`, name: 'Imported tab', sizeRun: ['S', 'M'], baseSize: 'M' }) })).json();
      await fetch(`/api/styles/${s.style.id}/grading/chart`, { method: 'PUT', headers: h, body: JSON.stringify({ name: 'Run', sizes: ['S', 'M'], rows: [{ pointOfMeasure: 'bust', values: [880, 920] }] }) });
      return s.style.id as number;
    });
    await page.goto(`${baseUrl()}/styles/${styleId}/grading`);
    await page.getByLabel('Pattern file').setInputFiles({ name: 'tab.dxf', mimeType: 'application/dxf', buffer: Buffer.from(DXF) });
    await page.getByLabel('The outline in the file is the').selectOption('cutting');
    await page.getByRole('button', { name: 'Preview' }).click();
    await expect.poll(() => page.getByText(/does not say its units/).first().isVisible(), { timeout: 15_000 }).toBe(true);
    await page.getByLabel('Units (if the file does not say)').selectOption('cm');
    await page.getByRole('button', { name: 'Preview' }).click();
    await page.locator('[data-testid="pattern-preview"]').waitFor({ timeout: 15_000 });
    expect(await page.getByRole('img', { name: 'Tab drawn to scale' }).isVisible()).toBe(true);
    // Chords lose at most 31.4 cm × 0.005 cm = 0.16 cm², so the shown whole cm² is 357.
    expect(await page.getByText(/area 357 cm²/).isVisible()).toBe(true);
    await page.getByLabel('Cut Tab').selectOption('pair');
    await page.getByLabel('Seam allowance of Tab (mm)').fill('10');
    await shot(page, 'pattern-import-preview');
    await page.getByRole('button', { name: 'Accept pieces' }).click();
    await expect.poll(() => page.getByRole('tab', { name: 'Tab' }).isVisible(), { timeout: 15_000 }).toBe(true);
    const stored = await page.evaluate(async (id) => (await (await fetch(`/api/styles/${id}/grading`)).json()).grading.pieces, styleId);
    expect(stored.map((p: { name: string; cut: string }) => [p.name, p.cut])).toEqual([['Tab', 'pair']]);
  }, 120_000);
});
