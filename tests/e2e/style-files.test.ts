import { deflateSync } from 'node:zlib';
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

/** A real PNG (solid madder-red square), built here so the test carries no binary fixture. */
function png(size: number): Buffer {
  const crcTable = Array.from({ length: 256 }, (_, n) => {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    return c >>> 0;
  });
  const crc = (b: Buffer) => {
    let c = 0xffffffff;
    for (const x of b) c = crcTable[(c ^ x) & 0xff] ^ (c >>> 8);
    return (c ^ 0xffffffff) >>> 0;
  };
  const chunk = (type: string, data: Buffer) => {
    const t = Buffer.from(type, 'ascii');
    const len = Buffer.alloc(4);
    len.writeUInt32BE(data.length);
    const sum = Buffer.alloc(4);
    sum.writeUInt32BE(crc(Buffer.concat([t, data])));
    return Buffer.concat([len, t, data, sum]);
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(size, 0);
  ihdr.writeUInt32BE(size, 4);
  ihdr.set([8, 2, 0, 0, 0], 8);
  const row = Buffer.concat([Buffer.from([0]), Buffer.alloc(size * 3, Buffer.from([178, 74, 52]))]);
  const raw = Buffer.concat(Array.from({ length: size }, () => row));
  return Buffer.concat([Buffer.from([137, 80, 78, 71, 13, 10, 26, 10]), chunk('IHDR', ihdr), chunk('IDAT', deflateSync(raw)), chunk('IEND', Buffer.alloc(0))]);
}

describe('style files', () => {
  it('uploads a sketch to a style, shows it, refuses a file whose content is not a photo, and removes it', async () => {
    const ctx = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await ctx.newPage();
    await signInAs(page, 'owner@tamarind.example');
    await page.goto(`${baseUrl()}/styles/1`);
    await expect.poll(() => page.getByRole('heading', { name: 'Style files' }).isVisible()).toBe(true);

    await page.getByLabel('What it is').selectOption('sketch');
    await page.getByLabel('File', { exact: true }).setInputFiles({ name: 'sable-front.png', mimeType: 'image/png', buffer: png(64) });
    await page.getByRole('button', { name: 'Upload' }).click();
    const list = page.getByRole('list', { name: 'Files of this style' });
    await expect.poll(() => list.getByText('sable-front.png').isVisible()).toBe(true);
    await expect.poll(() => page.getByRole('img', { name: 'sketch: sable-front.png' }).evaluate((i: HTMLImageElement) => i.complete && i.naturalWidth)).toBe(64);

    // Named like a photo, but its content is text: the server judges by content and says so.
    await page.getByLabel('What it is').selectOption('photo');
    await page.getByLabel('File', { exact: true }).setInputFiles({ name: 'not-a-photo.jpg', mimeType: 'image/jpeg', buffer: Buffer.from('chest,waist\n92,74\n') });
    await page.getByRole('button', { name: 'Upload' }).click();
    await expect.poll(() => page.getByRole('alert').first().textContent()).toContain('Accepted for photo');
    await shot(page, 'owner-style-files');

    await list.getByRole('button', { name: 'Remove' }).first().click();
    await expect.poll(() => page.getByText('No files yet.').isVisible()).toBe(true);
    await ctx.close();
  });
});
