import { z } from 'zod';
import { method } from './contract';
import type { ManufacturingPlan } from '../process/plan';
import type { CostEstimate } from '../costing/types';
import type { CostChanges } from '../costing/changes';

/** What a change of shop settings moved in a saved job's price since the estimator last accepted it. */
export interface JobCostReview {
  jobId: number;
  /** When the estimator accepted the price; null when it stands as at the job's last save. */
  acceptedAt: string | null;
  /** When the settings the price was accepted under were saved; null when the store keeps no earlier settings. */
  settingsSavedAt: string | null;
  changes: CostChanges;
}

const jobId = z.number().int().positive();

const quantity = z.number().int().min(1).max(10_000_000);

/** Methods that combine a spec with the shop's settings from the store: the plan and the price. */
export const shopMethods = {
  manufacturingPlan: method<z.ZodObject<{ spec: z.ZodUnknown; orderQuantity: typeof quantity }>, ManufacturingPlan>(
    z.object({ spec: z.unknown(), orderQuantity: quantity }).strict()),
  costEstimate: method<z.ZodObject<{ spec: z.ZodUnknown; quantities: z.ZodOptional<z.ZodArray<typeof quantity>> }>, CostEstimate>(
    z.object({ spec: z.unknown(), quantities: z.array(quantity).min(1).max(12).optional() }).strict()),
  jobCostChanges: method<z.ZodObject<{ jobId: typeof jobId }>, JobCostReview>(z.object({ jobId }).strict()),
  acceptJobCost: method<z.ZodObject<{ jobId: typeof jobId }>, JobCostReview>(z.object({ jobId }).strict()),
};
