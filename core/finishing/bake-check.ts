/** Findings for the bake specification named on an order, for one strength and (optionally) the planned bake. */
import type { Finding, Severity } from '../result';
import { formatQuantity } from '../format';
import type { UnitSystem } from '../units';
import type { BakeStatement } from './bake-rules';
import type { BakeOptions, PlannedBake } from './bake-guidance';
import { bakeGuidance, parseBakeCondition, parseBakeSpecification } from './bake-guidance';
import { bakeSpecNames } from './bake-specs';

export type { PlannedBake } from './bake-guidance';

/** The specifications the check knows, as a drawing or an order writes them. */
const KNOWN = Object.values(bakeSpecNames).join(', ');


export interface CheckOptions extends BakeOptions {
  planned?: PlannedBake;
  /** Field path of the named specification; default "bakeSpecification" (the spec's field). */
  path?: string;
  /** Field path of the planned bake; default "bake". */
  planPath?: string;
}

type Sink = Finding[];
const add = (out: Sink, severity: Severity, code: string, path: string, message: string, fix = ''): void => {
  out.push({ code, severity, message, path, fix });
};

const NAMED = 'name the specification on the order so it prints on the traveller and the plating purchase order';

/** An error once ASTM B850 calls the strength high enough to matter; below that, a note. */
function checkMissing(all: readonly BakeStatement[], strength: string, path: string, out: Sink): void {
  const b850 = all.find((s) => s.spec === 'astm-b850');
  const requiring = all.filter((s) => s.spec !== 'spring-maker-practice' && s.status === 'bake');
  const severity: Severity = b850?.status === 'no-bake' ? 'note' : 'error';
  add(out, severity, 'bake-spec-missing', path,
    `electroplated steel of ${strength} and no hydrogen-relief bake specification named` +
    (requiring.length > 0 ? `; ${requiring.map((s) => s.title).join(', ')} call for a bake at this strength` : ''),
    `${NAMED} (one of ${KNOWN})`);
}

function checkStatus(s: BakeStatement, path: string, out: Sink): void {
  if (s.status === 'not-covered') add(out, 'warning', 'bake-spec-not-covered', path, `${s.title}: ${s.says}`, 'obtain the full standard');
  if (s.status === 'conditional') {
    add(out, 'warning', 'bake-conditional', path, `${s.title}: ${s.says}`,
      'record the process verification and product tests, or bake');
  }
  if (s.status === 'no-bake') add(out, 'note', 'bake-not-required', path, `${s.title}: ${s.says}`);
  if (s.borderline) {
    add(out, 'warning', 'hardness-borderline', path,
      `${s.title}: the hardness ${s.basis} is too close to the threshold for a conversion to decide`,
      'measure the hardness of the plated parts, or state the specified maximum hardness');
  }
}

/** `at` names the field of each planned figure; a bake written in the specification's text is that one field. */
function checkPlan(s: BakeStatement, plan: PlannedBake, at: (figure: string) => string, units: UnitSystem, out: Sink): void {
  if (s.status !== 'bake') return;
  const temp = (c: number) => (units === 'metric' ? `${Math.round(c)} °C` : formatQuantity(c, 'temperature', units));
  if (s.hours && plan.hours < s.hours.min) {
    add(out, 'error', 'bake-too-short', at('hours'),
      `${plan.hours} h planned; ${s.title} requires at least ${s.hours.min} h here`, `bake for ${s.hours.min} h or more`);
  }
  const range = s.temperatureC;
  if (range && plan.temperatureC < range.min) {
    add(out, 'error', 'bake-temperature-low', at('temperatureC'),
      `${temp(plan.temperatureC)} planned; ${s.title} names ${temp(range.min)}–${temp(range.max)}`, 'raise the oven setting');
  } else if (range && plan.temperatureC > range.max) {
    add(out, 'warning', 'bake-temperature-high', at('temperatureC'),
      `${temp(plan.temperatureC)} planned; ${s.title} names ${temp(range.min)}–${temp(range.max)}`,
      'lower the oven setting, or confirm the coating and the spring temper tolerate it');
  }
  const late = s.startWithinHours !== null && plan.startWithinHours !== undefined && plan.startWithinHours > s.startWithinHours;
  if (late) {
    add(out, 'error', 'bake-start-late', at('startWithinHours'),
      `bake starts ${plan.startWithinHours} h after plating; ${s.title} requires within ${s.startWithinHours} h`,
      'schedule the oven with the plater');
  }
}

/**
 * Findings for the specification named (free text such as "ASTM B850", "ISO 4042, 4 h at 200 °C" or an id) on electroplated steel of
 * `tensileStrength` MPa: missing, unknown, not covering this strength, or a planned bake that falls short.
 */
export function checkBakeSpecification(named: string | null | undefined, tensileStrength: number, options: CheckOptions = {}): Finding[] {
  const path = options.path ?? 'bakeSpecification';
  const out: Sink = [];
  const guidance = bakeGuidance(tensileStrength, options);
  if (!guidance.ok) {
    for (const e of guidance.errors) add(out, 'error', e.code, e.path, e.message);
    return out;
  }
  if (named === null || named === undefined || named.trim() === '') {
    const units = options.units ?? 'metric';
    checkMissing(guidance.value, units === 'metric' ? `${tensileStrength.toFixed(0)} MPa` : formatQuantity(tensileStrength, 'stress', units), path, out);
    return out;
  }
  const id = parseBakeSpecification(named);
  const s = guidance.value.find((x) => x.spec === id);
  if (!s) {
    add(out, 'error', 'bake-spec-unknown', path, `"${named}" is not a bake specification the tool knows`,
      `name one of ${KNOWN}, or check the plater's specification by hand`);
    return out;
  }
  checkStatus(s, path, out);
  const written = parseBakeCondition(named);
  const planPath = options.planPath ?? 'bake';
  const units = options.units ?? 'metric';
  if (options.planned) checkPlan(s, options.planned, (f) => `${planPath}.${f}`, units, out);
  else if (written) checkPlan(s, written, () => path, units, out);
  return out;
}
