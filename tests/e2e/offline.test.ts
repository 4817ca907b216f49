import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launchBrowser, shot, signInAs } from './browser';

const PHONE = { width: 390, height: 844 };
let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe('the floor screen with no network', () => {
  it('opens after a reload offline, keeps its waiting log, says why it cannot find a bundle and signs out', async () => {
    const ctx = await browser.newContext({ viewport: PHONE, hasTouch: true, isMobile: true });
    const page = await ctx.newPage();
    await signInAs(page, 'machinist2@tamarind.example');
    const hello = page.getByRole('heading', { name: 'Hello, Neema' });
    await expect.poll(() => hello.isVisible()).toBe(true);
    // The installable app: a web manifest and a service worker that has kept the app shell.
    expect(await page.locator('link[rel="manifest"]').getAttribute('href')).toBe('/manifest.webmanifest');
    await page.evaluate(async () => {
      await navigator.serviceWorker.ready;
    });

    // Find bundle 1 online, then lose the network and log it: it waits on the phone.
    await page.getByLabel('Bundle number').fill('1');
    await page.getByRole('button', { name: 'Find bundle' }).click();
    await expect.poll(() => page.getByText('Bundle 1 · size').isVisible()).toBe(true);
    const picked = page.locator('input[name="operation"]:checked');
    if (!(await picked.count())) await page.locator('input[name="operation"]').first().check();
    await ctx.setOffline(true);
    await page.getByRole('button', { name: 'Log done' }).click();
    await expect.poll(() => page.getByText('1 log waiting on this phone').isVisible()).toBe(true);

    // Reload with no network: the floor screen opens and still holds the log.
    await page.reload();
    await expect.poll(() => hello.isVisible(), { timeout: 20_000 }).toBe(true);
    await expect.poll(() => page.getByText('1 log waiting on this phone').isVisible()).toBe(true);
    await shot(page, 'floor-phone-offline');

    // Finding a bundle needs the server: the phone says so.
    await page.getByLabel('Bundle number').fill('6');
    await page.getByRole('button', { name: 'Find bundle' }).click();
    await expect.poll(() => page.getByRole('alert').first().textContent()).toContain('No network');

    // Sign out with no network: the sign-in screen, and nobody is let back in on a reload.
    await page.getByRole('button', { name: 'Menu' }).click();
    await page.getByRole('button', { name: 'Sign out' }).click();
    // Where the app warns first about logs still waiting on the phone, sign out and keep them.
    const keep = page.getByRole('button', { name: /^Sign out and keep/ });
    await Promise.race([
      page.waitForURL(`${baseUrl()}/signin`).catch(() => {}),
      keep.waitFor({ timeout: 10_000 }).then(() => keep.click()).catch(() => {}),
    ]);
    await page.waitForURL(`${baseUrl()}/signin`);
    await page.goto(`${baseUrl()}/`);
    await page.waitForURL(`${baseUrl()}/signin`);

    // Back online: the old session is ended at the server before anything else is sent.
    await ctx.setOffline(false);
    await page.goto(`${baseUrl()}/`);
    await page.waitForURL(`${baseUrl()}/signin`);
    expect(await page.evaluate(async () => (await fetch('/api/auth/me')).status)).toBe(401);
    await ctx.close();
  });
});
