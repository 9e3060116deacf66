import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { usePgCluster } from '../support/pg-stores';
import { join } from 'node:path';
import { UI_TEST_TIMEOUT, screenshot, screenshotDir, shopSession } from './support';

const pg = usePgCluster();

describe('Data & backups in a browser', { timeout: UI_TEST_TIMEOUT }, () => {
  const session = shopSession();

  it('names no path: the backup downloads, a restore uploads the picked file after the page asks', async () => {
    const { page, errors } = session;
    await page.keyboard.press('Alt+4');
    await page.getByRole('heading', { name: 'Back up the store' }).waitFor();
    // The text fields are the name saves are signed with and a server's connection string: none takes a path on this computer.
    const names = await page.getByRole('textbox').evaluateAll((boxes) => boxes.map((b) => (b as HTMLInputElement).labels?.[0]?.textContent ?? ''));
    expect(names).toEqual(['Sign your work as', 'Open a shared store on a PostgreSQL server']);
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

  it('imports a job whose link cannot be kept, and says which field named the missing job', async () => {
    const { page, errors } = session;
    await page.keyboard.press('Alt+4');
    await page.getByRole('heading', { name: 'Import jobs' }).waitFor();
    const spec = { kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: 2, outerDiameter: 20, totalCoils: 10, ends: 'closed-ground', freeLength: 50 };
    const doc = {
      format: 'coilwright-jobs', version: 2,
      jobs: [{ number: 'DEMO-LINK-1', partNumber: 'DEMO-LINKED', spec, archivedAt: '2026-03-01T10:00:00.000Z', copiedFrom: { number: 'DEMO-GONE-9', at: '2026-02-01T10:00:00.000Z' } }],
    };
    await page.getByLabel('File to import (JSON or CSV)').setInputFiles({ name: 'linked.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(doc)) });
    // Kept numbers: the file's numbers are this store's, so the missing job is looked for here too.
    await page.getByLabel(/Give imported jobs new numbers/).uncheck();
    await page.getByRole('button', { name: 'Import', exact: true }).click();
    await page.getByRole('status').filter({ hasText: /^1 job imported: DEMO-LINK-1\.$/ }).waitFor();
    const toPutRight = page.getByRole('list', { name: 'To put right' });
    await toPutRight.getByText(/^jobs\[0\]\.copiedFrom\.number: job DEMO-GONE-9, which this job was made from, is neither in this file nor in this store/).waitFor();
    await toPutRight.scrollIntoViewIfNeeded();
    await screenshot(page, 'data-import-link-not-kept');
    expect(errors).toEqual([]);
  });

  it('signs saves with a name, opens a shared PostgreSQL store by connection string and names it by host and database', async () => {
    const { page, errors } = session;
    await page.keyboard.press('Alt+4');
    await page.getByLabel('Sign your work as').fill('Fay (estimator)');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('status').filter({ hasText: 'recorded as by Fay (estimator)' }).waitFor();
    const url = pg.freshDatabase().replace('postgres@', 'postgres:pw-never-shown@');
    await page.getByLabel('Open a shared store on a PostgreSQL server').fill(url);
    await page.getByRole('button', { name: 'Open server store' }).click();
    await page.getByRole('status').filter({ hasText: /^Now working in PostgreSQL 127\.0\.0\.1:\d+\/shop_/ }).waitFor();
    await page.getByTestId('store-name').filter({ hasText: /^PostgreSQL 127\.0\.0\.1:\d+\/shop_/ }).waitFor();
    await expect(page.getByTestId('store-open').textContent()).resolves.toMatch(/saves are recorded as by Fay \(estimator\)/);
    await expect(page.getByLabel('Open a shared store on a PostgreSQL server').inputValue()).resolves.toBe('');
    await expect(page.title()).resolves.toMatch(/^Coilwright — PostgreSQL 127\.0\.0\.1:\d+\/shop_/);
    await expect(page.content()).resolves.not.toContain('pw-never-shown');
    // Remembered for the next start in the program's settings file, without the password; the help says where it comes from.
    await expect(page.getByRole('status').filter({ hasText: /^Now working in/ }).textContent()).resolves.toMatch(/The next start opens it again; its password was not saved, so give it in PGPASSWORD or ~\/\.pgpass\./);
    await expect(page.getByTestId('store-help').textContent()).resolves.toMatch(/without the password\. The password comes from the PGPASSWORD environment variable or\s+the standard ~\/\.pgpass file/);
    await page.getByTestId('store-next-start').filter({ hasText: /Next start: postgres:\/\/postgres@127\.0\.0\.1:\d+\/shop_\d+_\d+ \(password not saved\)/ }).waitFor();
    const saved = readFileSync(join(session.shop.dir, 'app-settings.json'), 'utf8');
    expect(saved).not.toContain('pw-never-shown');
    expect(saved).toContain(url.replace('postgres:pw-never-shown@', 'postgres@'));
    await page.getByTestId('store-panel').screenshot({ path: join(screenshotDir, 'data-store-panel.png') });
    await screenshot(page, 'data-store');
    await page.getByRole('button', { name: 'Start in this computer\'s own store next time' }).click();
    await page.getByRole('status').filter({ hasText: /^The next start opens this computer's own store file/ }).waitFor();
    await expect(page.getByTestId('store-next-start').count()).resolves.toBe(0);
    expect(JSON.parse(readFileSync(join(session.shop.dir, 'app-settings.json'), 'utf8'))).toEqual({});
    expect(errors).toEqual([]);
  });
});
