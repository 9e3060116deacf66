/**
 * The renderer in Chromium: first render of the job list over a store of 10 000 jobs (or more), the time from a
 * keystroke in the spec form to the updated results and to the frame that paints them, and the gzipped
 * size of the bundle.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { chromium } from 'playwright-core';
import type { Page } from 'playwright-core';
import { openStore } from '../../db';
import { startWebServer } from '../../service/web/server';
import type { BenchRow, BenchSuite } from '../harness';
import { fillWithJobs } from './store-data';

/** The store behind the page: 10 000 jobs by default, more with COILWRIGHT_BENCH_RENDERER_JOBS (e.g. 100000). */
const JOBS = Number(process.env.COILWRIGHT_BENCH_RENDERER_JOBS ?? 10_000);
const LOADS = 7;
const KEYSTROKES = 60;
const chromiumArgs = ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];

const row = (name: string, value: number, unit: string, target?: string, pass?: boolean): BenchRow =>
  ({ suite: 'renderer', name, value, unit, ...(target === undefined ? {} : { target, pass }) });

/** The production build, by the vite command line (vite itself stays out of the bench bundle). */
function buildRenderer(out: string): void {
  const vite = join(process.cwd(), 'node_modules', 'vite', 'bin', 'vite.js');
  const r = spawnSync(process.execPath, [vite, 'build', '--config', 'renderer/vite.config.mts', '--logLevel', 'error'], {
    env: { ...process.env, CW_RENDERER_OUT: out, VITE_CONFIG_NATIVE_IGNORE_WARNING: 'true' }, encoding: 'utf8',
  });
  if (r.status !== 0) throw new Error(`renderer build failed:\n${r.stderr}${r.stdout}`);
}

function gzippedBytes(out: string): number {
  const assets = join(out, 'assets');
  return readdirSync(assets).filter((f) => /\.(js|css)$/.test(f))
    .reduce((sum, f) => sum + gzipSync(readFileSync(join(assets, f)), { level: 9 }).length, 0);
}

function fillStore(file: string): void {
  const store = openStore(file);
  fillWithJobs(store, JOBS, 424242);
  store.close();
}

/** Milliseconds from navigation start to the first job rows in the table, measured by the page itself. */
async function firstRender(page: Page, url: string): Promise<number> {
  await page.goto(url);
  await page.locator('table.jobs tbody tr').first().waitFor();
  return page.evaluate(() => (window as unknown as { cwFirstRows: number }).cwFirstRows);
}

/** Records when the first job row appears, before any script of the page runs. */
function watchFirstRows(): void {
  const w = window as unknown as { cwFirstRows?: number };
  const seen = () => {
    if (w.cwFirstRows === undefined && document.querySelector('table.jobs tbody tr')) w.cwFirstRows = performance.now();
  };
  new MutationObserver(seen).observe(document, { childList: true, subtree: true });
}

/**
 * Each keystroke sets the free length and waits for the results panel to show the figures of that value
 * (`shown`), then for the frame that paints them (`painted`): the next animation frame after the update,
 * and a task posted from it, which runs once that frame has been handed to the compositor.
 */
async function keystrokes(page: Page): Promise<{ shown: number[]; painted: number[] }> {
  return page.evaluate(async (count) => {
    const input = document.querySelector<HTMLInputElement>('[data-path="spec.freeLength"]')!;
    const results = document.querySelector('.results')!;
    const setValue = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, 'value')!.set!;
    const times: number[] = [];
    const frames: number[] = [];
    const afterPaint = () => new Promise<number>((resolve) => {
      requestAnimationFrame(() => {
        const channel = new MessageChannel();
        channel.port1.onmessage = () => resolve(performance.now());
        channel.port2.postMessage(null);
      });
    });
    for (let i = 0; i < count; i++) {
      const before = results.getAttribute('data-calc');
      let painted: Promise<number> = Promise.resolve(0);
      const shown = new Promise<number>((resolve, reject) => {
        const watch = new MutationObserver(() => {
          if (results.getAttribute('data-calc') === before) return;
          watch.disconnect();
          painted = afterPaint();
          resolve(performance.now());
        });
        watch.observe(results, { attributes: true, attributeFilter: ['data-calc'] });
        setTimeout(() => reject(new Error(`keystroke ${i}: the results did not update`)), 5000);
      });
      const start = performance.now();
      // Never the value the field holds already (60): an unchanged value is no keystroke to React.
      setValue.call(input, String(61 + (i % 20) / 10));
      input.dispatchEvent(new Event('input', { bubbles: true }));
      times.push((await shown) - start);
      frames.push((await painted) - start);
      // A typist's pause: the drawings, deferred behind the figures, catch up in it.
      await new Promise((r) => setTimeout(r, 40));
    }
    return { shown: times, painted: frames };
  }, KEYSTROKES);
}

async function openSpring(page: Page): Promise<void> {
  await page.keyboard.press('Alt+N');
  await page.getByLabel('Metric').check();
  await page.locator('[data-path="spec.material"]').selectOption('en10270-1-dh');
  const fill = (path: string, value: string) => page.locator(`[data-path="${path}"]`).fill(value);
  await fill('spec.wireDiameter', '2');
  await fill('spec.outerDiameter', '22');
  await fill('spec.totalCoils', '10');
  await fill('spec.freeLength', '60');
  await fill('spec.loads[0].length', '45');
  await fill('spec.loads[0].force', '40');
  await page.locator('.results[data-state="ok"]').waitFor();
}

const percentile = (sorted: number[], q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))]!;

export const rendererSuite: BenchSuite = {
  name: 'renderer',
  async run(): Promise<BenchRow[]> {
    const dir = mkdtempSync(join(tmpdir(), 'coilwright-bench-ui-'));
    const out = join(dir, 'renderer');
    const dbFile = join(dir, 'shop.db');
    buildRenderer(out);
    fillStore(dbFile);
    const web = await startWebServer({ dbFile, staticDir: out });
    const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: chromiumArgs });
    try {
      const page = await browser.newPage({ viewport: { width: 1440, height: 900 } });
      await page.addInitScript(watchFirstRows);
      // The token address sets the session cookie; the loads measured come after it, as a restart would.
      const first = await firstRender(page, web.url);
      const loads: number[] = [];
      for (let i = 0; i < LOADS; i++) loads.push(await firstRender(page, `http://127.0.0.1:${web.port}/`));
      loads.sort((a, b) => a - b);
      await openSpring(page);
      const measured = await keystrokes(page);
      const keys = measured.shown.sort((a, b) => a - b);
      const frames = measured.painted.sort((a, b) => a - b);
      const bytes = gzippedBytes(out);
      const p95 = percentile(keys, 0.95);
      return [
        row(`job list first render, ${JOBS} jobs in the store (slowest of ${LOADS})`, loads[loads.length - 1]!, 'ms', '< 1000 ms', loads[loads.length - 1]! < 1000),
        row('job list first render, median', percentile(loads, 0.5), 'ms'),
        row('job list first render, first load after sign-in', first, 'ms'),
        row(`keystroke to updated results p95 (${KEYSTROKES} keystrokes)`, p95, 'ms', '< 16 ms', p95 < 16),
        row('keystroke to updated results p50', percentile(keys, 0.5), 'ms'),
        row('keystroke to updated results max', keys[keys.length - 1]!, 'ms'),
        row('keystroke to the painted frame p95 (requestAnimationFrame after the update)', percentile(frames, 0.95), 'ms'),
        row('keystroke to the painted frame p50', percentile(frames, 0.5), 'ms'),
        row('renderer bundle, gzipped (js + css)', bytes / 1024, 'KB', '< 400 KB', bytes < 400 * 1024),
      ];
    } finally {
      await browser.close();
      await web.close();
      rmSync(dir, { recursive: true, force: true });
    }
  },
};
