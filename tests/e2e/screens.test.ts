import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launchBrowser, signInAs } from './browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function pageFor(email: string, viewport = { width: 1280, height: 900 }): Promise<Page> {
  const page = await (await browser.newContext({ viewport })).newPage();
  await signInAs(page, email);
  return page;
}

describe('screens', () => {
  it('gives every menu entry its own icon', async () => {
    const page = await pageFor('owner@tamarind.example');
    // The menu renders once the signed-in shell has loaded: wait for it before reading its icons.
    await page.locator('nav[aria-label] a svg').first().waitFor();
    const icons = await page.locator('nav[aria-label] a svg').evaluateAll((svgs) => svgs.map((s) => s.innerHTML));
    expect(icons.length).toBeGreaterThan(10);
    expect(new Set(icons).size).toBe(icons.length);
  });

  it('opens a table row from the keyboard', async () => {
    const page = await pageFor('owner@tamarind.example');
    await page.goto(`${baseUrl()}/batches`);
    const row = page.locator('tbody tr[tabindex="0"]').first();
    await row.focus();
    await page.keyboard.press('Enter');
    await page.waitForURL(/\/batches\/\d+$/);
  });

  it('says whether the phone menu is open', async () => {
    const page = await pageFor('owner@tamarind.example', { width: 390, height: 844 });
    const button = page.locator('header button[aria-controls="main-menu"]');
    expect(await button.getAttribute('aria-expanded')).toBe('false');
    await button.click();
    expect(await button.getAttribute('aria-expanded')).toBe('true');
  });

  it('prints the page alone: no menu, no buttons', async () => {
    const page = await pageFor('cutter@tamarind.example');
    await page.goto(`${baseUrl()}/lays/2`);
    await page.locator('main h1').waitFor();
    await page.emulateMedia({ media: 'print' });
    expect(await page.locator('#main-menu').isVisible()).toBe(false);
    expect(await page.locator('main button').first().isVisible()).toBe(false);
    expect(await page.locator('main h1').isVisible()).toBe(true);
  });

  it('finds a roll by its label and a style by its code from the one search box, per role', async () => {
    const cutter = await pageFor('cutter@tamarind.example');
    await cutter.locator('#app-search').fill('SCP-0102');
    await cutter.getByRole('list', { name: 'Search' }).getByRole('link', { name: /SCP-0102/ }).click();
    await cutter.waitForURL(/\/fabrics\?q=SCP-0102$/);
    const owner = await pageFor('owner@tamarind.example');
    await owner.locator('#app-search').fill('SR-101');
    await owner.getByRole('list', { name: 'Search' }).getByRole('link', { name: /Style SR-101/ }).click();
    await owner.waitForURL(/\/styles\/\d+$/);
    const machinist = await pageFor('machinist1@tamarind.example');
    expect(await machinist.locator('#app-search').count()).toBe(0);
  });
});
