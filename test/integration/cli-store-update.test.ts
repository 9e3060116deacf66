// A large store written by the version before is brought up to this one's schema as the command line opens it,
// and the command says so on standard error first, so a long pause is explained. A small store says nothing.
import { spawnSync } from 'node:child_process';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { LATEST_VERSION, storeBytes } from '../../db';
import { NOTICE_FROM_BYTES } from '../../service/host/store-update';
import { tempDir } from './db/helpers';
import { schemaVersionOfFile, writeStoreOneVersionBehind } from '../support/large-store';

const root = resolve(__dirname, '../..');
const cli = (...args: string[]) => spawnSync(process.execPath, ['--import', 'tsx', 'service/cli/main.ts', ...args], { cwd: root, encoding: 'utf8' });

function storeOneVersionBehind(sheets: number): string {
  const file = join(tempDir(), 'shop.db');
  writeStoreOneVersionBehind(file, sheets);
  return file;
}

describe('the command line on a store of the version before', () => {
  it('says it is updating a large store, then does the command', () => {
    const file = storeOneVersionBehind(2);
    expect(storeBytes(file)).toBeGreaterThan(NOTICE_FROM_BYTES);
    const listed = cli('jobs', 'list', '--db', file);
    expect(listed.status, listed.stderr).toBe(0);
    expect(listed.stderr).toContain('Updating the job store for this version of Coilwright:');
    expect(listed.stderr).toContain(`from schema version ${LATEST_VERSION - 1} to ${LATEST_VERSION}`);
    expect(listed.stdout).toContain('QX-7 (demo)');
    expect(schemaVersionOfFile(file)).toBe(LATEST_VERSION);
    expect(cli('jobs', 'list', '--db', file).stderr).not.toContain('Updating the job store');
  });

  it('updates a small store without a word', () => {
    const file = storeOneVersionBehind(0);
    const listed = cli('jobs', 'list', '--db', file);
    expect(listed.status, listed.stderr).toBe(0);
    expect(listed.stderr).toBe('');
    expect(schemaVersionOfFile(file)).toBe(LATEST_VERSION);
  });
});

