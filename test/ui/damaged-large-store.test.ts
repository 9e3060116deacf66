import { mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { backupStore, openStore } from '../../db';
import { openShopStore } from '../../service/host/first-run';
import { startWebServer } from '../../service/web/server';
import type { WebServer } from '../../service/web/server';
import { damageIndexPage } from '../support/damage';
import { builtRenderer, field, fillSpring, launch, openPage, screenshot, UI_TEST_TIMEOUT } from './support';

/**
 * The demo shop's store with one index page overwritten with junk, served with the damage check's size rule
 * lowered to one byte: the store opens at once as a large one would, and its check runs in the background.
 */
describe('a large store whose background damage check finds damage', { timeout: UI_TEST_TIMEOUT }, () => {
  let dir: string;
  let web: WebServer;
  let browser: Browser;
  let page: Page;
  let errors: string[];
  let backup: string;

  beforeAll(async () => {
    const staticDir = await builtRenderer();
    dir = mkdtempSync(join(tmpdir(), 'coilwright-ui-damaged-'));
    const dbFile = join(dir, 'shop.db');
    const demo = openShopStore(dbFile);
    if (!demo.ok) throw new Error(demo.error.message);
    backup = join(dir, 'coilwright-backup-monday.db');
    const made = await backupStore(demo.value.store, backup);
    if (!made.ok) throw new Error(made.error.message);
    demo.value.store.close();
    damageIndexPage(openStore(dbFile));
    web = await startWebServer({ dbFile, staticDir, openOptions: { checkBeforeOpenMaxBytes: 1 } });
    browser = await launch();
    ({ page, errors } = await openPage(browser, web.url));
  });

  afterAll(async () => {
    await browser?.close();
    await web?.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('opens with the job list, and the status line warns once the check fails', async () => {
    await page.locator('table.jobs tbody tr').first().waitFor();
    const warning = page.getByTestId('store-check');
    await expect.poll(() => warning.textContent(), { timeout: 20_000 }).toBe('Store damaged: read-only, restore a backup');
    await expect(warning.getAttribute('role')).resolves.toBe('alert');
    await expect(warning.getAttribute('title')).resolves.toMatch(/found damage \(quick_check: .+\)/);
    await screenshot(page, 'status-store-damaged');
  });

  it('refuses a save with what is wrong and how to restore', async () => {
    await page.getByRole('button', { name: /^New job/ }).first().click();
    await page.getByLabel('Metric').check();
    await field(page, 'Customer').fill('Ostrander Valve Works (demo)');
    await field(page, 'Part number').fill('OV-220');
    await fillSpring(page, { grade: 'en10270-1-sh', d: '1.6', od: '14', coils: '9', l0: '38' });
    const status = page.locator('[data-save="error"]');
    await status.waitFor({ timeout: 20_000 });
    await expect(status.textContent()).resolves.toMatch(/is damaged \(quick_check: .+\): nothing was saved/);
    await screenshot(page, 'save-refused-store-damaged');
    expect(errors).toEqual([]);
  });

  it('takes the backup in its place from Data & backups, keeps the damaged file beside it, and saves go on', async () => {
    // The refused job cannot be kept while the store is damaged: the user leaves it to restore.
    await page.keyboard.press('Alt+4');
    await page.getByRole('dialog', { name: 'Changes not saved' }).getByText(/a save the store\s+refused/).waitFor();
    await page.getByRole('button', { name: 'Discard the changes and leave' }).click();
    await page.getByRole('heading', { name: 'Restore a backup' }).waitFor();
    await page.getByLabel('Backup to restore').setInputFiles({ name: 'coilwright-backup-monday.db', mimeType: 'application/vnd.sqlite3', buffer: readFileSync(backup) });
    await page.getByRole('button', { name: 'Restore…' }).click();
    await page.getByRole('dialog', { name: 'Replace the store?' }).waitFor();
    await page.getByRole('button', { name: 'Restore coilwright-backup-monday.db' }).click();
    await page.getByRole('status').filter({ hasText: /^Restored from coilwright-backup-monday\.db/ }).waitFor({ timeout: 20_000 });
    expect(readdirSync(dir).some((name) => /^shop\.db\.damaged-.*Z$/.test(name))).toBe(true);
    await expect.poll(() => page.getByTestId('store-check').count(), { timeout: 20_000 }).toBe(0);
    await screenshot(page, 'restored-after-damage');
    await page.keyboard.press('Alt+1');
    await page.getByRole('button', { name: /^New job/ }).first().click();
    await page.getByLabel('Metric').check();
    await field(page, 'Customer').fill('Ostrander Valve Works (demo)');
    await field(page, 'Part number').fill('OV-221');
    await fillSpring(page, { grade: 'en10270-1-sh', d: '1.6', od: '14', coils: '9', l0: '38' });
    await page.locator('[data-save="ok"]').waitFor({ timeout: 20_000 });
    expect(errors).toEqual([]);
  });
});
