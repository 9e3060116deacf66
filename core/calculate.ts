import type { Finding, Result } from './result';
import { parseSpec } from './spec';
import type { CompressionSpec, ExtensionSpec, Spec, TorsionSpec } from './spec';
import { convertFields, convertOwnFields } from './units';
import { kindEntryOf } from './kinds/registry';
import type { SpringReport } from './kinds/types';
import type { CompressionReport } from './springs/compression/report';
import type { ExtensionReport } from './springs/extension/report';
import type { TorsionReport } from './springs/torsion/report';
import type { Settings } from './settings/schema';

export type { SpringReport } from './kinds/types';

const unknownGrade = (spec: Spec): never => {
  throw new Error(`unknown wire grade ${spec.material}: validate specs with parseSpec first`);
};

function withFindings<R extends { findings: Finding[] }>(report: R, findings: Finding[]): R {
  report.findings = findings;
  return report;
}

/**
 * Analysis and review of a validated spec, in internal units (mm, N, MPa). The shop's settings decide what
 * the shop decides (which set-removal verdict routes a compression spring); without them the defaults hold.
 */
export function analyseSpec(spec: CompressionSpec, settings?: Settings): CompressionReport;
export function analyseSpec(spec: ExtensionSpec, settings?: Settings): ExtensionReport;
export function analyseSpec(spec: TorsionSpec, settings?: Settings): TorsionReport;
export function analyseSpec(spec: Spec, settings?: Settings): SpringReport;
export function analyseSpec(spec: Spec, settings?: Settings): SpringReport {
  const kind = kindEntryOf(spec.kind);
  const x = kind.design(spec) ?? unknownGrade(spec);
  const r = kind.analyse(x, settings);
  return withFindings(r, kind.review(x, r, settings));
}

/** The report in the spec's own unit system, as the CLI, the UI and documents show it. */
export function reportInSpecUnits<R extends SpringReport>(report: R): R {
  return convertFields(report, kindEntryOf(report.kind).reportQuantities, report.units, 'out');
}

/** Validates, analyses and reviews raw input; the report comes back in the spec's units. */
export function calculate(raw: unknown, settings?: Settings): Result<SpringReport> {
  const parsed = parseSpec(raw);
  if (!parsed.ok) return parsed;
  // The report was made here and goes nowhere else in internal units: it converts where it is, no copy.
  const report = analyseSpec(parsed.value, settings);
  return { ok: true, value: convertOwnFields(report, kindEntryOf(report.kind).reportQuantities, report.units, 'out') };
}
