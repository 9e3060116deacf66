/**
 * The desktop app's bar for data actions, in real Chromium: the page gets a stand-in for the preload's
 * `window.coilwright` whose API goes to the web transport and whose data actions the test drives, playing
 * main's part (progress messages, the outcome). main's own side is tested with the mocked electron module.
 */
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DataActionEvent } from '../../core/api/method-names';
import { UI_TEST_TIMEOUT, launch, openPage, screenshot, startShop } from './support';
import type { Shop } from './support';

interface FakeShell {
  calls: [string, unknown][];
  cancels: string[];
  /** API methods called through the bridge, in order. */
  methods: string[];
  /** Holds every printTraveller call until release(). */
  holdPrints(): void;
  release(): void;
  emit(event: DataActionEvent): void;
  finish(value: unknown): void;
}

/** Runs in the page before the app: the preload's bridge, with main replaced by the test. */
function installFakeShell(): void {
  const listeners = new Set<(event: unknown) => void>();
  let pending: ((result: unknown) => void) | null = null;
  let held: Promise<void> | null = null;
  let release = () => undefined as void;
  const fake = {
    calls: [] as [string, unknown][],
    cancels: [] as string[],
    methods: [] as string[],
    holdPrints: () => { held = new Promise<void>((resolve) => { release = resolve; }); },
    release: () => { release(); held = null; },
    emit: (event: unknown) => { for (const l of listeners) l(event); },
    finish: (value: unknown) => { pending?.({ ok: true, value }); pending = null; },
  };
  const api = new Proxy({}, {
    get: (_target, name) => (typeof name !== 'string' ? undefined : async (input: unknown) => {
      fake.methods.push(name);
      if (name === 'printTraveller' && held) await held;
      const r = await fetch(`/api/${name}`, {
        method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(input ?? {}), credentials: 'same-origin',
      });
      return r.json();
    }),
  });
  Object.assign(window, {
    fakeShell: fake,
    coilwright: {
      api,
      onMenuCommand: () => () => undefined,
      previewPdf: async () => ({ ok: true, value: { opened: true } }),
      savePdf: async () => ({ ok: true, value: { saved: null } }),
      openRequestSheet: async () => ({ ok: true, value: null }),
      runDataAction: (name: string, options?: unknown) => {
        fake.calls.push([name, options ?? null]);
        return new Promise((resolve) => { pending = resolve; });
      },
      onDataProgress: (callback: (event: unknown) => void) => {
        listeners.add(callback);
        return () => { listeners.delete(callback); };
      },
      cancelDataAction: async (name: string) => {
        fake.cancels.push(name);
        return { ok: true, value: { cancelled: true } };
      },
    },
  });
}

const shell = <T>(page: Page, read: (fake: FakeShell) => T): Promise<T> =>
  page.evaluate(`(${read.toString()})(window.fakeShell)`) as Promise<T>;
const emit = (page: Page, event: DataActionEvent) => page.evaluate((e) => (window as unknown as { fakeShell: FakeShell }).fakeShell.emit(e), event);
const finish = (page: Page, value: unknown) => page.evaluate((v) => (window as unknown as { fakeShell: FakeShell }).fakeShell.finish(v), value);

describe('Data actions in the desktop app', { timeout: UI_TEST_TIMEOUT }, () => {
  let shop: Shop;
  let browser: Browser;
  let page: Page;
  let errors: string[];

  beforeAll(async () => {
    shop = await startShop();
    browser = await launch();
    ({ page, errors } = await openPage(browser, shop.web.url, installFakeShell));
  });
  afterAll(async () => {
    await browser?.close();
    await shop?.close();
  });

  it('shows the export main runs with how far it is, and its Cancel stops it in main', async () => {
    await page.keyboard.press('Alt+4');
    await page.getByText('Files are chosen in the system’s own dialogs').waitFor();
    await page.getByLabel('Format').selectOption('csv');
    await page.getByLabel('Jobs', { exact: true }).selectOption('quoted');
    await page.getByRole('button', { name: 'Export…' }).click();
    expect(await shell(page, (f) => f.calls)).toEqual([['exportJobs', { format: 'csv', status: 'quoted' }]]);

    await emit(page, { action: 'exportJobs', from: 'window', state: 'running', done: 120, total: 400, cancellable: true });
    const bar = page.getByRole('progressbar', { name: 'Exporting…' });
    await page.getByText('Exporting… — 30 %').waitFor();
    expect(await bar.evaluate((b) => [(b as HTMLProgressElement).value, (b as HTMLProgressElement).max])).toEqual([120, 400]);
    // Started from the screen, it shows in its panel only, not in the File menu's bar as well.
    expect(await page.getByRole('region', { name: 'Data action' }).count()).toBe(0);
    await page.getByRole('heading', { name: 'Export jobs' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'desktop-export-progress');

    // Left while it runs, the Data screen's export shows in the bar above the screen, Cancel included.
    await page.keyboard.press('Alt+1');
    await emit(page, { action: 'exportJobs', from: 'window', state: 'running', done: 200, total: 400, cancellable: true });
    const strip = page.getByRole('region', { name: 'Data action' });
    await strip.getByText('Exporting… — 50 %').waitFor();
    await page.keyboard.press('Alt+4');
    await strip.waitFor({ state: 'detached' });
    await finish(page, { finished: 'exportJobs', outcome: 'done', message: 'Exported 4 jobs: /home/shop/quoted.csv' });
    await page.getByRole('button', { name: 'Export…' }).click();
    await emit(page, { action: 'exportJobs', from: 'window', state: 'running', done: 120, total: 400, cancellable: true });
    await page.getByRole('button', { name: 'Cancel' }).click();
    expect(await shell(page, (f) => f.cancels)).toEqual(['exportJobs']);
    await finish(page, { finished: 'exportJobs', outcome: 'cancelled', message: 'Export cancelled: nothing was saved.' });
    await emit(page, { action: 'exportJobs', from: 'window', state: 'ended', outcome: 'cancelled', message: 'Export cancelled: nothing was saved.' });
    await page.getByRole('alert').filter({ hasText: 'Export cancelled: nothing was saved.' }).waitFor();
    expect(await bar.count()).toBe(0);
    await expect(page.getByRole('button', { name: 'Export…' }).isEnabled()).resolves.toBe(true);
    expect(errors).toEqual([]);
  });

  it('does not bring the Data screen\'s finished action back in the bar on another screen', async () => {
    await page.keyboard.press('Alt+1');
    await page.getByRole('heading', { name: 'Jobs', level: 1 }).waitFor();
    expect(await page.getByRole('region', { name: 'Data action' }).count()).toBe(0);
    await page.keyboard.press('Alt+4');
  });

  it('imports through main\'s open dialog with the renumber choice, and says what main did', async () => {
    await page.getByLabel('Give imported jobs new numbers from this shop’s sequence').uncheck();
    await page.getByRole('button', { name: 'Import…' }).click();
    expect((await shell(page, (f) => f.calls)).at(-1)).toEqual(['importJobs', { renumber: false }]);
    await emit(page, { action: 'importJobs', from: 'window', state: 'running', done: 0, total: 0, cancellable: true });
    await page.getByText('Importing…', { exact: true }).waitFor();
    await finish(page, { finished: 'importJobs', outcome: 'done', message: 'Imported 3 jobs: /home/shop/jobs.json' });
    await page.getByRole('status').filter({ hasText: 'Imported 3 jobs: /home/shop/jobs.json' }).waitFor();
    expect(errors).toEqual([]);
  });

  it('shows an action started from the File menu on any screen, with Cancel, and a restore without one', async () => {
    await page.keyboard.press('Alt+1');
    await page.getByRole('heading', { name: 'Jobs', level: 1 }).waitFor();
    const strip = page.getByRole('region', { name: 'Data action' });
    await emit(page, { action: 'backup', from: 'menu', state: 'running', done: 50, total: 200, cancellable: true });
    await strip.getByText('Backing up… — 25 %').waitFor();
    await screenshot(page, 'desktop-menu-backup-progress');
    await strip.getByRole('button', { name: 'Cancel' }).click();
    expect((await shell(page, (f) => f.cancels)).at(-1)).toBe('backup');
    await emit(page, { action: 'backup', from: 'menu', state: 'ended', outcome: 'cancelled', message: 'Backup cancelled: nothing was saved.' });
    await strip.getByRole('alert').filter({ hasText: 'Backup cancelled: nothing was saved.' }).waitFor();
    await strip.getByRole('button', { name: 'Close' }).click();
    expect(await strip.count()).toBe(0);

    await emit(page, { action: 'restore', from: 'menu', state: 'running', done: 0, total: 0, cancellable: false });
    const bar = strip.getByRole('progressbar', { name: 'Restoring…' });
    await bar.waitFor();
    // No value: the bar says work is going on without saying how far.
    expect(await bar.evaluate((b) => b.hasAttribute('value'))).toBe(false);
    expect(await strip.getByRole('button', { name: 'Cancel' }).count()).toBe(0);
    await screenshot(page, 'desktop-menu-restore-progress');
    // Done: main's own dialog says so, and the bar goes.
    await emit(page, { action: 'restore', from: 'menu', state: 'ended', outcome: 'done', message: 'Backup restored: Restored from /b/shop.db' });
    await strip.waitFor({ state: 'detached' });
    expect(errors).toEqual([]);
  });

  it('stops printing travellers after the job being printed when Cancel is pressed', async () => {
    await page.keyboard.press('Alt+1');
    const boxes = page.locator('table tbody input[type="checkbox"]');
    for (const i of [0, 1, 2]) await boxes.nth(i).check();
    await page.evaluate(() => (window as unknown as { fakeShell: FakeShell }).fakeShell.holdPrints());
    await page.getByRole('button', { name: 'Print travellers (3)' }).click();
    const dialog = page.getByRole('dialog', { name: 'Printing travellers' });
    await dialog.getByText('0 of 3').waitFor();
    await dialog.getByRole('button', { name: 'Cancel after this job' }).click();
    await page.evaluate(() => (window as unknown as { fakeShell: FakeShell }).fakeShell.release());
    await dialog.getByText('1 of 3, cancelled').waitFor();
    expect((await shell(page, (f) => f.methods)).filter((m) => m === 'printTraveller')).toHaveLength(1);
    await dialog.getByRole('button', { name: 'Close' }).first().click();
    expect(errors).toEqual([]);
  });
});
