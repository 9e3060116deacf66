import type { Result } from './result';
import { parseSpec } from './spec';
import type { Spec } from './spec';
import { convertFields } from './units';
import { compressionDesign } from './springs/compression/design';
import { analyseCompression } from './springs/compression/analyse';
import { compressionReportQuantities } from './springs/compression/report';
import type { CompressionReport } from './springs/compression/report';
import { reviewCompression } from './review/compression';

export type SpringReport = CompressionReport;

/** Analysis and review of a validated spec, in internal units (mm, N, MPa). */
export function analyseSpec(spec: Spec): SpringReport {
  const design = compressionDesign(spec);
  if (!design) throw new Error(`unknown wire grade ${spec.material}: validate specs with parseSpec first`);
  const report = analyseCompression(design);
  report.findings = reviewCompression(design, report);
  return report;
}

/** The report in the spec's own unit system, as the CLI, the UI and documents show it. */
export function reportInSpecUnits(report: SpringReport): SpringReport {
  return convertFields(report, compressionReportQuantities, report.units, 'out');
}

/** Validates, analyses and reviews raw input; the report comes back in the spec's units. */
export function calculate(raw: unknown): Result<SpringReport> {
  const parsed = parseSpec(raw);
  if (!parsed.ok) return parsed;
  return { ok: true, value: reportInSpecUnits(analyseSpec(parsed.value)) };
}
