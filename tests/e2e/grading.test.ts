import { readFileSync } from 'node:fs';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launchBrowser, shot, signInAs } from './browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const pathOf = (page: Page, size: string) => page.locator(`[data-testid="graded-set"] g[data-size="${size}"] path`).first().getAttribute('d');

describe('journey: the owner grades the demo style', () => {
  it('edits a grade rule, sees five sizes redraw, and downloads SVG and tiled PDF', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 }, acceptDownloads: true });
    await signInAs(page, 'owner@tamarind.example');
    await page.getByRole('link', { name: 'Pattern & grading' }).first().click();
    // With two demo styles the grading index lists them: wait for the list (or a direct redirect), then pick SR-101.
    const demo = page.getByRole('link', { name: /SR-101/ });
    await expect.poll(async () => /\/styles\/\d+\/grading$/.test(page.url()) || (await demo.isVisible().catch(() => false)), { timeout: 15_000 }).toBe(true);
    if (await demo.isVisible().catch(() => false)) await demo.click();
    await page.waitForURL(/\/styles\/\d+\/grading$/);
    const styleId = Number(/styles\/(\d+)\/grading/.exec(page.url())![1]);
    await expect.poll(() => page.locator('[data-testid="graded-set"] g[data-size]').count(), { timeout: 15_000 }).toBe(5);
    expect(await page.getByText('All clear').isVisible()).toBe(true);

    // Remember the rule to put it back afterwards (the e2e server is shared by every file).
    const before = await page.evaluate(async (id) => (await (await fetch(`/api/styles/${id}/grading`)).json()).grading, styleId);
    const front = before.pieces.find((p: { id: string }) => p.id === 'front');
    const hem = front.landmarks['side-hem'];
    const original = front.rules.find((r: { target: { kind: string; index?: number } }) => r.target.kind === 'vertex' && r.target.index === hem);

    await page.getByLabel('Grade point').selectOption(`v${hem}`);
    const lBefore = await pathOf(page, 'L');
    const xlBefore = await pathOf(page, 'XL');
    const mBefore = await pathOf(page, 'M');
    const across = page.getByLabel('Across M to L');
    const old = Number(await across.inputValue());
    await across.fill(String(old + 25));
    await page.getByRole('button', { name: 'Save grade rule' }).click();
    await expect.poll(() => pathOf(page, 'L'), { timeout: 15_000 }).not.toBe(lBefore);
    expect(await pathOf(page, 'XL')).not.toBe(xlBefore);
    expect(await pathOf(page, 'M')).toBe(mBefore);
    expect(await page.locator('[data-testid="graded-set"] g[data-size]').count()).toBe(5);
    await shot(page, 'grading-graded-set');

    const [svg] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'SVG (all sizes)' }).click()]);
    const svgText = readFileSync((await svg.path())!, 'utf8');
    expect(svgText.startsWith('<svg') || svgText.startsWith('<?xml')).toBe(true);
    expect(svgText).toMatch(/width="[\d.]+mm"/);
    for (const s of ['XS', 'S', 'M', 'L', 'XL']) expect(svgText).toContain(`data-size="${s}"`);

    const [pdf] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Print 1:1, A4' }).click()]);
    const bytes = readFileSync((await pdf.path())!);
    expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
    expect(bytes.length).toBeGreaterThan(2000);
    expect(pdf.suggestedFilename()).toMatch(/A4\.pdf$/);

    const restored = await page.evaluate(async ({ id, rule }) => {
      const r = await fetch(`/api/styles/${id}/grading/pieces/front/rules`, { method: 'PUT', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ target: rule.target, steps: rule.steps }) });
      return r.status;
    }, { id: styleId, rule: original });
    expect(restored).toBe(200);
    await page.close();
  });

  it('reads well on a phone', async () => {
    const ctx = await browser.newContext({ viewport: { width: 390, height: 844 } });
    const page = await ctx.newPage();
    await signInAs(page, 'owner@tamarind.example');
    await page.goto(`${baseUrl()}/styles/1/grading`);
    await expect.poll(() => page.locator('[data-testid="graded-set"] g[data-size]').count(), { timeout: 15_000 }).toBe(5);
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(1);
    await shot(page, 'grading-phone');
    await ctx.close();
  });

  it('shows the lined fitted dress built from blocks: its preset, options with defaults, a fabric per material and its pieces to scale', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signInAs(page, 'owner@tamarind.example');
    const styles = await page.evaluate(async () => (await (await fetch('/api/styles')).json()).styles as { id: number; code: string }[]);
    const lined = styles.find((s) => s.code === 'SR-202')!;
    await page.goto(`${baseUrl()}/styles/${lined.id}`);
    await expect.poll(() => page.locator('[data-testid="blocks-drawing"] g[data-piece]').count(), { timeout: 15_000 }).toBe(14);
    expect(await page.locator('[data-testid="style-blocks"] li').count()).toBe(7);
    expect(await page.getByLabel('Fabric for lining').locator('option:checked').textContent()).toBe('Usiku viscose lining');
    expect(await page.getByLabel('Fabric for contrast').locator('option:checked').textContent()).toBe('Tausi silk organza');
    expect(await page.locator('#b2-innerEdge\\.times').inputValue()).toBe('2');
    await shot(page, 'style-blocks-lined-dress');
    await page.close();
  });

  it('lists the lined dress\'s seams on its style page and lets the owner fix one, which Pattern & grading then checks', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signInAs(page, 'owner@tamarind.example');
    const styles = await page.evaluate(async () => (await (await fetch('/api/styles')).json()).styles as { id: number; code: string }[]);
    const lined = styles.find((s) => s.code === 'SR-202')!;
    await page.goto(`${baseUrl()}/styles/${lined.id}`);
    const seams = page.locator('[data-testid="style-seams"]');
    await expect.poll(() => seams.getByRole('cell', { name: 'Sleeve cap to armhole', exact: true }).count(), { timeout: 15_000 }).toBe(1);
    expect(await seams.getByRole('cell', { name: 'Side seam (lining)', exact: true }).count()).toBe(1);
    // Fix the side seam: pair the front's side with the back's shoulder by mistake, save, and see the check object.
    await seams.getByRole('row', { name: /^Side seam Bodice front: side/ }).getByRole('button', { name: 'Fix' }).click();
    await seams.getByLabel('Sewn to: edge').selectOption('shoulder');
    await seams.getByRole('button', { name: 'Save seams' }).click();
    await expect.poll(() => seams.getByText('Seams saved.').count(), { timeout: 10_000 }).toBe(1);
    await shot(page, 'style-seams-fixed');
    await page.goto(`${baseUrl()}/styles/${lined.id}/grading`);
    await expect.poll(() => page.locator('[data-testid="seam-report"] tr', { hasText: 'Side seam' }).first().getByText('error').count(), { timeout: 15_000 }).toBeGreaterThan(0);
    // Put the proposed seams back (the e2e server is shared by every file).
    await page.goto(`${baseUrl()}/styles/${lined.id}`);
    await page.locator('[data-testid="style-seams"]').getByRole('button', { name: 'Use the proposed seams again' }).click();
    await expect.poll(async () => (await page.evaluate(async (id) => (await (await fetch(`/api/styles/${id}`)).json()).style.composition.seams ?? null, lined.id)), { timeout: 10_000 }).toBeNull();
    await page.close();
  });
});
