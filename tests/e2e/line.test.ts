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

describe('journey: the owner balances the demo line for the due date', () => {
  it('sees the capacity chart with its bottleneck and the schedule', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signInAs(page, 'owner@tamarind.example');
    await page.getByRole('link', { name: 'Line plan' }).first().click();
    await page.waitForURL(/\/line/);
    await page.getByLabel('Balance for').selectOption('due');
    await page.getByRole('button', { name: 'Balance the line' }).click();
    await expect.poll(() => page.getByTestId('balance-summary').isVisible(), { timeout: 15_000 }).toBe(true);
    const summary = await page.getByTestId('balance-summary').textContent();
    expect(summary).toMatch(/Stations\s*6/);
    expect(summary).toMatch(/Balance efficiency\s*[\d.]+ %/);
    // The chart has one bar per station, one of them the bottleneck (madder).
    await expect.poll(() => page.locator('[data-testid="capacity-chart"] .recharts-bar-rectangle').count()).toBe(6);
    // Bars grow in (recharts draws no path at height 0), so on a busy machine the bar can lag its group.
    await expect.poll(() => page.locator('[data-testid="capacity-chart"] path[fill="#B5523B"]').count()).toBe(1);
    expect(await page.getByTestId('stations').getByText('bottleneck').count()).toBe(1);
    const schedule = await page.getByTestId('schedule').textContent();
    expect(schedule).toMatch(/cutting:.*→/);
    expect(schedule).toMatch(/sewing:.*→/);
    expect(schedule).toMatch(/finishing:.*→/);
    expect(await page.getByText('On time').first().isVisible()).toBe(true);
    expect(await page.getByTestId('timeline-chart').isVisible()).toBe(true);
    expect(await page.getByTestId('output-chart').isVisible()).toBe(true);
    await shot(page, 'line-plan');
    await page.close();
  });

  it('shows the balance on the batch page and reads on a phone', async () => {
    const ctx = await browser.newContext({ viewport: { width: 390, height: 844 } });
    const page = await ctx.newPage();
    await signInAs(page, 'owner@tamarind.example');
    await page.goto(`${baseUrl()}/batches/1`);
    await expect.poll(() => page.getByTestId('balance-summary').isVisible(), { timeout: 15_000 }).toBe(true);
    await expect.poll(() => page.locator('[data-testid="capacity-chart"] .recharts-bar-rectangle').count()).toBeGreaterThan(0);
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(1);
    await shot(page, 'line-batch-panel-phone');
    await ctx.close();
  });

  it('edits the operations table in place: each bad cell says why, nothing is saved until all are right', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signInAs(page, 'owner@tamarind.example');
    await page.goto(`${baseUrl()}/line`);
    const table = page.getByTestId('operations');
    await expect.poll(() => table.locator('tbody tr').count()).toBeGreaterThan(10);
    const before = await table.textContent();

    await page.getByRole('button', { name: 'Edit operations' }).click();
    const name1 = page.getByLabel('Operation, row 1', { exact: true });
    const original = await name1.inputValue();
    const sam1 = page.getByLabel('SAM, row 1', { exact: true });
    const samOriginal = await sam1.inputValue();
    await sam1.fill('0');
    await page.getByLabel('After, row 2', { exact: true }).fill('ZZ9');
    await page.getByRole('button', { name: 'Save operations' }).click();
    await expect.poll(() => page.getByText('Must be more than 0').isVisible()).toBe(true);
    expect(await page.getByText('No operation ZZ9').isVisible()).toBe(true);
    await shot(page, 'line-operations-edit-errors');
    await page.getByRole('button', { name: 'Cancel' }).click();
    expect(await page.getByTestId('operations').textContent()).toBe(before);

    // A real change is saved and kept; then put back.
    await page.getByRole('button', { name: 'Edit operations' }).click();
    await page.getByLabel('Operation, row 1', { exact: true }).fill(`${original} (checked)`);
    expect(await page.getByLabel('SAM, row 1', { exact: true }).inputValue()).toBe(samOriginal);
    await page.getByRole('button', { name: 'Save operations' }).click();
    await expect.poll(() => page.getByTestId('operations').getByText(`${original} (checked)`).isVisible()).toBe(true);
    await page.reload();
    await expect.poll(() => page.getByTestId('operations').getByText(`${original} (checked)`).isVisible()).toBe(true);
    await page.getByRole('button', { name: 'Edit operations' }).click();
    await page.getByLabel('Operation, row 1', { exact: true }).fill(original);
    await page.getByRole('button', { name: 'Save operations' }).click();
    await expect.poll(async () => (await page.getByTestId('operations').textContent()) === before).toBe(true);
    await page.close();
  });
});
