import { beforeAll, describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { drawbarExtension, lidTorsion, valveSpringMetric } from '../fixtures/specs';

const root = join(__dirname, '..', '..');
const cli = (args: string[]) =>
  spawnSync(process.execPath, ['--import', 'tsx', 'service/cli/main.ts', ...args], { cwd: root, encoding: 'utf8' });

describe('command line: sheet and price', () => {
  const dir = mkdtempSync(join(tmpdir(), 'coilwright-plan-'));
  const db = join(dir, 'shop.db');
  const file = (name: string, value: unknown) => {
    const path = join(dir, name);
    writeFileSync(path, JSON.stringify(value));
    return path;
  };

  beforeAll(() => {
    const run = cli(['demo', '--db', db]);
    expect(run.status, run.stderr).toBe(0);
  });

  it('sheet prints the plan with the fields the floor reads', () => {
    const run = cli(['sheet', file('spec.json', valveSpringMetric), '--db', db, '--quantity', '1000']);
    expect(run.status, run.stderr).toBe(0);
    const plan = JSON.parse(run.stdout);
    for (const key of ['coiledFreeLength', 'wireLengthPerPiece', 'massPerPiece', 'lotWire', 'operations', 'inspection']) {
      expect(plan).toHaveProperty(key);
    }
    expect(plan.lotWire).toMatchObject({ startQuantity: expect.any(Number), metres: expect.any(Number), kg: expect.any(Number) });
    // A store with no stock list: the plan says to order the lot's wire.
    expect(plan.lotWire.stock).toMatchObject({ status: 'order', onHandKg: 0, neededKg: plan.lotWire.kg });
    expect(plan.lotWire.stock.text).toMatch(/^Order wire: [\d.]+ kg at 2\.00 mm; none of this grade and size on the stock list\.$/);
    expect(plan.inspection).toMatchObject({ sampleSize: 80, accept: 2, reject: 3 });
    expect(plan.inspection.characteristics.length).toBeGreaterThan(3);
    expect(plan.operations[0].kind).toBe('coil');
    expect(plan.operations[0].workCentre).not.toBeNull();
  });

  it('sheet without a store plans with a new shop\'s defaults and says what is missing', () => {
    const run = cli(['sheet', file('spec2.json', valveSpringMetric)]);
    expect(run.status, run.stderr).toBe(0);
    const plan = JSON.parse(run.stdout);
    expect(plan.operations[0].workCentre).toBeNull();
    expect(plan.operations[0].notes.join(' ')).toMatch(/no coil machine/);
  });

  it('sheet takes a job file, with its order quantity', () => {
    const job = { customer: { name: 'Demo customer' }, partNumber: 'P-1', orderQuantity: 250, spec: valveSpringMetric };
    const plan = JSON.parse(cli(['sheet', file('job.json', job), '--db', db]).stdout);
    expect(plan.orderQuantity).toBe(250);
  });

  it('sheet plans extension and torsion springs too', () => {
    const ext = JSON.parse(cli(['sheet', file('ext.json', drawbarExtension), '--db', db]).stdout);
    expect(ext.kind).toBe('extension');
    expect(ext.operations.map((o: { kind: string }) => o.kind)).not.toContain('grind');
    const tor = JSON.parse(cli(['sheet', file('tor.json', lidTorsion), '--db', db]).stdout);
    expect(tor.kind).toBe('torsion');
    expect(tor.coiledFreeLength).toBeNull();
  });

  it('price prints the breaks with their lines, falling unit prices', () => {
    const run = cli(['price', file('q.json', { ...valveSpringMetric, quantities: [100, 1000, 5000] }), '--db', db]);
    expect(run.status, run.stderr).toBe(0);
    const price = JSON.parse(run.stdout);
    expect(price).toMatchObject({ currency: expect.any(String), minimumOrderValue: expect.any(Number) });
    expect(price.breaks.map((b: { quantity: number }) => b.quantity)).toEqual([100, 1000, 5000]);
    for (const b of price.breaks) {
      expect(b.lines.length).toBeGreaterThan(4);
      for (const l of b.lines) expect(l).toEqual({ key: expect.any(String), item: expect.any(String), basis: expect.any(String), amount: expect.any(Number), group: expect.any(String) });
      expect(b.total).toBeCloseTo(b.lines.reduce((a: number, l: { amount: number }) => a + l.amount, 0), 6);
    }
    expect(price.breaks[2].unitPrice).toBeLessThan(price.breaks[0].unitPrice);
  });

  it('price needs a store, and a bad spec is an input error (exit 2)', () => {
    expect(cli(['price', file('p.json', valveSpringMetric)]).status).toBe(2);
    const bad = cli(['price', file('bad.json', { ...valveSpringMetric, wireDiameter: 0 }), '--db', db]);
    expect(bad.status).toBe(2);
    expect(JSON.parse(bad.stderr).errors[0].path).toBe('wireDiameter');
  });
});
