// Bundles the benchmark the way the app ships its code (one esbuild bundle, no on-the-fly
// transpiler), then runs it. Arguments pass through: `npm run bench -- engine`.
import { build } from 'esbuild';
import { spawnSync } from 'node:child_process';

const outfile = 'dist/bench/run.cjs';
const common = {
  bundle: true,
  platform: 'node',
  target: 'node20',
  format: 'cjs',
  outfile,
  external: ['better-sqlite3', 'pg', 'pdfkit', 'svg-to-pdfkit', 'fontkit', 'qrcode', 'pdf-parse', 'playwright-core', 'electron'],
  logLevel: 'warning',
};
await build({ ...common, entryPoints: ['bench/run.ts'], outfile });
// The export and import the store suites measure run as their own small program (peak memory of their own).
await build({ ...common, entryPoints: ['bench/exchange-child.ts'], outfile: 'dist/bench/exchange-child.cjs' });
const run = spawnSync(process.execPath, ['--expose-gc', outfile, ...process.argv.slice(2)], { stdio: 'inherit' });
process.exit(run.status ?? 1);
