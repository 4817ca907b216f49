import type { APIRequestContext, Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { can, type Permission, type Role } from '../../shared/auth/permissions';
import { paths } from '../../src/config/paths';
import { readWorkbook } from '../../exports/xlsx/workbook-reader.testing';
import { findingsIn, pdfWords, workbookWords } from '../fixtures/locale-findings';
import { baseUrl, launchBrowser, shot } from './browser';

/**
 * A studio set to inches and French, in Toronto: every page of every role, and every document the studio prints
 * or opens, speak French, measure in inches and yards and tell the time in Toronto. The demo studio is switched
 * for this file and switched back after (e2e files run one at a time). Each walk reports every finding (page or
 * document, and the English word or metric figure) in one assertion.
 */
const ZONE = 'America/Toronto';
const PEOPLE: Record<Role, string> = {
  owner: 'owner@tamarind.example',
  cutter: 'cutter@tamarind.example',
  machinist: 'machinist1@tamarind.example',
  finisher: 'finisher1@tamarind.example',
};

/** Every page of the client (src/config/paths.ts and the areas' manifests), with the demo's records, and who may open it. */
const PAGES: { path: string; permission?: Permission }[] = [
  { path: paths.home.getHref() },
  { path: paths.account.getHref() },
  { path: paths.styles.getHref(), permission: 'styles:write' },
  { path: paths.newStyle.getHref(), permission: 'styles:write' },
  { path: paths.style.getHref(1), permission: 'styles:write' },
  { path: paths.batches.getHref(), permission: 'batches:write' },
  { path: paths.newBatch.getHref(), permission: 'batches:write' },
  { path: paths.batch.getHref(1), permission: 'batches:write' },
  { path: paths.people.getHref(), permission: 'people:manage' },
  { path: paths.settings.getHref(), permission: 'studio:manage' },
  { path: paths.audit.getHref(), permission: 'audit:read' },
  { path: paths.grading.getHref(), permission: 'grading:write' },
  { path: paths.styleGrading.getHref(1), permission: 'grading:read' },
  { path: paths.markers.getHref(), permission: 'markers:write' },
  { path: paths.fabrics.getHref(), permission: 'fabric:read' },
  { path: paths.lay.getHref(2), permission: 'cutting:work' },
  { path: paths.line.getHref(1), permission: 'line:plan' },
  { path: paths.floor.getHref(1), permission: 'progress:read' },
  { path: paths.pay.getHref(), permission: 'pay:manage' },
  { path: paths.costing.getHref(), permission: 'costs:read' },
  { path: paths.batchCosting.getHref(1), permission: 'costs:read' },
  { path: paths.purchasing.getHref(), permission: 'suppliers:manage' },
  { path: paths.outbox.getHref(), permission: 'suppliers:manage' },
];

/**
 * Pages whose screens are still being translated (src/features/**, by other hands): walked in a skipped test
 * so their findings are one command away. The lead empties this list once those translations are merged.
 */
const PAGES_STILL_MOVING = new Set<string>([]);

const SIZES = { phone: { width: 390, height: 844 }, desktop: { width: 1280, height: 900 } };
const pagesOf = (role: Role, moving: boolean) =>
  PAGES.filter((p) => (!p.permission || can(role, p.permission)) && PAGES_STILL_MOVING.has(p.path) === moving).map((p) => p.path);

let browser: Browser;
let owner: Page;
/** Names the studio's records carry (the demo style's piece names, drafted in English), left out of the findings. */
const records: string[] = [];

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

/** Every finding on each page of `paths` for one person at one size. */
async function walk(role: Role, size: keyof typeof SIZES, pagePaths: string[]): Promise<string[]> {
  const ctx = await browser.newContext({ viewport: SIZES[size], locale: 'en-US' });
  const page = await ctx.newPage();
  await signIn(page, PEOPLE[role]);
  const found: string[] = [];
  for (const path of pagePaths) {
    try {
      const text = await open(page, path);
      await shot(page, `fr-inches-${role}${path === '/' ? '' : path.replace(/[/?=]/g, '-')}-${size}`);
      found.push(...findingsIn(path, text, records));
      const lang = await page.locator('html').getAttribute('lang');
      if (lang !== 'fr') found.push(`${path}: <html lang="${lang}">`);
    } catch (e) {
      found.push(`${path}: did not open (${(e as Error).message.split('\n')[0]})`);
    }
  }
  await ctx.close();
  return found;
}

/** A time as the French locale writes it (`11 h 32`) in a zone, for the instants around `at`. */
const frenchTimes = (at: number, zone: string) =>
  [-60_000, 0, 60_000].map((d) => new Intl.DateTimeFormat('fr-KE', { timeStyle: 'short', timeZone: zone }).format(at + d));

/** The records each document needs (a finished marker, a purchase order, a pay period): the demo's, else made now. */
async function documentPaths(api: APIRequestContext): Promise<Record<string, string>> {
  const get = async (path: string) => (await api.get(`${baseUrl()}${path}`)).json();
  const post = async (path: string, data: unknown) => (await api.post(`${baseUrl()}${path}`, { data })).json();
  let marker = ((await get('/api/markers')).markers as { id: number; status: string }[]).find((m) => m.status === 'done');
  if (!marker) {
    const started = (await post('/api/markers', { styleId: 1, batchId: 1, fabricId: 1, ratio: { S: 1, M: 1 }, seconds: 1 })).marker;
    for (let i = 0; i < 240 && (!marker || marker.status === 'queued' || marker.status === 'running'); i++) {
      await new Promise((r) => setTimeout(r, 500));
      marker = (await get(`/api/markers/${started.id}?drawing=false`)).marker;
    }
  }
  let order = (await get('/api/purchasing/orders')).orders[0];
  if (!order) {
    const { items } = await get('/api/purchasing/items');
    // The fabric from its own supplier, as the owner would order it: other journeys may then find this order as theirs.
    const fabric = items.find((i: { kind: string }) => i.kind === 'fabric') as { kind: string; refId: number; supplierId: number | null };
    const supplierId = fabric.supplierId ?? (await get('/api/purchasing/suppliers')).suppliers[0].id;
    const lines = [{ kind: fabric.kind, refId: fabric.refId, quantity: 29_950 }];
    order = (await post('/api/purchasing/orders', { supplierId, batchId: 1, lines })).order;
  }
  // The pay sheet is checked when another journey has approved a period; approving one here would close days
  // another journey pays (tests/integration/document-words.api.test.ts checks the pay sheet in French regardless).
  const period = (await get('/api/pay/periods')).periods[0] as { id: number } | undefined;
  const grading = (await get('/api/styles/1/grading')).grading;
  records.push(...(grading.pieces as { name: string }[]).map((p) => p.name));
  const style = (await get('/api/styles/1')).style;
  const material = Object.keys(style.materialFabrics ?? {})[0] ?? 'self';
  return {
    'cut ticket': '/api/lays/2/cut-ticket.pdf',
    'material cut ticket': `/api/batches/1/material-cut-ticket.pdf?material=${encodeURIComponent(material)}`,
    'bundle tickets': '/api/batches/1/bundle-tickets.pdf',
    'bundle register': '/api/batches/1/bundle-register.xlsx',
    'marker list (PDF)': '/api/batches/1/marker-list.pdf',
    'marker list (XLSX)': '/api/batches/1/marker-list.xlsx',
    'marker plot': `/api/markers/${marker?.id}/plot.pdf`,
    'purchase order': `/api/purchasing/orders/${order?.id}/xlsx`,
    ...(period ? { 'pay sheet': `/api/pay/periods/${period.id}/sheet.xlsx` } : {}),
    'costing sheet': '/api/batches/1/costing.xlsx',
    'calibration sheet': '/api/styles/1/pattern/calibration-sheet?kind=sheet&paper=Letter',
    'border frame': '/api/styles/1/pattern/calibration-sheet?kind=border&paper=Letter',
  };
}
let documents: Record<string, string>;

beforeAll(async () => {
  browser = await launchBrowser();
  owner = await (await browser.newContext({ viewport: SIZES.desktop })).newPage();
  await signIn(owner, PEOPLE.owner);
  const res = await owner.request.patch(`${baseUrl()}/api/studio`, { data: { language: 'fr', unitSystem: 'imperial', timeZone: ZONE } });
  expect(res.status()).toBe(200);
  documents = await documentPaths(owner.request);
}, 180_000);

afterAll(async () => {
  await owner?.request.patch(`${baseUrl()}/api/studio`, { data: { language: 'en', unitSystem: 'metric', timeZone: 'UTC' } });
  await browser?.close();
});

describe('a studio in inches and French, in Toronto', () => {
  for (const role of Object.keys(PEOPLE) as Role[]) {
    for (const size of Object.keys(SIZES) as (keyof typeof SIZES)[]) {
      const walked = pagesOf(role, false);
      it(`shows the ${role} no metre, no English interface word and no UTC time on any page at ${size} size (${walked.length} pages)`, async () => {
        expect(await walk(role, size, walked)).toEqual([]);
      }, 300_000);
      const moving = pagesOf(role, true);
      // Skipped until the screens' translations land (src/features/**): run it to list what they still show.
      it.skipIf(moving.length === 0 || !process.env.LOCALE_WALK_MOVING)(
        `lists what the ${role}'s pages still moving show at ${size} size (${moving.length} pages; skipped: their translations are in progress elsewhere, set LOCALE_WALK_MOVING=1 to run)`,
        async () => {
          expect(await walk(role, size, moving)).toEqual([]);
        },
        300_000,
      );
    }
  }

  it('writes every document (PDF and workbook) in French, in yards and inches, with no UTC time', async () => {
    const found: string[] = [];
    for (const [name, path] of Object.entries(documents)) {
      const res = await owner.request.get(`${baseUrl()}${path}`);
      if (res.status() !== 200) {
        found.push(`${name}: ${res.status()} ${(await res.text()).slice(0, 200)}`);
        continue;
      }
      const body = Buffer.from(await res.body());
      const text = res.headers()['content-type']?.includes('pdf') ? pdfWords(body) : await workbookWords(body);
      found.push(...findingsIn(name, text, records));
    }
    expect(found).toEqual([]);
  }, 120_000);

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
    expect(findingsIn('costing sheet', text, records).filter((f) => f.includes('English'))).toEqual([]);
    expect(text).toContain('verges');
    // Trims keep the unit the studio typed for them (interfacing by the metre); fabric lines and labels are checked.
    const fabricAndLabels = rows.filter((r) => !r.includes('Fourniture')).map((r) => r.join(' | ')).join('\n');
    expect(fabricAndLabels).not.toMatch(/\|\s*m\s*\||\bmètres?\b|\bmetres?\b/);
  });

  it('prints bundle tickets in French, in the studio date of Toronto', async () => {
    const res = await owner.request.get(`${baseUrl()}/api/batches/1/bundle-tickets.pdf`);
    expect(res.status()).toBe(200);
    const text = pdfWords(Buffer.from(await res.body()));
    expect(text).toContain('Ticket de paquet');
    expect(findingsIn('bundle tickets', text, records)).toEqual([]);
    const today = new Intl.DateTimeFormat('fr-KE', { dateStyle: 'medium', timeZone: ZONE }).format(Date.now());
    expect(text).toContain(today);
  });
});
