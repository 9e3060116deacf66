import path from 'node:path';

export interface BindingContext {
  /** process.versions.electron: undefined under plain Node. */
  electronVersion: string | undefined;
  isPackaged: boolean;
  /** The project root in an unpackaged run (app.getAppPath()). */
  appPath: string;
  exists: (file: string) => boolean;
}

export type BindingChoice =
  | { ok: true; value: string | undefined }
  | { ok: false; error: { code: string; message: string; path: string } };

/** Where the Electron-ABI build of better-sqlite3 lives, beside (never inside) node_modules. */
export function electronBindingPath(appPath: string, electronVersion: string): string {
  const major = electronVersion.split('.')[0];
  return path.join(appPath, 'native', `electron-${major}`, 'better_sqlite3.node');
}

/**
 * node_modules keeps the Node build that tests and the CLI use. An unpackaged Electron run loads the
 * separate Electron build instead; a packaged app was rebuilt in place by the release job, so the
 * default lookup is right there (value undefined).
 */
export function chooseSqliteBinding(ctx: BindingContext): BindingChoice {
  if (ctx.electronVersion === undefined || ctx.isPackaged) return { ok: true, value: undefined };
  const file = electronBindingPath(ctx.appPath, ctx.electronVersion);
  if (ctx.exists(file)) return { ok: true, value: file };
  return {
    ok: false,
    error: {
      code: 'native-binding-missing',
      message: `The database library built for Electron ${ctx.electronVersion} is missing (${file}). `
        + 'Run "node scripts/build-native-electron.mjs" once on a machine with internet access.',
      path: file,
    },
  };
}
