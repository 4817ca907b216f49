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

describe('cut planning: the owner plans the demo batch', () => {
  it('enters a roll, plans the cut and sees lays and the lower bound', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signInAs(page, 'owner@tamarind.example');
    await page.getByRole('link', { name: 'Fabric' }).click();
    await expect.poll(() => page.getByText('Sable cotton poplin').first().isVisible()).toBe(true);
    await page.getByLabel('Roll label').fill('SCP-0106');
    await page.getByLabel('Length (m)').fill('27.3');
    await page.getByLabel('Shade lot').fill('Lot B');
    await page.getByRole('button', { name: 'Add roll' }).click();
    await expect.poll(() => page.getByRole('cell', { name: 'SCP-0106' }).isVisible()).toBe(true);
    await shot(page, 'owner-fabric-rolls');
    await page.goto(`${baseUrl()}/batches/1`);
    await page.getByRole('button', { name: 'Plan the cut' }).click();
    await expect.poll(() => page.getByText('Lower bound').isVisible()).toBe(true);
    await expect.poll(async () => (await page.getByLabel('Plan figures').textContent()) ?? '').toMatch(/Fabric used .* m.*Lower bound .* m.*Gap/);
    expect(await page.getByRole('row').count()).toBeGreaterThanOrEqual(3);
    await shot(page, 'owner-cut-plan');
    await page.close();
  });
});

describe('the cutter cuts today\'s first lay', () => {
  it('opens the first lay, sees the marker list per roll, records plies and marks it cut', async () => {
    const ctx = await browser.newContext({ viewport: { width: 390, height: 844 } });
    const page = await ctx.newPage();
    await signInAs(page, 'cutter@tamarind.example');
    await expect.poll(() => page.getByRole('heading', { name: "Today's lays" }).isVisible()).toBe(true);
    await shot(page, 'cutter-home-phone');
    await page.getByRole('link', { name: /Lay \d+/ }).first().click();
    await page.waitForURL(/\/lays\/\d+$/);
    await expect.poll(() => page.getByText('Marker list per roll').first().isVisible()).toBe(true);
    expect(await page.getByText('Cutting-room cautions').isVisible()).toBe(true);
    const body = await page.textContent('body');
    expect(body).not.toMatch(/KES|price/i);
    // Nothing is pre-filled from the plan: the cutter types the plies spread and the remnant measured on every roll.
    const rows = page.getByRole('row').filter({ has: page.getByLabel(/Plies spread from/) });
    const n = await rows.count();
    expect(n).toBeGreaterThan(0);
    for (let i = 0; i < n; i++) {
      const row = rows.nth(i);
      const [plies, remnant] = [row.getByLabel(/Plies spread from/), row.getByLabel(/Remnant left on/)];
      expect(await plies.inputValue()).toBe('');
      expect(await remnant.inputValue()).toBe('');
      const cells = await row.getByRole('cell').allTextContents();
      await plies.fill(String(Math.max(1, Number(cells[2]) - (i === 0 ? 1 : 0))));
      await remnant.fill(cells[3].replace(/[^\d.]/g, ''));
    }
    await page.getByLabel('Flaws and shortages').fill('One ply short: hole near the selvedge');
    await shot(page, 'cutter-lay-phone');
    await page.getByRole('button', { name: 'Mark lay cut' }).click();
    // It asks first, in place: the spread becomes the roll stock.
    await page.getByRole('button', { name: 'Yes, mark it cut' }).click();
    await expect.poll(() => page.getByText(/bundles\./).isVisible()).toBe(true);
    await expect.poll(() => page.getByRole('heading', { name: 'Bundles' }).isVisible()).toBe(true);
    await shot(page, 'cutter-lay-cut-phone');
    await ctx.close();
  });
});
