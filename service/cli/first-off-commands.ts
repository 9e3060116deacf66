import type { SetCalibration } from '../../core/process/set-calibration';
import { NO_RECORDS, calibrateSet, calibrationInSpecUnits } from '../../core/process/set-calibration';
import { setModelValues } from '../../core/process/set-model-values';
import type { SetRemovalGoverning } from '../../core/springs/compression/set-removal';
import { findGrade } from '../../core/materials';
import type { Spec } from '../../core/spec';
import type { Command } from './commands';
import { subcommandOf } from './commands';
import type { ParsedArgs } from './io';
import { InputError, readJson, toJson } from './io';
import type { Caller } from './store-session';
import { jobRef, positional, withStore } from './store-session';

/** The record file may name its job itself; --job ID|NUMBER names it on the command line instead. */
async function recordInput(args: ParsedArgs, call: Caller): Promise<unknown> {
  const raw = readJson(positional(args, 1, 'FILE', 'first-off record'));
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    throw new InputError([{ code: 'not-an-object', path: '', message: 'a first-off record file must be a JSON object' }]);
  }
  const ref = args.options.get('job');
  if (typeof ref !== 'string') return raw;
  return { ...raw, jobId: (await call('getJob', jobRef(ref))).id };
}

type Sub = (args: ParsedArgs, call: Caller) => Promise<unknown>;

const subcommands: Record<string, Sub> = {
  record: async (args, call) => call('recordFirstOff', await recordInput(args, call) as never),
  list: async (args, call) => call('listFirstOff', { jobId: (await call('getJob', jobRef(positional(args, 1, 'ID', 'first-off list')))).id }),
  calibrate: async (args, call) => call('setCalibration', { spec: specOf(readJson(positional(args, 1, 'SPECFILE', 'first-off calibrate'))) }),
};

/** A spec file, or a job file whose spec is used. */
function specOf(raw: unknown): unknown {
  const isJobFile = typeof raw === 'object' && raw !== null && !('kind' in raw) && 'spec' in raw;
  return isJobFile ? (raw as { spec: unknown }).spec : raw;
}

export const firstOffCommand: Command = {
  name: 'first-off',
  usage: [
    'first-off record FILE [--job ID|NUMBER] --db DB   store a first-off record ({"units":…,"coiledFreeLength":…,"freeLengthAfterSet":…,',
    '  "forces":[{"length":…,"force":…}],"outerDiameter":…,"measuredOn":"YYYY-MM-DD","measuredBy":…}) in the job\'s units',
    '  first-off list ID|NUMBER --db DB, first-off calibrate SPECFILE --db DB   the coiled free length calibrated by past records',
  ].join('\n'),
  async run(args, out) {
    const sub = subcommandOf('first-off', args, subcommands);
    out(toJson(await withStore(args, (call) => sub(args, call))));
  },
};

/** The calibration `sheet` prints beside the plan: through the API over the store named by --db, else the model's value with why. */
export async function sheetCalibration(args: ParsedArgs, spec: Spec, method: SetRemovalGoverning): Promise<SetCalibration> {
  if (typeof args.options.get('db') === 'string') return withStore(args, (call) => call('setCalibration', { spec }));
  const target = { materialFamily: findGrade(spec.material)?.family ?? 'unknown', units: spec.units, model: setModelValues(spec, method) };
  const c = calibrationInSpecUnits(calibrateSet(target, []));
  return c.reason === NO_RECORDS ? { ...c, reason: 'no job store named (--db), so no first-off records: the model\'s coiled free length stands' } : c;
}
