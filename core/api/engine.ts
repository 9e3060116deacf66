import { z } from 'zod';
import { method } from './contract';
import type { SpringReport } from '../calculate';
import type { GradeSummary } from '../materials';

/** Engine methods: pure functions of the spec. */
export const engineMethods = {
  calculate: method<z.ZodObject<{ spec: z.ZodUnknown }>, SpringReport>(z.object({ spec: z.unknown() }).strict()),
  listGrades: method<z.ZodObject<Record<string, never>>, GradeSummary[]>(z.object({}).strict()),
};
