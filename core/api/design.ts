import { z } from 'zod';
import { method } from './contract';
import type { DesignAnswer } from '../design/types';
import type { Job } from './store-types';
import type { Requirement } from '../requirement';
import { jobInputSchema } from './store-schemas';

const id = z.number().int().positive();

/** A requirement stays `unknown` here: the service validates it with parseRequirement and answers with field errors. */
export const designSpringsSchema = z.object({
  requirement: z.unknown(),
  limit: z.number().int().min(1).max(100).optional(),
}).strict();

export const adoptDesignSchema = z.object({
  requirement: z.unknown(),
  spec: z.unknown(),
  jobId: id.optional(),
  job: jobInputSchema.omit({ spec: true }).partial().optional(),
}).strict().refine((v) => v.jobId === undefined || v.job === undefined, {
  message: 'give either a job to add a revision to, or the fields of a new job', path: ['job'],
});

export const jobRequirementSchema = z.object({ jobId: id }).strict();

export interface JobRequirement {
  jobId: number;
  jobRevision: number;
  savedAt: string;
  requirement: Requirement;
}

/** Designing from the customer's requirement: the ranked designs, making one the job's spec, and the kept requirement. */
export const designMethods = {
  designSprings: method<typeof designSpringsSchema, DesignAnswer>(designSpringsSchema),
  adoptDesign: method<typeof adoptDesignSchema, Job>(adoptDesignSchema),
  jobRequirement: method<typeof jobRequirementSchema, JobRequirement>(jobRequirementSchema),
};
