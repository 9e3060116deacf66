import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

/**
 * The fuses electron-builder flips in the packaged binary, read from electron-builder.yml. The list and the
 * reason for each setting follow Electron's "Electron Fuses" documentation (electronjs.org/docs/latest/tutorial/fuses).
 */
const expected: Record<string, { value: boolean; why: string }> = {
  runAsNode: { value: false, why: 'ELECTRON_RUN_AS_NODE would turn the app into a plain Node that runs any script' },
  enableCookieEncryption: { value: true, why: 'cookies on disk are encrypted with the OS key store' },
  enableNodeOptionsEnvironmentVariable: { value: false, why: 'NODE_OPTIONS could inject code into the main process' },
  enableNodeCliInspectArguments: { value: false, why: '--inspect would let another program drive the main process' },
  enableEmbeddedAsarIntegrityValidation: { value: true, why: 'a changed app.asar is refused' },
  onlyLoadAppFromAsar: { value: true, why: 'a loose app folder beside the binary is never loaded instead' },
  loadBrowserProcessSpecificV8Snapshot: { value: false, why: 'one V8 snapshot; no separate browser snapshot file to swap' },
  grantFileProtocolExtraPrivileges: { value: false, why: 'file:// pages get no extra powers; the UI is served over app://' },
};

/** The `electronFuses:` block of the YAML file: `key: true|false` lines indented under it, comments skipped. */
export function readFuses(yaml: string): Record<string, string> {
  const lines = yaml.split(/\r?\n/);
  const start = lines.findIndex((l) => /^electronFuses:\s*(#.*)?$/.test(l));
  if (start < 0) return {};
  const fuses: Record<string, string> = {};
  for (const line of lines.slice(start + 1)) {
    if (/^\s*(#.*)?$/.test(line)) continue;
    const m = /^\s+([A-Za-z][A-Za-z0-9]*):\s*([^#\s]+)\s*(#.*)?$/.exec(line);
    if (!m) break;
    fuses[m[1]!] = m[2]!;
  }
  return fuses;
}

describe('packaging fuses in electron-builder.yml', () => {
  const fuses = readFuses(readFileSync(path.join(__dirname, '../../electron-builder.yml'), 'utf8'));

  it.each(Object.entries(expected))('sets %s as it must be', (name, { value, why }) => {
    expect(fuses[name], `${name}: ${why}`).toBe(String(value));
  });

  it('sets no fuse it does not know the reason for', () => {
    expect(Object.keys(fuses).sort()).toEqual(Object.keys(expected).sort());
  });

  it('reads a fuse left on as on', () => {
    expect(readFuses('electronFuses:\n  # note\n  runAsNode: true\nmac:\n  target: dmg\n')).toEqual({ runAsNode: 'true' });
  });
});
