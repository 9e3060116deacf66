import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCli } from '../../service/cli/main';
import { drawbarExtension, valveSpringMetric } from '../fixtures/specs';

let dir: string;
let db: string;

const file = (name: string, value: unknown): string => {
  const path = join(dir, name);
  writeFileSync(path, JSON.stringify(value));
  return path;
};

async function cli(args: string[]): Promise<{ code: number; errors: { code: string; path: string }[]; out: string }> {
  let out = '';
  let err = '';
  const code = await runCli(args, (t) => { out += t; }, (t) => { err += t; });
  return { code, out, errors: err ? (JSON.parse(err) as { errors: { code: string; path: string }[] }).errors : [] };
}

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'cw-cli-bounds-'));
  db = join(dir, 'shop.db');
  expect((await cli(['demo', '--db', db])).code).toBe(0);
});

afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('calc, sheet, price, jobs add and import agree on what is out of range', () => {
  const absurd = { ...drawbarExtension, bodyCoils: 1e9 };
  const job = { customer: { name: 'Tollgate Fixtures (demo)' }, partNumber: 'TF-1', spec: absurd };

  it.each([
    ['calc', () => ['calc', file('a.json', absurd)], 'bodyCoils'],
    ['sheet', () => ['sheet', file('b.json', absurd), '--db', db], 'bodyCoils'],
    ['price', () => ['price', file('c.json', absurd), '--db', db], 'bodyCoils'],
    ['sheet of a job file', () => ['sheet', file('d.json', job), '--db', db], 'spec.bodyCoils'],
    ['jobs add', () => ['jobs', 'add', file('e.json', job), '--db', db], 'spec.bodyCoils'],
    ['print traveller', () => ['print', 'traveller', file('f.json', { ...job, orderQuantity: 10 }), '--db', db, '--out', join(dir, 'x.pdf')], 'spec.bodyCoils'],
    ['db import', () => ['db', 'import', file('g.json', { format: 'coilwright-jobs', version: 1, jobs: [job] }), '--db', db], 'jobs[0].spec.bodyCoils'],
  ])('%s refuses 1e9 body coils at the field', async (_name, args, path) => {
    const run = await cli(args());
    expect(run.code).toBe(2);
    expect(run.errors.find((e) => e.path === path)).toMatchObject({ code: 'out-of-range' });
  });
});

describe('job files: an unknown field is an error everywhere', () => {
  const job = { customer: { name: 'Tollgate Fixtures (demo)' }, partNumber: 'TF-2', orderQty: 500, spec: valveSpringMetric };

  it.each([
    ['jobs add', () => ['jobs', 'add', file('h.json', job), '--db', db]],
    ['sheet', () => ['sheet', file('i.json', job), '--db', db]],
    ['price', () => ['price', file('j.json', job), '--db', db]],
    ['print traveller', () => ['print', 'traveller', file('k.json', job), '--db', db, '--quantity', '5', '--out', join(dir, 'k.pdf')]],
    ['print quote', () => ['print', 'quote', file('l.json', job), '--db', db, '--out', join(dir, 'l.pdf')]],
  ])('%s refuses a misspelt orderQty', async (_name, args) => {
    const run = await cli(args());
    expect(run.code).toBe(2);
    expect(run.errors).toContainEqual(expect.objectContaining({ code: 'unknown-field', path: 'orderQty' }));
  });

  it('sheet reads the order quantity of a correct job file', async () => {
    const run = await cli(['sheet', file('m.json', { ...job, orderQty: undefined, orderQuantity: 500 }), '--db', db]);
    expect(run.code).toBe(0);
    expect(JSON.parse(run.out).orderQuantity).toBe(500);
  });
});

describe('the command line keeps its explicit paths', () => {
  it('exports to a new file, refuses to replace one without --force, and imports, backs up and restores by path', async () => {
    const out = join(dir, 'export.json');
    expect((await cli(['db', 'export', '--db', db, '--out', out])).code).toBe(0);
    const again = await cli(['db', 'export', '--db', db, '--out', out]);
    expect(again.code).toBe(2);
    expect(again.errors[0]).toMatchObject({ code: 'file-exists', path: 'file' });
    expect((await cli(['db', 'export', '--db', db, '--out', out, '--force'])).code).toBe(0);
    expect((await cli(['db', 'import', out, '--db', db, '--renumber'])).code).toBe(0);
    const backup = join(dir, 'shop-backup.db');
    expect((await cli(['db', 'backup', '--db', db, '--out', backup])).code).toBe(0);
    expect((await cli(['db', 'restore', '--db', db, '--from', backup])).code).toBe(0);
  });
});
