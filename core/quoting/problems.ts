/**
 * What stands in the way of issuing a quote: open error findings on the design and gaps in the price.
 * Either needs the estimator's explicit decision, with a reason, before the quote goes out.
 */
import type { CostEstimate } from '../costing/types';
import type { Finding } from '../result';
import type { Spec } from '../spec';
import { customerException } from './exceptions';

export interface IssueProblem {
  /** "finding" for the design, "price" for a gap in the estimate. */
  kind: 'finding' | 'price';
  code: string;
  message: string;
  path: string;
  /** For a finding: the sentence the quote prints when it is accepted. */
  customerText: string | null;
  /** The job number of the line, on a quotation of several lines. */
  job?: string;
}

export function issueProblems(spec: Spec, findings: readonly Finding[], estimate: CostEstimate): IssueProblem[] {
  const design = findings.filter((f) => f.severity === 'error').map((f): IssueProblem => ({
    kind: 'finding', code: f.code, message: f.message, path: f.path ? `spec.${f.path}` : 'spec', customerText: customerException(f, spec),
  }));
  const price = estimate.missing.map((m): IssueProblem => ({ kind: 'price', code: m.code, message: m.message, path: `settings.${m.path}`, customerText: null }));
  return [...design, ...price];
}

/** What the issued snapshot keeps of the decision: the reason, and every problem it accepted. */
export interface IssueDecision {
  reason: string;
  problems: IssueProblem[];
}

/** One line naming every problem, for the refusal an API or CLI caller sees. */
export function problemSummary(problems: readonly IssueProblem[]): string {
  return problems.map((p) => `${p.kind === 'price' ? 'price incomplete' : 'open error'}${p.job ? ` on ${p.job}` : ''}: ${p.message}`).join('; ');
}
