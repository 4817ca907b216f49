import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launchBrowser, signInAs } from './browser';

/** Each role's main pages, as its menu and home lead to them. */
const PAGES: Record<string, { email: string; paths: string[] }> = {
  owner: {
    email: 'owner@tamarind.example',
    paths: [
      '/', '/styles', '/styles/new', '/styles/1', '/styles/1/grading', '/grading', '/batches', '/batches/new', '/batches/1',
      '/batches/1/costing', '/markers', '/fabrics', '/line', '/floor', '/pay', '/costing', '/purchasing', '/outbox',
      '/people', '/settings', '/audit', '/account',
    ],
  },
  cutter: { email: 'cutter@tamarind.example', paths: ['/', '/fabrics', '/styles/1/grading', '/account'] },
  machinist: { email: 'machinist1@tamarind.example', paths: ['/', '/account'] },
  finisher: { email: 'finisher1@tamarind.example', paths: ['/', '/account'] },
};

/** Pages that send on by design: with one style, the grading index opens that style's grading. */
const LANDS_ON: Record<string, string> = { '/grading': '/styles/1/grading' };

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** Everything the page says on its console at warning level or above, and uncaught errors. */
function watchConsole(page: Page) {
  const said: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error' || m.type() === 'warning') said.push(`${m.type()}: ${m.text().slice(0, 300)}`);
  });
  page.on('pageerror', (e) => said.push(`uncaught: ${e.message}`));
  return said;
}

/** Open a page and wait until its heading is shown and the network is quiet. */
export async function openPage(page: Page, path: string) {
  await page.goto(`${baseUrl()}${path}`);
  await page.locator('main h1, main [role="alert"]').first().waitFor({ timeout: 20_000 });
  await page.waitForLoadState('networkidle');
}

describe('every main page of every role', () => {
  for (const [role, { email, paths }] of Object.entries(PAGES)) {
    it(`leaves the console clean on each of the ${role}'s pages when visited`, async () => {
      const ctx: BrowserContext = await browser.newContext({ viewport: { width: 1280, height: 900 } });
      const page = await ctx.newPage();
      const said = watchConsole(page);
      await signInAs(page, email);
      const found: string[] = said.map((s) => `/signin → ${s}`);
      for (const path of paths) {
        said.length = 0;
        await openPage(page, path);
        expect(page.url(), `${role} stays on ${path}`).toBe(`${baseUrl()}${LANDS_ON[path] ?? path}`);
        found.push(...said.map((s) => `${path} → ${s}`));
      }
      await ctx.close();
      expect(found).toEqual([]);
    });
  }
});
