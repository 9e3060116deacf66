// The fences between the rooms of the code are lint rules; each must fail the build when crossed and stay
// quiet for the imports each room is meant to have. Linted as text under the room's own path, so nothing
// is written into the tree.
import { ESLint } from 'eslint';
import { describe, expect, it } from 'vitest';

const eslint = new ESLint({ cwd: process.cwd() });

async function restrictedImports(filePath: string, code: string): Promise<string[]> {
  const [result] = await eslint.lintText(code, { filePath });
  return (result?.messages ?? [])
    .filter((m) => m.ruleId === 'no-restricted-imports')
    .map((m) => m.message);
}

const crossings: Array<[room: string, file: string, code: string]> = [
  ['core/ importing Node', 'core/spec/fence-probe.ts', "import { readFileSync } from 'node:fs'; export const x = readFileSync;"],
  ['core/ importing a bare Node built-in', 'core/spec/fence-probe.ts', "import path from 'path'; export const x = path;"],
  ['core/ reaching db/', 'core/spec/fence-probe.ts', "import { openStore } from '../../db'; export const x = openStore;"],
  ['core/ reaching the service', 'core/spec/fence-probe.ts', "import { dispatch } from '../../service/api'; export const x = dispatch;"],
  ['db/ importing Electron', 'db/jobs/fence-probe.ts', "import { app } from 'electron'; export const x = app;"],
  ['db/ reaching the service', 'db/jobs/fence-probe.ts', "import { renderQuote } from '../../service/pdf'; export const x = renderQuote;"],
  ['the service importing Electron', 'service/api/fence-probe.ts', "import { app } from 'electron'; export const x = app;"],
  ['the PDF writers importing Electron', 'service/pdf/fence-probe.ts', "import { app } from 'electron'; export const x = app;"],
  ['the CLI importing pdfkit', 'service/cli/fence-probe.ts', "import PDFDocument from 'pdfkit'; export const x = PDFDocument;"],
  ['the web transport importing qrcode', 'service/web/fence-probe.ts', "import QRCode from 'qrcode'; export const x = QRCode;"],
  ['the service importing better-sqlite3', 'service/api/fence-probe.ts', "import Database from 'better-sqlite3'; export const x = Database;"],
  ['the service reaching the shell', 'service/web/fence-probe.ts', "import { createMenu } from '../../electron/shell/menu'; export const x = createMenu;"],
  ['the shell importing better-sqlite3', 'electron/shell/fence-probe.ts', "import Database from 'better-sqlite3'; export const x = Database;"],
  ['a binding shim importing better-sqlite3 past the shared constructor', 'electron/shell/sqlite-electron-worker.ts', "import Database from 'better-sqlite3'; export const x = Database;"],
  ['the shell importing pdfkit', 'electron/fence-probe.ts', "import PDFDocument from 'pdfkit'; export const x = PDFDocument;"],
  ['the renderer reaching db/', 'renderer/model/fence-probe.ts', "import { openStore } from '../../db'; export const x = openStore;"],
  ['the renderer reaching the service', 'renderer/model/fence-probe.ts', "import { dispatch } from '../../service/api'; export const x = dispatch;"],
  ['the renderer importing Node', 'renderer/model/fence-probe.ts', "import os from 'node:os'; export const x = os;"],
  ['core/ importing the spreadsheet reader', 'core/request-sheet/fence-probe.ts', "import ExcelJS from 'exceljs'; export const x = ExcelJS;"],
  ['the renderer importing the CSV reader', 'renderer/model/fence-probe.ts', "import { parse } from 'csv-parse/sync'; export const x = parse;"],
  ['the web transport importing csv-parse', 'service/web/fence-probe.ts', "import { parse } from 'csv-parse/sync'; export const x = parse;"],
  ['the renderer importing csv-stringify', 'renderer/model/fence-probe.ts', "import { stringify } from 'csv-stringify/sync'; export const x = stringify;"],
  ['the renderer importing Electron', 'renderer/api/fence-probe.ts', "import { ipcRenderer } from 'electron'; export const x = ipcRenderer;"],
  ['core/ importing pg', 'core/spec/fence-probe.ts', "import pg from 'pg'; export const x = pg;"],
  ['the SQLite store importing pg', 'db/jobs/fence-probe.ts', "import pg from 'pg'; export const x = pg;"],
  ['the service importing pg', 'service/api/fence-probe.ts', "import { Client } from 'pg'; export const x = Client;"],
  ['the CLI importing pg', 'service/cli/fence-probe.ts', "import pg from 'pg'; export const x = pg;"],
];

const allowed: Array<[room: string, file: string, code: string]> = [
  ['core/ importing zod and itself', 'core/spec/fence-probe.ts', "import { z } from 'zod'; import { calculate } from '../calculate'; export const x = [z, calculate];"],
  ['db/ importing better-sqlite3 and core', 'db/jobs/fence-probe.ts', "import Database from 'better-sqlite3'; import { parseSpec } from '../../core/spec'; export const x = [Database, parseSpec];"],
  ['db/ importing csv-parse and csv-stringify', 'db/exchange/fence-probe.ts', "import { parse } from 'csv-parse'; import { stringify } from 'csv-stringify/sync'; export const x = [parse, stringify];"],
  ['the CLI importing csv-parse', 'service/cli/fence-probe.ts', "import { parse } from 'csv-parse/sync'; export const x = parse;"],
  ['the PDF writers importing pdfkit', 'service/pdf/fence-probe.ts', "import PDFDocument from 'pdfkit'; export const x = PDFDocument;"],
  ['the CLI importing db/ and the PDF writers', 'service/cli/fence-probe.ts', "import { openStore } from '../../db'; import { renderQuote } from '../pdf'; export const x = [openStore, renderQuote];"],
  ['the request-sheet reader importing exceljs and csv-parse', 'service/request-sheet/fence-probe.ts', "import ExcelJS from 'exceljs'; import { parse } from 'csv-parse/sync'; export const x = [ExcelJS, parse];"],
  ['the shell importing Electron and the service', 'electron/shell/fence-probe.ts', "import { app } from 'electron'; import { dispatch } from '../../service/api'; export const x = [app, dispatch];"],
  ['db/pg importing pg and the store', 'db/pg/fence-probe.ts', "import pg from 'pg'; import { StoreError } from '../errors'; export const x = [pg, StoreError];"],
  ['the binding shims\' shared constructor importing better-sqlite3', 'electron/shell/sqlite-with-binding.ts', "import Database from 'better-sqlite3'; export const x = Database;"],
  ['the renderer importing React, core and its own files', 'renderer/model/fence-probe.ts', "import { useState } from 'react'; import { parseSpec } from '../../core/spec'; import { x as http } from '../api/http'; export const x = [useState, parseSpec, http];"],
];

describe('lint fences between the rooms (eslint.config.mjs)', () => {
  it.each(crossings)('refuses %s', async (_room, file, code) => {
    expect(await restrictedImports(file, code)).not.toEqual([]);
  });

  it.each(allowed)('allows %s', async (_room, file, code) => {
    expect(await restrictedImports(file, code)).toEqual([]);
  });
});
