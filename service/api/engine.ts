import { calculate } from '../../core/calculate';
import { gradeSummaries } from '../../core/materials';
import { inputError } from '../../core/api';
import type { Settings } from '../../core/settings/schema';

/** Engine handlers: no store needed, only the shop's settings where the shop decides (set-removal routing). */
export function engineHandlers(settings: () => Settings) {
  return {
    calculate({ spec }: { spec: unknown }) {
      const result = calculate(spec, settings());
      return result.ok ? { ok: true as const, value: result.value } : { ok: false as const, error: inputError(result.errors) };
    },
    listGrades() {
      return { ok: true as const, value: gradeSummaries() };
    },
  };
}
