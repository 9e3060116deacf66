import { z } from 'zod';
import { method } from './contract';
import { specBounds } from '../spec/bounds';
import type { ManufacturingPlan } from '../process/plan';
import type { CostEstimate } from '../costing/types';

const quantity = z.number().int().min(1).max(specBounds.orderQuantity.max, `at most ${specBounds.orderQuantity.max}: ${specBounds.orderQuantity.reason}`);

/** Methods that combine a spec with the shop's settings from the store: the plan and the price. */
export const shopMethods = {
  manufacturingPlan: method<z.ZodObject<{ spec: z.ZodUnknown; orderQuantity: typeof quantity }>, ManufacturingPlan>(
    z.object({ spec: z.unknown(), orderQuantity: quantity }).strict()),
  costEstimate: method<z.ZodObject<{ spec: z.ZodUnknown; quantities: z.ZodOptional<z.ZodArray<typeof quantity>> }>, CostEstimate>(
    z.object({ spec: z.unknown(), quantities: z.array(quantity).min(1).max(12).optional() }).strict()),
};
