import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { polygonArea } from '@shared/geometry/polygon';
import { calibrationLayout } from '@shared/calibration/calibration-sheet';
import { loadOpenCvNode } from '../fixtures/opencv-node';
import { encodePng } from '../fixtures/png';
import { syntheticPhoto } from '../fixtures/synthetic-photo';
import { rectanglePiece } from '../fixtures/trace-shapes';
import { baseUrl, launchBrowser, shot, signInAs } from './browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe('journey: the owner traces a paper piece from a phone photo', () => {
  it('traces the synthetic photo in a worker, shows the outline, takes a grain line and adds the piece beside the style\'s pieces', async () => {
    const cv = await loadOpenCvNode();
    const truth = rectanglePiece();
    // A synthetic photo (no real one could be taken here): 150 × 200 mm piece on the A4 sheet, tilted camera.
    const photo = syntheticPhoto(cv, { layout: calibrationLayout('sheet', 'A4'), piece: truth, seed: 5, width: 1200, height: 1600 });
    const png = encodePng(photo.image);

    const page = await browser.newPage({ viewport: { width: 1280, height: 1000 } });
    page.on('pageerror', (e) => console.log('[pageerror]', e.message.slice(0, 300)));
    await signInAs(page, 'owner@tamarind.example');
    const styleId = await page.evaluate(async () => {
      const h = { 'Content-Type': 'application/json', 'X-Seamrun-Csrf': '1' };
      const s = await (await fetch('/api/styles', { method: 'POST', headers: h, body: JSON.stringify({ code: `PHO-${Date.now() % 100000}`, name: 'Traced yoke', sizeRun: ['S', 'M'], baseSize: 'M' }) })).json();
      await fetch(`/api/styles/${s.style.id}/grading/chart`, { method: 'PUT', headers: h, body: JSON.stringify({ name: 'Run', sizes: ['S', 'M'], rows: [{ pointOfMeasure: 'bust', values: [880, 920] }] }) });
      return s.style.id as number;
    });
    await page.goto(`${baseUrl()}/styles/${styleId}/grading`);
    await page.getByLabel('Photographed on').selectOption('sheet-A4');
    await page.getByLabel('Photo of the piece').setInputFiles({ name: 'yoke.png', mimeType: 'image/png', buffer: png });
    await page.locator('[data-testid="photo-trace"]').waitFor({ timeout: 60_000 });
    expect(await page.getByRole('group', { name: 'Traced outline over the photo' }).isVisible()).toBe(true);
    expect(await page.getByRole('button', { name: /^Corner 1/ }).count()).toBe(1);

    await page.getByLabel('Mark the grain line (two taps)').check();
    await page.getByTestId('photo-trace-canvas').scrollIntoViewIfNeeded();
    const box = (await page.getByTestId('photo-trace-canvas').boundingBox())!;
    await page.mouse.click(box.x + box.width / 2, box.y + box.height * 0.3);
    await page.mouse.click(box.x + box.width / 2, box.y + box.height * 0.7);
    await expect.poll(() => page.getByText('Grain line marked.').isVisible()).toBe(true);
    await page.getByLabel('Piece name').fill('Yoke');
    await page.getByLabel('Cut', { exact: true }).selectOption('pair');
    await page.getByLabel('Material').fill('Shell');
    await page.getByLabel('Seam allowance (mm)').fill('10');
    await page.getByLabel("The paper piece's edge is the").selectOption('sewing');
    await shot(page, 'pattern-photo-trace');
    await page.getByRole('button', { name: 'Add to the style’s pieces' }).click();
    await expect.poll(() => page.getByRole('tab', { name: 'Yoke' }).isVisible(), { timeout: 15_000 }).toBe(true);
    const stored = await page.evaluate(async (id) => (await (await fetch(`/api/styles/${id}/grading`)).json()).grading.pieces, styleId);
    const yoke = stored.find((p: { name: string }) => p.name === 'Yoke');
    expect(yoke.cut).toBe('pair');
    // The stored sewing line's area is the true 150 × 200 mm = 30 000 mm² within 1 % (the tracer's measured accuracy).
    const outline = yoke.bySize.M.outline as { x: number; y: number }[];
    expect(Math.abs(polygonArea(outline) - polygonArea(truth)) / polygonArea(truth)).toBeLessThan(0.01);
  }, 240_000);
});
