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

describe('markers: the owner builds a marker for the demo batch', () => {
  it('starts a marker, watches the progress bar, sees utilisation, the progress chart and the SVG holds every piece', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signInAs(page, 'owner@tamarind.example');
    await page.getByRole('link', { name: 'Markers' }).click();
    await page.getByLabel('Garments of size XS').fill('1');
    await page.getByLabel('Seconds').fill('3');
    await page.getByRole('button', { name: 'Start marker' }).click();
    await expect.poll(() => page.getByRole('progressbar', { name: 'Marker progress' }).isVisible(), { timeout: 20_000 }).toBe(true);
    await shot(page, 'owner-marker-progress');
    await expect.poll(() => page.getByTestId('marker-utilisation').isVisible(), { timeout: 240_000, interval: 1000 }).toBe(true);
    const util = Number((await page.getByTestId('marker-utilisation').textContent())!.replace(/[^\d.]/g, ''));
    expect(util).toBeGreaterThan(30);
    // The run's length and density over time, drawn once recharts has loaded on its own.
    await expect.poll(() => page.getByRole('img', { name: 'Best marker length and density over the run' }).isVisible(), { timeout: 20_000 }).toBe(true);
    await shot(page, 'owner-marker-done');
    const id = await page.evaluate(async () => (await (await fetch('/api/markers')).json()).markers[0].id as number);
    const svg = await page.evaluate(async (mid) => (await fetch(`/api/markers/${mid}/svg`)).text(), id);
    const marker = await page.evaluate(async (mid) => (await (await fetch(`/api/markers/${mid}`)).json()).marker, id);
    expect(svg.match(/class="piece"/g)?.length).toBe(marker.pieceCount);
    expect(marker.pieceCount).toBe(13);
    expect(svg).toContain('XS Front');
    expect(baseUrl()).toBeTruthy();
    await page.close();
  }, 300_000);
});
