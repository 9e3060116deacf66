import { calculate } from '../../core/calculate';
import { gradeSummaries } from '../../core/materials';
import { inputError } from '../../core/api';

/** Engine handlers: no store needed. */
export const engineHandlers = {
  calculate({ spec }: { spec: unknown }) {
    const result = calculate(spec);
    return result.ok ? { ok: true as const, value: result.value } : { ok: false as const, error: inputError(result.errors) };
  },
  listGrades() {
    return { ok: true as const, value: gradeSummaries() };
  },
};
