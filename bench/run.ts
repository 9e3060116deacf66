import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { BenchRow, BenchSuite } from './harness';
import { engineSuite } from './suites/engine';
import { storeMillionSuite, storeSuite } from './suites/store';
import { documentsSuite } from './suites/documents';
import { rendererSuite } from './suites/renderer';
import { quotingSuite } from './suites/quoting';
import { cliSuite } from './suites/cli';
import { crashSuite } from './suites/crash';
import { designSuite } from './suites/design';
import { fuzzSuite } from './suites/fuzz';
import { requestSheetSuite } from './suites/request-sheet';
import { storeServiceSuite } from './suites/store-service';
import { storePgSuite } from './suites/store-pg';
import { pgWriter, storePgLoadSuite } from './suites/store-pg-load';

const suites: BenchSuite[] = [engineSuite, storeSuite, storeServiceSuite, storePgSuite, storePgLoadSuite, storeMillionSuite, documentsSuite, rendererSuite, cliSuite, designSuite, fuzzSuite, crashSuite, quotingSuite, requestSheetSuite];

async function main(): Promise<void> {
  const only = process.argv[2];
  // A writer process of the PostgreSQL load suite (it starts copies of this bundle with these arguments).
  if (only === '--pg-writer') return pgWriter(process.argv[3]!, Number(process.argv[4]), Number(process.argv[5]));
  const rows: BenchRow[] = [];
  for (const suite of suites) {
    if (only ? suite.name !== only : suite.onlyWhenAsked) continue;
    rows.push(...(await suite.run()));
  }
  const dir = join(process.cwd(), 'bench', 'results');
  mkdirSync(dir, { recursive: true });
  const stamp = new Date().toISOString().replace(/[:.]/g, '-');
  const file = join(dir, `bench-${stamp}.json`);
  writeFileSync(file, JSON.stringify({ date: new Date().toISOString(), node: process.version, rows }, null, 2));
  console.table(rows.map((r) => ({
    suite: r.suite, measure: r.name, value: Number(r.value.toPrecision(4)), unit: r.unit,
    target: r.target ?? '', pass: r.pass === undefined ? '' : r.pass ? 'yes' : 'NO',
  })));
  console.log(`written ${file}`);
}

void main();
