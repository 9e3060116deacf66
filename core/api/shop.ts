import { z } from 'zod';
import { method } from './contract';
import { specBounds } from '../spec/bounds';
import type { ManufacturingPlan } from '../process/plan';
import type { CostEstimate } from '../costing/types';
import type { CostChanges } from '../costing/changes';
import { jobJudgementSchema } from '../quoting/judgement';

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
const quantity = z.number().int().min(1).max(specBounds.orderQuantity.max, `at most ${specBounds.orderQuantity.max}: ${specBounds.orderQuantity.reason}`);

/** A spec with, for a stored job, its order quantity and the estimator's overrides. */
const planInput = z.object({ spec: z.unknown(), orderQuantity: quantity, judgement: jobJudgementSchema.optional() }).strict();
const costInput = z.object({
  spec: z.unknown(), quantities: z.array(quantity).min(1).max(12).optional(),
  orderQuantity: quantity.optional(), judgement: jobJudgementSchema.optional(),
}).strict();


/** Methods that combine a spec with the shop's settings from the store: the plan and the price. */
export const shopMethods = {
  manufacturingPlan: method<typeof planInput, ManufacturingPlan>(planInput),
  costEstimate: method<typeof costInput, CostEstimate>(costInput),
  jobCostChanges: method<z.ZodObject<{ jobId: typeof jobId }>, JobCostReview>(z.object({ jobId }).strict()),
  acceptJobCost: method<z.ZodObject<{ jobId: typeof jobId }>, JobCostReview>(z.object({ jobId }).strict()),
};
