// npm run cli -- <command> …: runs the command line as built JavaScript (dist/cli/cli.cjs), rebuilding
// the bundle first only when a source file is newer than it, so a call costs Node's start-up and the
// modules its command loads, not a TypeScript compile.
import { readdirSync, statSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const bundle = path.join(root, 'dist', 'cli', 'cli.cjs');
const SOURCES = ['core', 'db', 'service'];

function newestIn(dir) {
  let newest = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    newest = Math.max(newest, entry.isDirectory() ? newestIn(full) : statSync(full).mtimeMs);
  }
  return newest;
}

function stale() {
  let built;
  try {
    built = statSync(bundle).mtimeMs;
  } catch {
    return true;
  }
  const sources = [path.join(root, 'package.json'), path.join(root, 'scripts', 'build.mjs')].map((f) => statSync(f).mtimeMs);
  return Math.max(...sources, ...SOURCES.map((d) => newestIn(path.join(root, d)))) > built;
}

if (stale()) {
  try {
    await (await import('./build.mjs')).buildCli();
  } catch (e) {
    console.error(`The command line could not be built from the sources: ${e.errors?.[0]?.text ?? e.message}`);
    process.exit(1);
  }
}
const { runCli } = createRequire(import.meta.url)(bundle);
process.exitCode = await runCli(process.argv.slice(2));
