/**
 * Shared set-up of the UI tests: one renderer build per test run, a web transport over a temporary
 * store, and Chromium with the project's flags. Every page records its console errors and page errors.
 */
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, beforeAll } from 'vitest';
import { chromium } from 'playwright-core';
import type { Browser, Page } from 'playwright-core';
import { startWebServer } from '../../service/web/server';
import type { WebServer } from '../../service/web/server';
import { fileStoreChoice } from '../../service/host/store-choice';

/** Per test: a busy two-core machine runs several Chromiums at once, so steps take longer than alone. */
export const UI_TEST_TIMEOUT = 60_000;

export const repoRoot = resolve(__dirname, '../..');
export const screenshotDir = join(repoRoot, 'test-artifacts', 'screenshots');

const chromiumArgs = ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/**
 * Builds the renderer once for all the UI test files of this run (they share the vitest parent process):
 * the first file to take the lock builds, the others wait for its marker.
 */
export async function builtRenderer(): Promise<string> {
  removeStaleBuilds();
  const base = join(tmpdir(), `coilwright-ui-${process.ppid}`);
  const out = join(base, 'renderer');
  const done = join(base, 'built');
  const failed = join(base, 'failed');
  let builder = false;
  try {
    mkdirSync(base);
    builder = true;
  } catch {
    // Another file is building.
  }
  if (builder) {
    try {
      process.env.VITE_CONFIG_NATIVE_IGNORE_WARNING = 'true';
      const { build } = await import('vite');
      await build({ configFile: join(repoRoot, 'renderer', 'vite.config.mts'), logLevel: 'error', build: { outDir: out, emptyOutDir: true } });
      writeFileSync(done, '');
    } catch (e) {
      writeFileSync(failed, String((e as Error).stack ?? e));
      throw e;
    }
    return out;
  }
  for (let waited = 0; waited < 120_000; waited += 200) {
    if (existsSync(done)) return out;
    if (existsSync(failed)) throw new Error(`the renderer build failed:\n${readFileSync(failed, 'utf8')}`);
    await sleep(200);
  }
  throw new Error('timed out waiting for the renderer build');
}

const alive = (pid: number): boolean => {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
};

/** Builds left by earlier runs whose vitest process has gone. */
function removeStaleBuilds(): void {
  for (const name of readdirSync(tmpdir())) {
    const pid = /^coilwright-ui-(\d+)$/.exec(name)?.[1];
    if (pid && Number(pid) !== process.ppid && !alive(Number(pid))) rmSync(join(tmpdir(), name), { recursive: true, force: true });
  }
}

export interface Shop {
  dir: string;
  dbFile: string;
  staticDir: string;
  web: WebServer;
  /** Stops the service and starts it again on the same store (a new token, so a new address). */
  restart(): Promise<void>;
  close(): Promise<void>;
}

export async function startShop(): Promise<Shop> {
  const staticDir = await builtRenderer();
  const dir = mkdtempSync(join(tmpdir(), 'coilwright-ui-store-'));
  const dbFile = join(dir, 'shop.db');
  // The program's settings file, where a server store opened on the Data screen is remembered (never its password).
  const choice = fileStoreChoice(join(dir, 'app-settings.json'));
  const shop: Shop = {
    dir, dbFile, staticDir,
    web: await startWebServer({ dbFile, staticDir, choice }),
    async restart() {
      await shop.web.close();
      shop.web = await startWebServer({ dbFile, staticDir, choice });
    },
    async close() {
      await shop.web.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
  return shop;
}

export const launch = (): Promise<Browser> => chromium.launch({ executablePath: '/usr/bin/chromium', args: chromiumArgs });

/**
 * A page at 1440 × 900 whose console errors and uncaught errors are kept in `errors`. `beforeApp` runs in
 * the page before the app's own scripts (a stand-in for the desktop preload's bridge, for one).
 */
export async function openPage(browser: Browser, url: string, beforeApp?: () => void): Promise<{ page: Page; errors: string[] }> {
  const page = await browser.newPage({ viewport: { width: 1440, height: 900 } });
  if (beforeApp) await page.addInitScript(beforeApp);
  const errors: string[] = [];
  page.on('console', (m) => { if (m.type() === 'error') errors.push(`console: ${m.text()}`); });
  page.on('pageerror', (e) => errors.push(`pageerror: ${e.message}`));
  await page.goto(url);
  await page.getByRole('heading', { name: 'Jobs', level: 1 }).waitFor();
  return { page, errors };
}

export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(screenshotDir, { recursive: true });
  await page.screenshot({ path: join(screenshotDir, `${name}.png`) });
}

/** A field by its accessible name, whatever control it is. */
export const field = (page: Page, name: string) =>
  page.getByRole('textbox', { name, exact: true }).or(page.getByRole('combobox', { name, exact: true }));

/** Fills the spec form of the workspace with a compression spring; values in the job's units. */
export async function fillSpring(page: Page, s: { grade: string; d: string; od: string; coils: string; l0: string; l1?: string; f1?: string }) {
  await field(page, 'Wire grade').selectOption(s.grade);
  await field(page, 'Wire diameter d (mm)').fill(s.d);
  await field(page, 'Outside diameter OD (mm)').fill(s.od);
  await field(page, 'Total coils Nt').fill(s.coils);
  await field(page, 'Free length L0 (mm)').fill(s.l0);
  if (s.l1) await field(page, 'Test length L1 (mm)').fill(s.l1);
  if (s.f1) await field(page, 'Force F1 (if specified) (N)').fill(s.f1);
}

/** Waits until the toolbar says the job is saved, and gives its number. */
export async function savedJobNumber(page: Page): Promise<string> {
  await page.locator('[data-save="ok"]').waitFor();
  return (await page.locator('.toolbar__number').textContent()) ?? '';
}

/** Roles that must carry an accessible name wherever they appear. */
const namedRoles = new Set(['textbox', 'searchbox', 'combobox', 'checkbox', 'radio', 'button', 'spinbutton', 'slider', 'listbox', 'tab', 'link', 'meter', 'dialog', 'tabpanel']);

interface AxNode {
  ignored: boolean;
  role?: { value: string };
  name?: { value: string };
  backendDOMNodeId?: number;
}

/** Every control in Chromium's own accessibility tree of the page, with the ones that have no name. */
export async function unnamedControls(page: Page): Promise<{ count: number; unnamed: string[] }> {
  const cdp = await page.context().newCDPSession(page);
  const { nodes } = (await cdp.send('Accessibility.getFullAXTree')) as { nodes: AxNode[] };
  const controls = nodes.filter((n) => !n.ignored && n.role && namedRoles.has(n.role.value));
  const unnamed: string[] = [];
  for (const n of controls) {
    if ((n.name?.value ?? '').trim() !== '') continue;
    const { outerHTML } = (await cdp.send('DOM.getOuterHTML', { backendNodeId: n.backendDOMNodeId })) as { outerHTML: string };
    unnamed.push(`${n.role!.value}: ${outerHTML.slice(0, 160)}`);
  }
  await cdp.detach();
  return { count: controls.length, unnamed };
}

/** A shop (temporary store behind the web transport) and a Chromium page on it, for one describe block. */
export interface Session {
  shop: Shop;
  browser: Browser;
  page: Page;
  errors: string[];
}

/** Registers the hooks that start the shop and the browser before the block's tests and close them after. */
export function shopSession(): Session {
  const session = {} as Session;
  beforeAll(async () => {
    session.shop = await startShop();
    session.browser = await launch();
    Object.assign(session, await openPage(session.browser, session.shop.web.url));
  });
  afterAll(async () => {
    await session.browser?.close();
    await session.shop?.close();
  });
  return session;
}
