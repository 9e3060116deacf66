import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { createDemoShop, openStore } from '../../db';
import { createService, dispatch } from '../../service/api';
import type { DesignAnswer } from '../../core/design';
import type { Job } from '../../core/api';
import valveSeat from '../../examples/valve-seat.requirement.json';

const root = join(__dirname, '..', '..');
const cli = (args: string[]) =>
  spawnSync(process.execPath, ['--import', 'tsx', 'service/cli/main.ts', ...args], { cwd: root, encoding: 'utf8' });

describe('design methods over the store (demo shop)', () => {
  const dir = mkdtempSync(join(tmpdir(), 'coilwright-design-'));

  async function demoService() {
    const service = createService(openStore(join(dir, `shop-${Math.random().toString(36).slice(2)}.db`)));
    createDemoShop(service.store());
    return service;
  }

  it('ranks designs with the store\'s settings and names the field of bad requirement input', async () => {
    const service = await demoService();
    const answer = await dispatch(service.handlers, 'designSprings', { requirement: valveSeat, limit: 3 });
    expect(answer.ok).toBe(true);
    const a = (answer as { value: DesignAnswer }).value;
    expect(a.candidates.map((c) => c.rank)).toEqual([1, 2, 3]);
    const bad = await dispatch(service.handlers, 'designSprings', { requirement: { ...valveSeat, envelope: { bore: 'wide' } } });
    expect(bad).toMatchObject({ ok: false, error: { path: 'requirement.envelope.bore' } });
    service.close();
  });

  it('makes a job from the second design, keeps the requirement with it, and adds a revision to an existing job', async () => {
    const service = await demoService();
    const a = ((await dispatch(service.handlers, 'designSprings', { requirement: valveSeat })) as { value: DesignAnswer }).value;
    const second = a.candidates[1]!;
    const made = await dispatch(service.handlers, 'adoptDesign', { requirement: valveSeat, spec: second.spec, job: { partNumber: 'VS-20 (demo)' } });
    expect(made.ok).toBe(true);
    const job = (made as { value: Job }).value;
    expect(job.spec).toEqual(second.spec);
    const kept = await dispatch(service.handlers, 'jobRequirement', { jobId: job.id });
    expect(kept).toMatchObject({ ok: true, value: { jobId: job.id, jobRevision: 1, requirement: { envelope: { bore: 20 } } } });

    const first = a.candidates[0]!;
    const revised = await dispatch(service.handlers, 'adoptDesign', { requirement: valveSeat, spec: first.spec, jobId: job.id });
    expect(revised).toMatchObject({ ok: true, value: { id: job.id, revision: 2 } });
    const history = await dispatch(service.handlers, 'jobRevisions', { id: job.id });
    expect(history.ok && (history.value as { reason: string }[])[0]!.reason).toMatch(/requirement/);
    expect(await dispatch(service.handlers, 'jobRequirement', { jobId: job.id })).toMatchObject({ ok: true, value: { jobRevision: 2 } });
    service.close();
  });

  it('refuses a spec that does not meet the requirement, and writes nothing', async () => {
    const service = await demoService();
    const a = ((await dispatch(service.handlers, 'designSprings', { requirement: valveSeat })) as { value: DesignAnswer }).value;
    const spoiled = { ...a.candidates[0]!.spec, totalCoils: a.candidates[0]!.figures.totalCoils + 3 };
    const before = await dispatch(service.handlers, 'listJobs', {});
    const refused = await dispatch(service.handlers, 'adoptDesign', { requirement: valveSeat, spec: spoiled });
    expect(refused).toMatchObject({ ok: false, error: { code: 'spec-misses-requirement', path: 'spec' } });
    const after = await dispatch(service.handlers, 'listJobs', {});
    expect((after as { value: { total: number } }).value.total).toBe((before as { value: { total: number } }).value.total);
    expect(await dispatch(service.handlers, 'jobRequirement', { jobId: 1 })).toMatchObject({ ok: false, error: { code: 'no-requirement' } });
    service.close();
  });
});

describe('command line: design', () => {
  const dir = mkdtempSync(join(tmpdir(), 'coilwright-design-cli-'));
  const db = join(dir, 'shop.db');
  beforeAll(() => {
    const run = cli(['demo', '--db', db]);
    expect(run.status, run.stderr).toBe(0);
  });

  it('prints the ranked designs of the example file as JSON, each with its spec', () => {
    const run = cli(['design', join(root, 'examples', 'valve-seat.requirement.json'), '--db', db, '--limit', '4']);
    expect(run.status, run.stderr).toBe(0);
    const a = JSON.parse(run.stdout) as DesignAnswer;
    expect(a.candidates.length).toBe(4);
    for (const c of a.candidates) expect(c.spec).toMatchObject({ kind: 'compression', units: 'metric' });
    expect(a.caution).toMatch(/qualified engineer/);
  });

  it('designs the example extension spring the same way', () => {
    const run = cli(['design', join(root, 'examples', 'lid-stay.requirement.json'), '--db', db, '--limit', '2']);
    expect(run.status, run.stderr).toBe(0);
    const a = JSON.parse(run.stdout) as DesignAnswer;
    expect(a.kind).toBe('extension');
    expect(a.candidates.map((c) => c.spec.kind)).toEqual(['extension', 'extension']);
  });

  it('runs the search again for a job from the requirement kept with it', async () => {
    const service = createService(openStore(db));
    const a = ((await dispatch(service.handlers, 'designSprings', { requirement: valveSeat })) as { value: DesignAnswer }).value;
    const made = (await dispatch(service.handlers, 'adoptDesign', { requirement: valveSeat, spec: a.candidates[0]!.spec })) as { value: Job };
    service.close();
    const run = cli(['design', '--job', String(made.value.id), '--db', db, '--limit', '2']);
    expect(run.status, run.stderr).toBe(0);
    expect((JSON.parse(run.stdout) as DesignAnswer).candidates[0]!.spec).toEqual(a.candidates[0]!.spec);
    const none = cli(['design', '--job', '1', '--db', db]);
    expect(none.status).toBe(2);
    expect(JSON.parse(none.stderr).errors[0].code).toBe('no-requirement');
  });

  it('answers bad input with field errors and exit code 2', () => {
    const file = join(dir, 'bad.requirement.json');
    writeFileSync(file, JSON.stringify({ ...valveSeat, function: { type: 'two-loads', loads: [{ length: 40, force: 60 }] } }));
    const run = cli(['design', file, '--db', db]);
    expect(run.status).toBe(2);
    expect(JSON.parse(run.stderr).errors[0].path).toMatch(/^function\.loads/);
    expect(cli(['design', file, '--limit', 'ten']).status).toBe(2);
  });
});
