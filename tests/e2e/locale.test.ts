import { inflateSync } from 'node:zlib';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { pdfText } from '../../exports/pdf/pdf-reader.testing';
import { readWorkbook } from '../../exports/xlsx/workbook-reader.testing';
import { baseUrl, launchBrowser, shot } from './browser';

/**
 * A studio set to inches and French, in Toronto: every main page, the costing workbook and a PDF speak French,
 * measure in inches and yards, and tell the time in Toronto. The demo studio is switched for this file and
 * switched back after (e2e files run one at a time).
 */
const ZONE = 'America/Toronto';
const PAGES: Record<string, { email: string; paths: string[] }> = {
  machinist: { email: 'machinist1@tamarind.example', paths: ['/', '/account'] },
  cutter: { email: 'cutter@tamarind.example', paths: ['/', '/lays/2', '/lays/1', '/fabrics', '/account'] },
  owner: {
    email: 'owner@tamarind.example',
    paths: ['/', '/batches', '/batches/new', '/styles', '/styles/new', '/styles/1', '/grading', '/styles/1/grading', '/fabrics', '/costing', '/outbox', '/settings', '/audit', '/account'],
  },
};

/** Common English words of the interface (never demo data such as style or fabric names). */
const ENGLISH_WORDS = [
  'Loading', 'Sign out', 'Sign in', 'Account', 'Today', 'Batches', 'Styles', 'People', 'Settings', 'Save', 'Cancel',
  'Hello', 'Good day', 'Earned', 'Pieces', 'Find bundle', 'Bundle number', 'Password', 'Language', 'Search', 'Filter',
  'garments', 'due in', 'In progress', 'Needs attention', 'Working day', 'Time zone', 'Units', 'Audit trail', 'When',
  'changed', 'created', 'Cost line', 'Unit cost', 'Bundle ticket', 'Shade lot', 'Pattern & grading', 'Markers', 'Costing',
  'Style details', 'Blocks and materials', 'Seam', 'Side seam', 'Style files', 'Upload', 'Size chart', 'Grade rule', 'Measurements per size',
  'Export CSV', 'Rolls', 'Add roll', 'Remove', 'Cut plan', 'Plan the cut', 'Fabric used', 'Lower bound', 'Bodice', 'Sleeve', 'Front facing',
];
const METRIC = /\d\s?(?:mm|cm|m|m²|cm²|metres?)(?![\p{L}\d])/u;
const englishIn = (text: string) => ENGLISH_WORDS.filter((w) => new RegExp(`(?<![\\p{L}])${w}(?![\\p{L}])`, 'u').test(text));

let browser: Browser;
let owner: Page;

async function signIn(page: Page, email: string) {
  await page.goto(`${baseUrl()}/signin`);
  await page.locator('#f-email').fill(email);
  await page.locator('#f-password').fill('seamrun-demo');
  await page.locator('form button[type="submit"]').click();
  await page.waitForURL(`${baseUrl()}/`);
}

async function open(page: Page, path: string) {
  await page.goto(`${baseUrl()}${path}`);
  await page.locator('main h1, main [role="alert"]').first().waitFor({ timeout: 20_000 });
  await page.waitForLoadState('networkidle');
  return page.locator('body').innerText();
}

/** A server PDF with its streams inflated, so its text can be read as the test helper reads uncompressed ones. */
function inflatePdf(pdf: Buffer): Buffer {
  const text = pdf.toString('latin1').replace(/stream\r?\n([\s\S]*?)\r?\nendstream/g, (whole, body: string) => {
    try {
      return `stream\n${inflateSync(Buffer.from(body, 'latin1')).toString('latin1')}\nendstream`;
    } catch {
      return whole;
    }
  });
  return Buffer.from(text, 'latin1');
}

/** A time as the French locale writes it (`11 h 32`) in a zone, for the instants around `at`. */
const frenchTimes = (at: number, zone: string) =>
  [-60_000, 0, 60_000].map((d) => new Intl.DateTimeFormat('fr-KE', { timeStyle: 'short', timeZone: zone }).format(at + d));

beforeAll(async () => {
  browser = await launchBrowser();
  owner = await (await browser.newContext({ viewport: { width: 1280, height: 900 } })).newPage();
  await signIn(owner, PAGES.owner.email);
  const res = await owner.request.patch(`${baseUrl()}/api/studio`, { data: { language: 'fr', unitSystem: 'imperial', timeZone: ZONE } });
  expect(res.status()).toBe(200);
});

afterAll(async () => {
  await owner?.request.patch(`${baseUrl()}/api/studio`, { data: { language: 'en', unitSystem: 'metric', timeZone: 'UTC' } });
  await browser?.close();
});

describe('a studio in inches and French, in Toronto', () => {
  for (const [role, { email, paths }] of Object.entries(PAGES)) {
    for (const [size, viewport] of Object.entries({ phone: { width: 390, height: 844 }, desktop: { width: 1280, height: 900 } })) {
      it(`shows the ${role} no metre, no English interface word and no UTC time on each main page at ${size} size`, async () => {
        const ctx = await browser.newContext({ viewport, locale: 'en-US' });
        const page = await ctx.newPage();
        await signIn(page, email);
        const found: string[] = [];
        for (const path of paths) {
          const text = await open(page, path);
          await shot(page, `fr-inches-${role}${path === '/' ? '' : path.replace(/\//g, '-')}-${size}`);
          for (const w of englishIn(text)) found.push(`${path}: English "${w}"`);
          const metric = METRIC.exec(text);
          if (metric) found.push(`${path}: metric "${metric[0]}"`);
          if (/\d{4}-\d{2}-\d{2}T\d{2}:\d{2}|\d{1,2}(?::| h )\d{2}\s?(?:UTC|GMT|Z)\b/.test(text)) found.push(`${path}: a raw or UTC time`);
          expect(await page.locator('html').getAttribute('lang')).toBe('fr');
        }
        await ctx.close();
        expect(found).toEqual([]);
      });
    }
  }

  it('tells the time of a change in the audit trail in Toronto, not in UTC', async () => {
    const at = Date.now();
    await owner.request.patch(`${baseUrl()}/api/studio`, { data: { workingDayHours: 8 } });
    const text = await open(owner, '/audit');
    const toronto = frenchTimes(at, ZONE);
    const utc = frenchTimes(at, 'UTC');
    expect(toronto.some((t) => text.includes(t)), `one of ${toronto.join(', ')} on the page`).toBe(true);
    expect(utc.filter((t) => text.includes(t))).toEqual([]);
  });

  it('writes the costing workbook in French, with fabric in yards', async () => {
    const res = await owner.request.get(`${baseUrl()}/api/batches/1/costing.xlsx`);
    expect(res.status()).toBe(200);
    const sheet = (await readWorkbook(Buffer.from(await res.body()))).worksheets[0];
    expect(sheet.name).toBe('Fiche de prix de revient');
    const rows: string[][] = [];
    sheet.eachRow((row) => rows.push((row.values as unknown[]).filter((v): v is string => typeof v === 'string')));
    const text = rows.map((r) => r.join(' | ')).join('\n');
    expect(englishIn(text)).toEqual([]);
    expect(text).toContain('verges');
    // Trims keep the unit the studio typed for them (interfacing by the metre); fabric lines and labels are checked.
    const fabricAndLabels = rows.filter((r) => !r.includes('Fourniture')).map((r) => r.join(' | ')).join('\n');
    expect(fabricAndLabels).not.toMatch(/\|\s*m\s*\||\bmètres?\b|\bmetres?\b/);
  });

  it('prints bundle tickets in French, in the studio date of Toronto', async () => {
    const res = await owner.request.get(`${baseUrl()}/api/batches/1/bundle-tickets.pdf`);
    expect(res.status()).toBe(200);
    const text = pdfText(inflatePdf(Buffer.from(await res.body())));
    expect(text).toContain('Ticket de paquet');
    expect(englishIn(text)).toEqual([]);
    expect(text).not.toMatch(METRIC);
    const today = new Intl.DateTimeFormat('fr-KE', { dateStyle: 'medium', timeZone: ZONE }).format(Date.now());
    expect(text).toContain(today);
  });
});
