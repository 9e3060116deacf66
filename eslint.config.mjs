// Flat config. The rooms of the code and the fences between them, each a rule that fails the build:
//   core/      platform-free: runs the same in the renderer, the main process, the CLI and plain Node tests
//   db/        the store: core + better-sqlite3 + Node, nothing from the service, the shell or the screens
//   service/   the Node-side programs (service, PDF writers, CLI, web transport): never Electron
//   electron/  the thin desktop shell: the only room that imports 'electron'
//   renderer/  the screens: core/ and their own packages only
// Packages are fenced too: pdfkit and its helpers only in service/pdf, better-sqlite3 only in db/ and the
// Electron binding shims' shared constructor, the PostgreSQL client (pg) only in db/pg.
import tseslint from 'typescript-eslint';

/** Node's built-ins by exact name (a gitignore-style pattern 'http' would also match './http'). */
const nodeBuiltins = '^(node:.*|fs|fs/promises|path|os|child_process|crypto|http|https|url|worker_threads|stream|zlib|net)$';
const electron = ['electron', 'electron/*'];
const pdfWriters = ['pdfkit', 'pdfkit/*', 'svg-to-pdfkit', 'fontkit', 'qrcode'];
const sqlite = ['better-sqlite3'];
/** The PostgreSQL client by exact name: a gitignore-style 'pg' would also match the folder './pg'. */
const postgres = '^(pg|pg/.*|pg-.*)$';
const react = ['react', 'react/*', 'react-dom', 'react-dom/*'];
const fileFormats = ['exceljs', 'exceljs/*', 'csv-parse', 'csv-parse/*', 'csv-stringify', 'csv-stringify/*'];

/** Relative paths into a sibling room, e.g. '../../db' or '../service/api'. */
const into = (...rooms) => rooms.flatMap((room) => [`../${room}`, `../${room}/*`, `**/../${room}`, `**/../${room}/*`]);

const fence = (message, group) => ({ group, message });
const fenceBuiltins = (message) => ({ regex: nodeBuiltins, message });

/** One no-restricted-imports rule per room: ESLint replaces, not merges, a rule set twice for a file. */
function room(files, fences, extra = {}) {
  return {
    files,
    ...extra,
    rules: { 'no-restricted-imports': ['error', { patterns: fences }], ...(extra.rules ?? {}) },
  };
}

const noElectron = fence('Only electron/ imports Electron; the Node side runs without it.', electron);
const noPdf = fence('pdfkit, svg-to-pdfkit, fontkit and qrcode belong to the PDF writers in service/pdf.', pdfWriters);
const noSqlite = fence('better-sqlite3 belongs to db/ (and electron/shell/sqlite-with-binding.ts, under the Electron binding shims).', sqlite);
const noReact = fence('React belongs to renderer/.', react);
const noFileFormats = fence('Spreadsheet and CSV libraries belong to the store\'s exchange (db/), the request-sheet reader (service/request-sheet) and the command line (service/cli); the screens send the file\'s bytes.', fileFormats);
const noPg = { regex: postgres, message: 'The PostgreSQL client (pg) belongs to db/pg: everything else reaches a server store through the Store interface.' };

export default tseslint.config(
  { ignores: ['node_modules/**', 'dist/**', 'bench/results/**', 'test-artifacts/**', 'native/**', 'release/**'] },
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  room(['core/**/*.ts'], [
    fence('core/ is platform-free: no Electron, Node, SQLite, PDF or React imports.',
      [...electron, ...sqlite, ...pdfWriters, ...react, ...fileFormats]),
    noPg,
    fenceBuiltins('core/ is platform-free: no Node built-ins.'),
    fence('core/ reaches no sibling folder: the other rooms depend on core, never the reverse.',
      into('db', 'service', 'electron', 'renderer', 'test', 'bench', 'scripts', 'assets')),
  ], {
    languageOptions: { globals: {} },
    rules: {
      'no-restricted-globals': ['error',
        { name: 'window', message: 'core/ must not touch the DOM.' },
        { name: 'document', message: 'core/ must not touch the DOM.' },
        { name: 'process', message: 'core/ must not read the process.' },
        { name: 'require', message: 'core/ uses ES imports only.' },
      ],
    },
  }),
  room(['db/**/*.ts'], [noElectron, noPdf, noReact, noPg,
    fence('db/ is the store: it uses core/ and nothing from the service, the shell or the screens.',
      into('service', 'electron', 'renderer'))]),
  room(['db/pg/**/*.ts'], [noElectron, noPdf, noReact,
    fence('db/ is the store: it uses core/ and nothing from the service, the shell or the screens.',
      into('service', 'electron', 'renderer'))]),
  room(['service/**/*.ts'], [noElectron, noSqlite, noReact, noPg,
    fence('The Node side does not reach into the desktop shell or the screens.', into('electron', 'renderer'))]),
  room(['service/pdf/**/*.ts'], [noElectron, noSqlite, noReact, noFileFormats, noPg,
    fence('The PDF writers print the document model; they do not reach into the shell or the screens.',
      into('electron', 'renderer'))]),
  room(['service/!(pdf|cli|request-sheet)/**/*.ts'], [noElectron, noSqlite, noPdf, noReact, noFileFormats, noPg,
    fence('The Node side does not reach into the desktop shell or the screens.', into('electron', 'renderer'))]),
  room(['service/cli/**/*.ts', 'service/request-sheet/**/*.ts'], [noElectron, noSqlite, noPdf, noReact, noPg,
    fence('The Node side does not reach into the desktop shell or the screens.', into('electron', 'renderer'))]),
  room(['electron/**/*.ts'], [noPdf, noReact, noSqlite, noFileFormats, noPg, fence('The shell does not reach into the screens.', into('renderer'))]),
  room(['electron/shell/sqlite-with-binding.ts'], [noPdf, noReact, noPg]),
  room(['renderer/**/*.ts', 'renderer/**/*.tsx'], [noElectron, noPdf, noSqlite, noFileFormats, noPg,
    fence('renderer/ talks to the service through its injected Api; it imports only core/ and its own packages.',
      into('db', 'service', 'electron', 'test', 'bench', 'scripts')),
    fenceBuiltins('renderer/ runs in the browser: no Node built-ins.')]),
  room(['renderer/vite.config.mts'], [noElectron]),
);
