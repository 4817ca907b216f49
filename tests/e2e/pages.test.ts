import { readFileSync } from 'node:fs';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launchBrowser, signInAs } from './browser';

/** Each role's main pages, as its menu and home lead to them. */
const PAGES: Record<string, { email: string; paths: string[] }> = {
  owner: {
    email: 'owner@tamarind.example',
    paths: [
      '/', '/styles', '/styles/new', '/styles/1', '/styles/1/grading', '/styles/2', '/styles/2/grading', '/grading', '/batches', '/batches/new', '/batches/1',
      '/batches/1/costing', '/markers', '/fabrics', '/line', '/floor', '/pay', '/costing', '/purchasing', '/outbox',
      '/people', '/settings', '/audit', '/account',
    ],
  },
  cutter: { email: 'cutter@tamarind.example', paths: ['/', '/fabrics', '/styles/1/grading', '/account'] },
  machinist: { email: 'machinist1@tamarind.example', paths: ['/', '/account'] },
  finisher: { email: 'finisher1@tamarind.example', paths: ['/', '/account'] },
};

/** Pages that send on by design (none now: with the demo's two styles, the grading index lists them). */
const LANDS_ON: Record<string, string> = {};

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

const AXE = readFileSync('node_modules/axe-core/axe.min.js', 'utf8');

interface AxeViolation { id: string; impact: string | null; help: string; nodes: { target: string[] }[] }

/** axe-core's serious and critical findings on the page as it stands (evaluated over DevTools, so the CSP allows it). */
async function seriousAccessibilityFindings(page: Page) {
  await page.evaluate(AXE);
  const violations = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (c: Document, o: object) => Promise<{ violations: AxeViolation[] }> } }).axe;
    return (await axe.run(document, { resultTypes: ['violations'] })).violations;
  });
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.impact} ${v.id} (${v.help}): ${v.nodes.slice(0, 3).map((n) => n.target.join(' ')).join(', ')}`);
}

/** Open a page and wait until its heading is shown and the network is quiet. */
export async function openPage(page: Page, path: string) {
  await page.goto(`${baseUrl()}${path}`);
  await page.locator('main h1, main [role="alert"]').first().waitFor({ timeout: 20_000 });
  await page.waitForLoadState('networkidle');
}

const SIZES = { phone: { width: 390, height: 844 }, desktop: { width: 1280, height: 900 } };

describe('every main page of every role', () => {
  for (const [role, { email, paths }] of Object.entries(PAGES)) {
    for (const [size, viewport] of Object.entries(SIZES)) {
      it(`leaves the console clean and has no serious accessibility findings on each of the ${role}'s pages at ${size} size`, async () => {
        const consoleSaid: string[] = [];
        const accessibility: string[] = [];
        // Reduced motion: no button fades half way through while axe reads its colours.
        const ctx: BrowserContext = await browser.newContext({ viewport, reducedMotion: 'reduce' });
        const page = await ctx.newPage();
        const said = watchConsole(page);
        await signInAs(page, email);
        consoleSaid.push(...said.map((s) => `/signin → ${s}`));
        accessibility.push(...(await seriousAccessibilityFindings(page)).map((f) => `/ → ${f}`));
        for (const path of paths) {
          said.length = 0;
          await openPage(page, path);
          expect(page.url(), `${role} stays on ${path}`).toBe(`${baseUrl()}${LANDS_ON[path] ?? path}`);
          consoleSaid.push(...said.map((s) => `${path} → ${s}`));
          accessibility.push(...(await seriousAccessibilityFindings(page)).map((f) => `${path} → ${f}`));
        }
        await ctx.close();
        expect(consoleSaid).toEqual([]);
        expect(accessibility).toEqual([]);
      });
    }
  }
});
