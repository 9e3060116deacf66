import { z } from 'zod';

/**
 * A function written out from the engine's own declarations (a schema's shape, a quantity map) and compiled
 * once, so each field is read and written by name instead of through a generic walk. Only property names,
 * escaped by JSON.stringify, come from those declarations; values reach the code as bound constants. Where
 * the runtime forbids compiling code (a page whose content security policy has no 'unsafe-eval'), this
 * answers undefined and the caller keeps its generic walk. Zod's own test of the same question is reused,
 * so a page does not log a second refusal.
 */
export function generatedFunction<F>(constants: Record<string, unknown>, body: string): F | undefined {
  if (!z.core.util.allowsEval.value) return undefined;
  const names = Object.keys(constants);
  try {
    const factory = new Function(...names, `"use strict";\n${body}`) as (...values: unknown[]) => F;
    return factory(...names.map((n) => constants[n]));
  } catch {
    return undefined;
  }
}

/** A property name as a string literal for generated code. */
export const literal = (key: string): string => JSON.stringify(key);
