import { parsePrintFile } from '../../core/documents';
import type { Spec } from '../../core/spec';
import { defaultSettings } from '../../core/settings/schema';
import type { Settings } from '../../core/settings/schema';
import { planInSpecUnits, planManufacture } from '../../core/process/plan';
import { estimateCost } from '../../core/costing/estimate';
import { StoreError, getSettings, openStore } from '../../db';
import type { Command } from './commands';
import type { ParsedArgs } from './io';
import { InputError, readJson, toJson } from './io';
import { cliOpenOptions, intOption, positional, withStore } from './store-session';
import { runBatch } from './batch';
import type { SetCalibration } from '../../core/process/set-calibration';
import { sheetCalibration } from './first-off-commands';

/** A spec file, or a job file (checked as `jobs add` and `print` check it) whose `spec` and `orderQuantity` are used. */
export function specAndQuantity(raw: unknown): { spec: Spec; orderQuantity?: number } {
  const parsed = parsePrintFile(raw);
  if (!parsed.ok) throw new InputError(parsed.errors);
  return { spec: parsed.value.spec, orderQuantity: parsed.value.orderQuantity ?? undefined };
}

/** The shop's settings from --db, or a new shop's defaults when no store is named. */
export function settingsFor(args: ParsedArgs, required: boolean): Settings {
  const file = args.options.get('db');
  if (typeof file !== 'string') {
    if (required) throw new InputError([{ code: 'missing-option', path: '--db', message: '--db is required' }]);
    return defaultSettings();
  }
  try {
    const store = openStore(file, cliOpenOptions(args));
    try {
      const settings = getSettings(store);
      if (!settings.ok) throw new InputError([{ code: settings.error.code, message: settings.error.message, path: '--db' }]);
      return settings.value;
    } finally {
      store.close();
    }
  } catch (e) {
    if (e instanceof StoreError) throw new InputError([{ code: e.code, message: e.message, path: '--db' }]);
    throw e;
  }
}

/** Order quantity: --quantity, else the job file's, else the spec's first break, else 100. */
function orderQuantity(args: ParsedArgs, fromFile: number | undefined, spec: Spec): number {
  const q = intOption(args, 'quantity') ?? fromFile ?? spec.quantities?.[0] ?? 100;
  if (!(q >= 1)) throw new InputError([{ code: 'invalid-option', path: '--quantity', message: 'the order quantity must be at least 1' }]);
  return q;
}

type Calibrate = (spec: Spec) => Promise<SetCalibration>;

async function sheetOf(raw: unknown, args: ParsedArgs, settings: Settings, calibrate: Calibrate): Promise<unknown> {
  const { spec, orderQuantity: fromFile } = specAndQuantity(raw);
  const plan = planManufacture(spec, settings, orderQuantity(args, fromFile, spec));
  return { ...planInSpecUnits(plan), setCalibration: await calibrate(spec) };
}

const BATCH_NOTE = '--batch FILE|-: many specs or job files, one JSON line each (as calc --batch)';

export const sheetCommand: Command = {
  name: 'sheet',
  usage: [
    'sheet FILE [--db DB] [--quantity N]   manufacturing plan: routing, wire, inspection, set calibration by first-off records (JSON)',
    `  sheet --batch FILE|- [--db DB] [--quantity N]   ${BATCH_NOTE}; the store opens once`,
  ].join('\n'),
  async run(args, out) {
    const settings = settingsFor(args, false);
    const method = settings.defaults.setRemovalMethod;
    if (!args.options.has('batch')) {
      out(toJson(await sheetOf(readJson(positional(args, 0, 'FILE', 'sheet')), args, settings, (spec) => sheetCalibration(args, spec, method))));
      return undefined;
    }
    if (typeof args.options.get('db') !== 'string') return runBatch(args, out, (raw) => sheetOf(raw, args, settings, (spec) => sheetCalibration(args, spec, method)));
    return withStore(args, (call) => runBatch(args, out, (raw) => sheetOf(raw, args, settings, (spec) => call('setCalibration', { spec }))));
  },
};

export const priceCommand: Command = {
  name: 'price',
  usage: [
    'price FILE --db DB               cost and unit price at each quantity break (JSON)',
    `  price --batch FILE|- --db DB     ${BATCH_NOTE}`,
  ].join('\n'),
  run(args, out) {
    const settings = settingsFor(args, true);
    const priced = (raw: unknown) => estimateCost(specAndQuantity(raw).spec, settings);
    if (args.options.has('batch')) return runBatch(args, out, priced);
    out(toJson(priced(readJson(positional(args, 0, 'FILE', 'price')))));
    return undefined;
  },
};
