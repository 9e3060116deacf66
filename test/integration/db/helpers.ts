import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach } from 'vitest';
import type { SqliteStore as Store } from '../../../db';
import { openStore } from '../../../db';

const dirs: string[] = [];
const stores: Store[] = [];

/** A fresh temp folder, removed after the test. */
export function tempDir(): string {
  const dir = mkdtempSync(join(tmpdir(), 'coilwright-db-'));
  dirs.push(dir);
  return dir;
}

/** A new store in a temp folder, closed after the test. */
export function tempStore(clock?: () => Date): Store {
  const store = openStore(join(tempDir(), 'shop.db'), clock ? { clock } : {});
  stores.push(store);
  return store;
}

export function track(store: Store): Store {
  stores.push(store);
  return store;
}

afterEach(() => {
  for (const s of stores.splice(0)) if (s.db.open) s.close();
  for (const d of dirs.splice(0)) rmSync(d, { recursive: true, force: true });
});

export function sha256(file: string): string {
  return createHash('sha256').update(readFileSync(file)).digest('hex');
}

/** A metric compression spec; override any field. */
export function spec(over: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: 2, outerDiameter: 20,
    totalCoils: 10, ends: 'closed-ground', freeLength: 50, ...over,
  };
}

/** A job input around `spec()`. */
export function job(over: Record<string, unknown> = {}, specOver: Record<string, unknown> = {}): Record<string, unknown> {
  return { customer: { name: 'Fernhill Gauges (test)' }, partNumber: 'FG-100', drawingNumber: 'FG-D-100', drawingRevision: 'A', spec: spec(specOver), ...over };
}

export function value<T>(result: { ok: true; value: T } | { ok: false; error: unknown }): T {
  if (!result.ok) throw new Error(`expected ok, got ${JSON.stringify(result.error)}`);
  return result.value;
}

/** A clock that moves on one second per call, so stamps are distinct and ordered. */
export function steppingClock(start = Date.parse('2026-03-02T08:00:00Z')): () => Date {
  let t = start;
  return () => new Date((t += 1000));
}

/** Total coils of a stored compression spec (specs are a union of kinds). */
export function totalCoils(s: { kind: string }): number | undefined {
  return (s as { totalCoils?: number }).totalCoils;
}
