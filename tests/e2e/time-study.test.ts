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

describe('journey: the owner times an operation and a machinist sees the week on the floor', () => {
  it('fills an operation’s standard minutes from a time-study sheet', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signInAs(page, 'owner@tamarind.example');
    await page.goto(`${baseUrl()}/line`);
    await expect.poll(() => page.getByTestId('operations').locator('tbody tr').count()).toBeGreaterThan(10);
    // The first open batch is of style 1; keep its SAM unchanged so the other journeys see the same line:
    // one element timed at SAM × 60 s, rated 100, no allowances, gives SAM standard minutes.
    const ops = (await page.evaluate(async () => (await (await fetch('/api/styles/1/operations')).json()).operations)) as { code: string; sam: number }[];
    const op = ops.find((o) => o.code === 'OP06')!;
    await page.getByRole('button', { name: 'Time study, OP06' }).click();
    const form = page.getByTestId('time-study-form');
    await form.getByLabel('Times in seconds, element 1').fill(`${op.sam * 60} ${op.sam * 60}`);
    await form.getByLabel('Ratings, element 1').fill('100');
    await form.getByLabel('Relaxation allowance %').fill('0');
    await expect.poll(() => page.getByTestId('time-study-result').textContent()).toContain(`standard ${op.sam.toFixed(3)} min`);
    await shot(page, 'line-time-study');
    await form.getByRole('button', { name: 'Set standard minutes' }).click();
    await expect.poll(() => page.getByRole('button', { name: 'Time study, OP06' }).textContent()).toBe('Time study ✓');
    const after = (await page.evaluate(async () => (await (await fetch('/api/styles/1/operations')).json()).operations)) as { code: string; sam: number; timeStudy: unknown }[];
    expect(after.find((o) => o.code === 'OP06')).toMatchObject({ sam: op.sam, timeStudy: expect.anything() });
    await page.close();
  });

  it('shows a machinist this week’s and this pay period’s count and earnings', async () => {
    const ctx = await browser.newContext({ viewport: { width: 390, height: 844 } });
    const page = await ctx.newPage();
    await signInAs(page, 'machinist1@tamarind.example');
    await expect.poll(() => page.getByTestId('week-figures').isVisible(), { timeout: 15_000 }).toBe(true);
    expect(await page.getByTestId('week-figures').textContent()).toMatch(/\d+ pcs · \d+ ops?\b/);
    expect(await page.getByTestId('period-figures').textContent()).toMatch(/\d+ pcs · \d+ ops?\b/);
    await shot(page, 'floor-week-and-period');
    await ctx.close();
  });
});
