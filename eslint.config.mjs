// Flat config. The rule that matters most: core/ is platform-free, so it runs the same in the
// renderer, the main process, the CLI and plain Node tests.
import tseslint from 'typescript-eslint';

const platformModules = [
  'electron', 'electron/*', 'node:*', 'better-sqlite3', 'pdfkit', 'svg-to-pdfkit', 'react', 'react-dom',
  'react/*', 'react-dom/*', 'fs', 'path', 'os', 'child_process', 'crypto', 'http', 'url', 'worker_threads',
];

export default tseslint.config(
  { ignores: ['node_modules/**', 'dist/**', 'bench/results/**', 'test-artifacts/**', 'native/**', 'release/**'] },
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['core/**/*.ts'],
    languageOptions: { globals: {} },
    rules: {
      'no-restricted-imports': ['error', {
        patterns: [{ group: platformModules, message: 'core/ is platform-free: no Electron, Node, SQLite, PDF or React imports.' }],
      }],
      'no-restricted-globals': ['error',
        { name: 'window', message: 'core/ must not touch the DOM.' },
        { name: 'document', message: 'core/ must not touch the DOM.' },
        { name: 'process', message: 'core/ must not read the process.' },
        { name: 'require', message: 'core/ uses ES imports only.' },
      ],
    },
  },
);
