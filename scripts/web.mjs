// npm run web [-- --port N] [-- --db FILE | --store postgres://…]: builds the renderer and the web transport, then serves the
// UI on 127.0.0.1 and prints the address to open. The store defaults to ~/.coilwright/coilwright.db.
import { spawn } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { buildRenderer, buildWebServer } from './build.mjs';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

if (!(await buildRenderer())) {
  console.error('There is no renderer to serve yet (renderer/index.html is missing).');
  process.exit(1);
}
await buildWebServer();

const server = spawn(process.execPath, [path.join(root, 'dist', 'web', 'web-server.cjs'), ...process.argv.slice(2)], {
  cwd: root,
  stdio: 'inherit',
});
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => server.kill(signal));
server.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
