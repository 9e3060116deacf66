import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { valveSpringMetric } from '../fixtures/specs';

const root = resolve(__dirname, '../..');
const dir = mkdtempSync(join(tmpdir(), 'coilwright-cli-built-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** Packages a command loads beyond Node's own, recorded as the built command line requires them. */
const RECORD_LOADS = `
  const Module = require('node:module');
  const loaded = new Set();
  const load = Module._load;
  Module._load = function (request, ...rest) { loaded.add(request); return load.call(this, request, ...rest); };
  process.on('exit', () => process.stderr.write('\\nLOADED ' + JSON.stringify([...loaded].filter((r) => !r.startsWith('node:') && !r.startsWith('.')))));
`;

/** `npm run cli` as it runs: the launcher (which builds the bundle when a source is newer), from a folder that is not the project. */
function cli(args: string[]) {
  const r = spawnSync(process.execPath, ['--require', join(dir, 'record.cjs'), join(root, 'scripts', 'cli.mjs'), ...args], { cwd: dir, encoding: 'utf8' });
  const loads = /LOADED (\[.*\])$/.exec(r.stderr)?.[1];
  return { status: r.status, stdout: r.stdout, stderr: r.stderr, loaded: loads ? (JSON.parse(loads) as string[]) : [] };
}

const PDF_PACKAGES = ['pdfkit', 'svg-to-pdfkit', 'fontkit', 'qrcode'];

describe('the command line as built JavaScript', () => {
  writeFileSync(join(dir, 'record.cjs'), RECORD_LOADS);
  writeFileSync(join(dir, 'spec.json'), JSON.stringify(valveSpringMetric));

  it('calc runs from any folder and loads neither the store, the PDF writers nor the spreadsheet reader', () => {
    const run = cli(['calc', 'spec.json']);
    expect(run.status, run.stderr).toBe(0);
    expect(JSON.parse(run.stdout).springIndex).toBeCloseTo(10, 10);
    expect(run.loaded.filter((r) => [...PDF_PACKAGES, 'better-sqlite3', 'exceljs'].includes(r))).toEqual([]);
  }, 120_000);

  it('keeps V8\'s compiled code of the bundle beside it, and the next command uses it as it is', () => {
    const cache = join(root, 'dist', 'cli', 'cli.cjs.v8-cache');
    rmSync(cache, { force: true });
    expect(cli(['calc', 'spec.json']).status).toBe(0);
    expect(existsSync(cache)).toBe(true);
    const written = statSync(cache).mtimeMs;
    const again = cli(['calc', 'spec.json']);
    expect(again.status, again.stderr).toBe(0);
    expect(JSON.parse(again.stdout).springIndex).toBeCloseTo(10, 10);
    expect(statSync(cache).mtimeMs).toBe(written);
  }, 120_000);

  it('calc --batch runs many specs in one process, loading neither the store nor the PDF writers', () => {
    writeFileSync(join(dir, 'specs.jsonl'), `${JSON.stringify(valveSpringMetric)}\n${JSON.stringify({ ...valveSpringMetric, wireDiameter: 0 })}\n`);
    const run = cli(['calc', '--batch', 'specs.jsonl']);
    expect(run.stdout.trim().split('\n').map((l) => (JSON.parse(l) as { ok: boolean }).ok)).toEqual([true, false]);
    expect(run.loaded.filter((r) => [...PDF_PACKAGES, 'better-sqlite3'].includes(r))).toEqual([]);
  }, 120_000);

  it('a store command loads the store but not the PDF writers; print finds the fonts beside the program', () => {
    const db = join(dir, 'shop.db');
    const list = cli(['jobs', 'list', '--db', db]);
    expect(list.status, list.stderr).toBe(0);
    expect(list.loaded).toContain('better-sqlite3');
    expect(list.loaded.filter((r) => PDF_PACKAGES.includes(r))).toEqual([]);
    const print = cli(['print', 'traveller', 'spec.json', '--quantity', '500', '--db', db, '--out', join(dir, 't.pdf')]);
    expect(print.status, print.stderr).toBe(0);
    expect(print.loaded).toContain('pdfkit');
    expect(readFileSync(join(dir, 't.pdf')).subarray(0, 5).toString()).toBe('%PDF-');
  }, 120_000);
});
