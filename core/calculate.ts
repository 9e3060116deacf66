import type { Finding, Result } from './result';
import { parseSpec } from './spec';
import type { CompressionSpec, ExtensionSpec, Spec, TorsionSpec } from './spec';
import { convertFields } from './units';
import type { QuantityMap } from './units';
import { compressionDesign } from './springs/compression/design';
import { analyseCompression } from './springs/compression/analyse';
import { compressionReportQuantities } from './springs/compression/report';
import type { CompressionReport } from './springs/compression/report';
import { extensionDesign } from './springs/extension/design';
import { analyseExtension } from './springs/extension/analyse';
import { extensionReportQuantities } from './springs/extension/report';
import type { ExtensionReport } from './springs/extension/report';
import { torsionDesign } from './springs/torsion/design';
import { analyseTorsion } from './springs/torsion/analyse';
import { torsionReportQuantities } from './springs/torsion/report';
import type { TorsionReport } from './springs/torsion/report';
import { reviewCompression } from './review/compression';
import { reviewExtension } from './review/extension';
import { reviewTorsion } from './review/torsion';

export type SpringReport = CompressionReport | ExtensionReport | TorsionReport;

const unknownGrade = (spec: Spec): never => {
  throw new Error(`unknown wire grade ${spec.material}: validate specs with parseSpec first`);
};

function withFindings<R extends { findings: Finding[] }>(report: R, findings: Finding[]): R {
  report.findings = findings;
  return report;
}

/** Analysis and review of a validated spec, in internal units (mm, N, MPa). */
export function analyseSpec(spec: CompressionSpec): CompressionReport;
export function analyseSpec(spec: ExtensionSpec): ExtensionReport;
export function analyseSpec(spec: TorsionSpec): TorsionReport;
export function analyseSpec(spec: Spec): SpringReport;
export function analyseSpec(spec: Spec): SpringReport {
  switch (spec.kind) {
    case 'compression': {
      const x = compressionDesign(spec) ?? unknownGrade(spec);
      const r = analyseCompression(x);
      return withFindings(r, reviewCompression(x, r));
    }
    case 'extension': {
      const x = extensionDesign(spec) ?? unknownGrade(spec);
      const r = analyseExtension(x);
      return withFindings(r, reviewExtension(x, r));
    }
    case 'torsion': {
      const x = torsionDesign(spec) ?? unknownGrade(spec);
      const r = analyseTorsion(x);
      return withFindings(r, reviewTorsion(x, r));
    }
  }
}

const reportQuantities: Record<SpringReport['kind'], QuantityMap> = {
  compression: compressionReportQuantities,
  extension: extensionReportQuantities,
  torsion: torsionReportQuantities,
};

/** The report in the spec's own unit system, as the CLI, the UI and documents show it. */
export function reportInSpecUnits<R extends SpringReport>(report: R): R {
  return convertFields(report, reportQuantities[report.kind], report.units, 'out');
}

/** Validates, analyses and reviews raw input; the report comes back in the spec's units. */
export function calculate(raw: unknown): Result<SpringReport> {
  const parsed = parseSpec(raw);
  if (!parsed.ok) return parsed;
  return { ok: true, value: reportInSpecUnits(analyseSpec(parsed.value)) };
}
