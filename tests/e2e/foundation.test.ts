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

describe('journey 1: the owner plans a run of 40 dresses in five sizes', () => {
  it('creates a batch of 40 in five sizes and sees it listed', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signInAs(page, 'owner@tamarind.example');
    await expect.poll(() => page.getByRole('heading', { name: /Good day/ }).isVisible()).toBe(true);
    await shot(page, 'owner-home');
    await page.getByRole('link', { name: 'Batches' }).click();
    await page.getByRole('link', { name: 'New batch' }).click();
    // Other tests add styles of their own: pick the demo shirt dress by its code.
    const styleSelect = page.getByLabel('Style', { exact: true });
    const demo = await styleSelect.locator('option', { hasText: 'SR-101' }).getAttribute('value');
    await styleSelect.selectOption(demo!);
    const sizes = { XS: 4, S: 8, M: 12, L: 10, XL: 6 };
    for (const [size, n] of Object.entries(sizes)) await page.getByLabel(`Quantity ${size}`, { exact: true }).fill(String(n));
    expect(await page.getByLabel('Total garments').textContent()).toBe('40');
    await page.getByLabel('Notes').fill('Second run for the coast shops');
    await shot(page, 'owner-new-batch');
    await page.getByRole('button', { name: 'Create batch' }).click();
    await page.waitForURL(/\/batches\/\d+$/);
    await expect.poll(() => page.getByText('Second run for the coast shops').isVisible()).toBe(true);
    await shot(page, 'owner-batch-detail');
    await page.getByRole('link', { name: 'Batches', exact: true }).click();
    await page.waitForURL(/\/batches$/);
    await page.getByRole('heading', { name: 'Batches', exact: true }).waitFor();
    // The seeded batch and the new one, each 40 in the same five sizes.
    const runsOf40 = async () =>
      (await page.getByRole('row').allTextContents()).filter((r) => r.includes('XS 4 · S 8 · M 12 · L 10 · XL 6') && r.includes('40')).length;
    await expect.poll(runsOf40, { timeout: 15_000 }).toBeGreaterThanOrEqual(2);
    await shot(page, 'owner-batches-list');
    await page.close();
  });

  it('shows a clear error for a bad quantity and saves nothing', async () => {
    const page = await browser.newPage();
    await signInAs(page, 'owner@tamarind.example');
    await page.goto(`${baseUrl()}/batches/new`);
    await page.getByRole('button', { name: 'Create batch' }).click();
    await expect.poll(() => page.getByText('Enter at least one garment').isVisible()).toBe(true);
    await page.close();
  });
});

describe('a machinist cannot reach the owner pages', () => {
  it('is sent home in the UI and refused by the API', async () => {
    const ctx = await browser.newContext({ viewport: { width: 390, height: 844 } });
    const page = await ctx.newPage();
    await signInAs(page, 'machinist1@tamarind.example');
    await page.goto(`${baseUrl()}/people`);
    await page.waitForURL(`${baseUrl()}/`);
    expect(await page.getByRole('link', { name: 'People' }).count()).toBe(0);
    const api = await page.evaluate(async () => {
      const r = await fetch('/api/users');
      return { status: r.status, body: await r.json() };
    });
    expect(api.status).toBe(403);
    expect(api.body.error.code).toBe('forbidden');
    await shot(page, 'machinist-home-phone');
    await ctx.close();
  });
});
