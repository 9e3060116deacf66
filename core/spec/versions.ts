import type { FieldError, Result } from '../result';
import { fail, fieldError, ok } from '../result';

/** A spec as JSON gives it, before the schema has looked at it. */
export type RawSpec = Record<string, unknown>;

/** Turns a spec of one version into the next: renames, moved fields, new defaults that change a meaning. */
export type SpecUpgrade = (spec: RawSpec) => RawSpec;

/**
 * The declared steps between spec versions, oldest first: entry i turns version i + 1 into version i + 2.
 * A spec without `version` is version 1, the first shape ever stored. Changing the spec's shape in a way
 * an older file would no longer pass means appending a step here; SPEC_VERSION follows from the table.
 * Version 1 is the only one so far, so there is no step yet.
 */
export const specUpgrades: readonly SpecUpgrade[] = [];

export const SPEC_VERSION = specUpgrades.length + 1;

function versionOf(raw: RawSpec): Result<number> {
  const v = raw.version;
  if (v === undefined) return ok(1);
  if (typeof v !== 'number' || !Number.isInteger(v) || v < 1) {
    return fail([fieldError('invalid-version', 'version', 'version must be a whole number from 1')]);
  }
  return ok(v);
}

function tooNew(version: number, current: number): FieldError {
  return fieldError('spec-too-new', 'version',
    `this spec is version ${version}, written by a newer Coilwright; this one reads specs up to version ${current}: update Coilwright to read it`);
}

/**
 * Brings a spec object of any known version to the current one by the declared steps, each in turn.
 * A spec already current comes back as it was (the same object), so nothing changes for current files.
 */
export function upgradeSpec(raw: RawSpec, steps: readonly SpecUpgrade[] = specUpgrades): Result<RawSpec> {
  const current = steps.length + 1;
  const version = versionOf(raw);
  if (!version.ok) return version;
  if (version.value > current) return fail([tooNew(version.value, current)]);
  let spec = raw;
  for (let v = version.value; v < current; v++) spec = { ...steps[v - 1]!(spec), version: v + 1 };
  return ok(spec);
}
