import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import QRCode from 'qrcode';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, shot, signInAs } from './browser';

const PHONE = { width: 390, height: 844 };
let browser: Browser;
let dir: string;

/** A still camera feed (Y4M, 4:2:0, grey) showing the bundle ticket QR `text`, for Chromium's fake camera. */
function qrVideo(text: string, file: string) {
  const W = 480, H = 480, scale = 10;
  const qr = QRCode.create(text, { errorCorrectionLevel: 'M' }).modules;
  const y = Buffer.alloc(W * H, 235);
  const side = qr.size * scale;
  const x0 = (W - side) >> 1, y0 = (H - side) >> 1;
  for (let r = 0; r < qr.size; r++)
    for (let c = 0; c < qr.size; c++)
      if (qr.get(r, c)) for (let dy = 0; dy < scale; dy++) y.fill(16, (y0 + r * scale + dy) * W + x0 + c * scale, (y0 + r * scale + dy) * W + x0 + (c + 1) * scale);
  const uv = Buffer.alloc((W / 2) * (H / 2) * 2, 128);
  const frame = Buffer.concat([Buffer.from('FRAME\n'), y, uv]);
  writeFileSync(file, Buffer.concat([Buffer.from(`YUV4MPEG2 W${W} H${H} F10:1 Ip A1:1 C420jpeg\n`), frame, frame, frame]));
}

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'seamrun-floor-e2e-'));
  const video = join(dir, 'ticket.y4m');
  qrVideo('SR-B:1:2', video);
  // Debian's Chromium with a fake camera that films the bundle ticket (same flags as browser.ts, plus the camera).
  browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: [
      '--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update',
      '--disable-sync', '--no-first-run', '--disable-quic',
      '--use-fake-device-for-media-stream', '--use-fake-ui-for-media-stream', `--use-file-for-fake-video-capture=${video}`,
    ],
  });
});
afterAll(async () => {
  await browser?.close();
  rmSync(dir, { recursive: true, force: true });
});

async function pinSignIn(page: Page, email: string, pin: string) {
  await page.goto(`${baseUrl()}/signin`);
  await page.getByRole('tab', { name: 'Floor PIN' }).click();
  await page.getByLabel('Email').fill(email);
  await page.getByLabel('PIN').fill(pin);
  await page.getByRole('button', { name: 'Sign in with PIN' }).click();
  await page.waitForURL(`${baseUrl()}/`);
}

const progressOf = (page: Page) =>
  page.evaluate(async () => (await (await fetch('/api/floor/progress/1')).json()).progress as { operations: { operationId: number; bundlesDone: number }[] });

describe('journey: a machinist logs a bundle from a phone and the owner sees it move', () => {
  it('signs in with a PIN, logs by typed number, sees today’s count, is refused a second log; the owner sees progress and approves pay', async () => {
    const ownerCtx = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const owner = await ownerCtx.newPage();
    await signInAs(owner, 'owner@tamarind.example');
    const before = await progressOf(owner);

    const ctx = await browser.newContext({ viewport: PHONE, hasTouch: true, isMobile: true });
    const page = await ctx.newPage();
    await pinSignIn(page, 'machinist1@tamarind.example', '4011');
    await expect.poll(() => page.getByRole('heading', { name: 'Hello, Achieng' }).isVisible()).toBe(true);
    await expect.poll(async () => /^\d+$/.test((await page.getByTestId('today-ops').textContent()) ?? '')).toBe(true);
    const opsBefore = Number(await page.getByTestId('today-ops').textContent());
    await shot(page, 'floor-phone-home');

    await page.getByLabel('Bundle number').fill('3');
    await page.getByRole('button', { name: 'Find bundle' }).click();
    await expect.poll(() => page.getByText('Bundle 3 · size').isVisible()).toBe(true);
    // With two or more of her operations open, nothing is chosen for her: the button asks her to pick.
    await expect.poll(() => page.getByRole('button', { name: 'Pick the operation you did' }).isDisabled()).toBe(true);
    await page.locator('input[name="operation"]').first().check();
    const picked = page.locator('input[name="operation"]:checked');
    const opLabel = (await picked.getAttribute('aria-label'))!;
    await shot(page, 'floor-phone-typed-bundle');
    await page.getByRole('button', { name: 'Log done' }).click();
    const confirmation = page.getByRole('status', { name: 'Logged' });
    await expect.poll(() => confirmation.isVisible()).toBe(true);
    const confirmText = (await confirmation.textContent())!;
    expect(confirmText).toContain('Bundle 3');
    expect(confirmText).toContain(opLabel);
    expect(confirmText).toMatch(/\d+ pieces? · pays Ksh/);
    await expect.poll(async () => Number(await page.getByTestId('today-ops').textContent())).toBe(opsBefore + 1);
    await shot(page, 'floor-phone-logged');

    // The same operation again: refused with who logged it.
    await page.getByRole('radio', { name: opLabel }).check();
    await page.getByRole('button', { name: 'Log done' }).click();
    await expect.poll(() => page.getByRole('alert').textContent()).toContain('already logged by Achieng Mwende');
    await shot(page, 'floor-phone-refused');

    // Scanning: the fake camera films the ticket of bundle 2.
    await page.getByRole('button', { name: 'Scan the ticket’s QR code' }).click();
    await expect.poll(() => page.getByText('Bundle 2 · size').isVisible(), { timeout: 20_000 }).toBe(true);
    await shot(page, 'floor-phone-scanned-bundle');
    await page.locator('input[name="operation"]').first().check();
    await page.getByRole('button', { name: 'Log done' }).click();
    await expect.poll(() => page.getByRole('status', { name: 'Logged' }).textContent()).toContain('Bundle 2');
    await shot(page, 'floor-phone-scanned-logged');

    // The network drops: the log waits on the phone with its key, and goes once the network is back.
    await page.getByLabel('Bundle number').fill('3');
    await page.getByRole('button', { name: 'Find bundle' }).click();
    await expect.poll(() => page.getByText('Bundle 3 · size').isVisible()).toBe(true);
    const opsOnline = Number(await page.getByTestId('today-ops').textContent());
    // An operation nobody has logged on this bundle yet.
    // A sewing operation nobody has logged on this bundle yet (the demo has three bundles).
    await page.locator('label:has-text("sewing"):not(:has-text("Done by")) input[name="operation"]').first().check();
    await ctx.setOffline(true);
    await page.getByRole('button', { name: 'Log done' }).click();
    await expect.poll(() => page.getByText(/No network: bundle 3 .* saved on this phone/).isVisible()).toBe(true);
    await expect.poll(() => page.getByText('1 log waiting on this phone for the network.').isVisible()).toBe(true);
    expect(await page.evaluate(() => JSON.parse(localStorage.getItem('seamrun.floor.outbox') ?? '[]').length)).toBe(1);
    await shot(page, 'floor-phone-offline-queued');
    await ctx.setOffline(false);
    await expect.poll(() => page.getByText('1 log waiting on this phone for the network.').isVisible(), { timeout: 20_000 }).toBe(false);
    expect(await page.evaluate(() => JSON.parse(localStorage.getItem('seamrun.floor.outbox') ?? '[]').length)).toBe(0);
    await page.reload();
    await expect.poll(async () => Number(await page.getByTestId('today-ops').textContent()), { timeout: 20_000 }).toBe(opsOnline + 1);
    await ctx.close();

    const after = await progressOf(owner);
    const done = (p: typeof before) => p.operations.reduce((a, o) => a + o.bundlesDone, 0);
    // Bundles 3 and 2, and bundle 3 again, sent after the network came back: three logs, none doubled.
    expect(done(after)).toBe(done(before) + 3);
    await owner.getByRole('link', { name: 'Floor' }).click();
    await expect.poll(() => owner.getByRole('heading', { name: 'Floor progress' }).isVisible()).toBe(true);
    await expect.poll(() => owner.getByText('Work in progress per operation').isVisible()).toBe(true);
    await shot(owner, 'floor-owner-progress');

    // The owner records where Achieng is paid; a bad account id is refused with the reason.
    await owner.getByRole('link', { name: 'People' }).click();
    const account = owner.getByLabel('Payments account of Achieng Mwende');
    await account.fill('acct 1');
    await owner.getByRole('button', { name: 'Save', exact: true }).click();
    await expect.poll(() => owner.getByRole('alert').first().textContent()).toContain('Letters, digits and _ only');
    await account.fill('acct_1AchiengDemo');
    await owner.getByRole('button', { name: 'Save', exact: true }).click();
    await expect.poll(() => owner.getByRole('button', { name: 'Save', exact: true }).count()).toBe(0);
    await owner.reload();
    await expect.poll(() => owner.getByLabel('Payments account of Achieng Mwende').inputValue()).toBe('acct_1AchiengDemo');
    await shot(owner, 'owner-people-payments-account');

    await owner.getByRole('link', { name: 'Pay' }).click();
    await expect.poll(() => owner.getByText('Test payments: no money moves.').isVisible()).toBe(true);
    await expect.poll(() => owner.getByRole('table', { name: 'Pay preview' }).textContent()).toContain('Achieng Mwende');
    // Today's work only: another journey may have approved the days before (a period closes its days).
    await owner.getByLabel('From', { exact: true }).fill(new Date().toISOString().slice(0, 10));
    await expect.poll(() => owner.getByRole('table', { name: 'Pay preview' }).textContent()).toContain('Achieng Mwende');
    // Approve and Pay each ask first, with the amount, and act only on "Yes".
    await owner.getByRole('button', { name: 'Approve pay period' }).click();
    await expect.poll(() => owner.getByRole('group', { name: 'Confirm: Approve pay period' }).textContent()).toMatch(/Approve \d+ (person|people), Ksh/);
    await owner.getByRole('button', { name: 'Yes, approve' }).click();
    const payout = owner.getByRole('listitem', { name: 'Payout Achieng Mwende' });
    await expect.poll(() => payout.isVisible()).toBe(true);
    await payout.getByRole('button', { name: 'Pay', exact: true }).click();
    await expect.poll(() => payout.getByRole('group', { name: 'Confirm: Pay' }).textContent()).toContain('Pay Achieng Mwende Ksh');
    await payout.getByRole('button', { name: 'Yes, pay' }).click();
    await expect.poll(() => payout.textContent(), { timeout: 20_000 }).toContain('Reference tr_');
    expect(await payout.textContent()).not.toContain('not paid');
    await shot(owner, 'floor-owner-pay');
    await ownerCtx.close();
  });
});

async function signOutOnPhone(page: Page) {
  await page.getByRole('button', { name: 'Menu' }).click();
  await page.getByRole('button', { name: 'Sign out' }).click();
}

const outboxOf = (page: Page) =>
  page.evaluate(() => JSON.parse(localStorage.getItem('seamrun.floor.outbox') ?? '[]') as { authorId?: number; input: { idempotencyKey: string } }[]);

describe('journey: a shared phone never credits one machinist’s waiting log to the next', () => {
  it('keeps Imani’s unsent log through her sign-out, does not send it under Faraji, and sends it as hers when she signs in again', async () => {
    const ctx = await browser.newContext({ viewport: PHONE, hasTouch: true, isMobile: true });
    const page = await ctx.newPage();
    await pinSignIn(page, 'machinist3@tamarind.example', '4013');
    await expect.poll(() => page.getByRole('heading', { name: 'Hello, Imani' }).isVisible()).toBe(true);
    await expect.poll(async () => /^\d+$/.test((await page.getByTestId('today-ops').textContent()) ?? '')).toBe(true);
    const imaniBefore = Number(await page.getByTestId('today-ops').textContent());
    const imaniId = await page.evaluate(async () => (await (await fetch('/api/auth/me')).json()).user.id as number);

    // The server cannot be reached for logs (the phone still thinks it is online): the log waits on the phone.
    await page.route('**/api/floor/logs', (route) => route.abort('internetdisconnected'));
    await page.getByLabel('Bundle number').fill('3');
    await page.getByRole('button', { name: 'Find bundle' }).click();
    await expect.poll(() => page.getByText('Bundle 3 · size').isVisible()).toBe(true);
    // A sewing operation nobody has logged on this bundle yet (the demo has three bundles).
    await page.locator('label:has-text("sewing"):not(:has-text("Done by")) input[name="operation"]').first().check();
    await page.getByRole('button', { name: 'Log done' }).click();
    await expect.poll(() => page.getByText('1 log waiting on this phone for the network.').isVisible()).toBe(true);
    const queued = await outboxOf(page);
    expect(queued).toHaveLength(1);
    expect(queued[0].authorId).toBe(imaniId);

    // Signing out says the log is still waiting and keeps it for her.
    await signOutOnPhone(page);
    const warning = page.getByRole('alertdialog', { name: 'Before you sign out' });
    await expect.poll(() => warning.textContent()).toContain('1 log you made is still waiting for the network');
    await shot(page, 'floor-phone-sign-out-waiting-log');
    await page.getByRole('button', { name: 'Sign out and keep them on this phone' }).click();
    await page.waitForURL(`${baseUrl()}/signin`);
    expect(await outboxOf(page)).toHaveLength(1);

    // The server is reachable again and Faraji signs in on the same phone: Imani's log is not sent as his.
    await page.unroute('**/api/floor/logs');
    await pinSignIn(page, 'machinist4@tamarind.example', '4014');
    await expect.poll(() => page.getByRole('heading', { name: 'Hello, Faraji' }).isVisible()).toBe(true);
    await expect.poll(() => page.getByText('1 log waiting for Imani Wairimu').isVisible()).toBe(true);
    await page.waitForTimeout(1500);
    expect(await outboxOf(page)).toHaveLength(1);
    const farajiToday = await page.evaluate(async () => (await (await fetch('/api/floor/me/today')).json()) as { logs: { bundleNumber: number }[] });
    expect(farajiToday.logs.filter((l) => l.bundleNumber === 3)).toEqual([]);
    await shot(page, 'floor-phone-other-persons-log-kept');
    await signOutOnPhone(page);
    await page.waitForURL(`${baseUrl()}/signin`);

    // Imani signs in again: her log goes, under her name.
    await pinSignIn(page, 'machinist3@tamarind.example', '4013');
    await expect.poll(async () => (await outboxOf(page)).length, { timeout: 20_000 }).toBe(0);
    await page.reload();
    await expect.poll(async () => Number(await page.getByTestId('today-ops').textContent()), { timeout: 20_000 }).toBe(imaniBefore + 1);
    await ctx.close();
  });
});

describe('journey: the owner makes a tablet the floor tablet; a finisher signs in with a name and a PIN', () => {
  it('binds the tablet on the People page, then lists names without e-mails and signs Makena in with only her PIN', async () => {
    const ctx = await browser.newContext({ viewport: { width: 820, height: 1180 }, hasTouch: true });
    const page = await ctx.newPage();
    await signInAs(page, 'owner@tamarind.example');
    await page.getByRole('link', { name: 'People' }).click();
    await page.getByRole('button', { name: 'Use this device as the floor tablet' }).click();
    await expect.poll(() => page.getByRole('button', { name: 'Stop using this device as the floor tablet' }).isVisible()).toBe(true);
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(`${baseUrl()}/signin`);

    const who = page.getByRole('radiogroup', { name: 'Who are you?' });
    await expect.poll(() => who.isVisible()).toBe(true);
    expect(await who.textContent()).toContain('Makena Atieno');
    expect(await page.locator('body').textContent()).not.toContain('@tamarind.example');
    await who.getByRole('radio', { name: 'Makena Atieno' }).click();
    await shot(page, 'floor-tablet-pick-name');
    for (const d of '4021') await page.getByRole('button', { name: d, exact: true }).click();
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.waitForURL(`${baseUrl()}/`);
    await expect.poll(() => page.getByRole('heading', { name: 'Hello, Makena' }).isVisible()).toBe(true);
    await ctx.close();
  });
});
