import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { UI_TEST_TIMEOUT, screenshot, shopSession } from './support';

describe('Data & backups in a browser', { timeout: UI_TEST_TIMEOUT }, () => {
  const session = shopSession();

  it('names no path: the backup downloads, a restore uploads the picked file after the page asks', async () => {
    const { page, errors } = session;
    await page.keyboard.press('Alt+4');
    await page.getByRole('heading', { name: 'Back up the store' }).waitFor();
    await expect(page.getByRole('textbox').count()).resolves.toBe(0);
    await screenshot(page, 'data-backups');

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download a backup' }).click()]);
    expect(download.suggestedFilename()).toMatch(/^coilwright-backup-\d{4}-\d{2}-\d{2}\.db$/);
    const bytes = readFileSync(await download.path());
    expect(bytes.subarray(0, 15).toString()).toBe('SQLite format 3');

    await page.getByLabel('Backup to restore').setInputFiles({ name: download.suggestedFilename(), mimeType: 'application/vnd.sqlite3', buffer: bytes });
    await page.getByRole('button', { name: 'Restore…' }).click();
    await page.getByRole('dialog', { name: 'Replace the store?' }).waitFor();
    await page.getByRole('button', { name: /^Restore coilwright-backup-/ }).click();
    await page.getByRole('status').filter({ hasText: /^Restored from coilwright-backup-/ }).waitFor();
    expect(errors).toEqual([]);
  });

  it('exports jobs as a streamed download, saying how many went out', async () => {
    const { page, errors } = session;
    await page.keyboard.press('Alt+4');
    await page.getByRole('heading', { name: 'Export jobs' }).waitFor();
    await page.getByLabel('Format').selectOption('csv');
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Export', exact: true }).click()]);
    expect(download.suggestedFilename()).toMatch(/^coilwright-jobs-\d{4}-\d{2}-\d{2}\.csv$/);
    const text = readFileSync(await download.path(), 'utf8');
    expect(text.split('\r\n')[0]).toMatch(/^number,customer,customerEmail,.*,units,material,materialName,spec\.wireDiameter \(mm \| in\),/);
    await page.getByRole('status').filter({ hasText: /jobs? exported, downloaded as coilwright-jobs-/ }).waitFor();
    // The CSV goes back in through the upload, every job with a new number.
    await page.getByLabel('File to import (JSON or CSV)').setInputFiles({ name: 'jobs.csv', mimeType: 'text/csv', buffer: Buffer.from(text) });
    await page.getByRole('button', { name: 'Import', exact: true }).click();
    const rows = text.trimEnd().split('\r\n').length - 1;
    await page.getByRole('status').filter({ hasText: new RegExp(`^${rows} jobs imported: `) }).waitFor();
    expect(errors).toEqual([]);
  });
});
