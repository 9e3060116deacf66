// npm run cli -- <command> …: runs the command line as built JavaScript (dist/cli/cli.cjs), rebuilding
// the bundle first only when a source file is newer than it, so a call costs Node's start-up and the
// modules its command loads, not a TypeScript compile.
import { readdirSync, readFileSync, renameSync, statSync, writeFileSync } from 'node:fs';
import Module, { createRequire } from 'node:module';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import vm from 'node:vm';

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
/**
 * Loads the bundle as require would, with V8's compiled code kept beside it (dist/cli/cli.cjs.v8-cache):
 * parsing and compiling the bundle is most of a short command's time. V8 refuses a cache that does not
 * match the bundle or the Node build, and the cache is then written anew after the command.
 */
function loadBundle() {
  const cacheFile = `${bundle}.v8-cache`;
  let cachedData;
  try {
    cachedData = readFileSync(cacheFile);
  } catch {
    cachedData = undefined;
  }
  // The bundle has no import() (see cliOptions): code from a cache would have lost what import() needs.
  const script = new vm.Script(Module.wrap(readFileSync(bundle, 'utf8')), { filename: bundle, cachedData });
  const module = { exports: {}, filename: bundle, id: bundle };
  script.runInThisContext().call(module.exports, module.exports, createRequire(bundle), module, bundle, path.dirname(bundle));
  const keep = () => {
    if (cachedData && !script.cachedDataRejected) return;
    try {
      const partial = `${cacheFile}.${process.pid}.tmp`;
      writeFileSync(partial, script.createCachedData());
      renameSync(partial, cacheFile);
    } catch {
      // A cache that cannot be written only costs the next command its compile time.
    }
  };
  return { runCli: module.exports.runCli, keep };
}

const { runCli, keep } = loadBundle();
process.exitCode = await runCli(process.argv.slice(2));
keep();
