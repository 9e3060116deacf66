import Database from 'better-sqlite3';

/**
 * The better-sqlite3 constructor with `nativeBinding` filled in from `binding()` unless the caller gives one:
 * what both shims (the main process's and the store-update worker's) hand to db/, which stays unaware of the runtime.
 */
export function databaseWithBinding(binding: () => string | undefined): typeof Database {
  function BoundDatabase(filename?: string | Buffer, options: Database.Options = {}): Database.Database {
    const nativeBinding = options.nativeBinding ?? binding();
    return new Database(filename, nativeBinding === undefined ? options : { ...options, nativeBinding });
  }
  BoundDatabase.prototype = Database.prototype;
  BoundDatabase.SqliteError = Database.SqliteError;
  return BoundDatabase as unknown as typeof Database;
}
