import { z } from 'zod';
import { unitSystemSchema } from '../spec/common';
import type { UnitSystem } from '../units';

/**
 * A first-off record: what the setter coiled and what the inspector measured on the first pieces of a
 * compression spring, before the run. Values are in the job's own unit system, as the inspector reads
 * them off the gauge; they are stored that way and converted where they are compared.
 */
const measured = (what: string) => z.number({
  error: (issue) => (issue.input === undefined || issue.input === null ? `the ${what} is missing` : `the ${what} must be a number`),
}).positive(`the ${what} must be more than zero`);

export const firstOffForceSchema = z.object({
  /** The test length the force was measured at (the drawing's L1, L2 …). */
  length: measured('test length'),
  force: measured('measured force'),
}).strict();

export const firstOffFieldsSchema = z.object({
  units: unitSystemSchema,
  /** Free length the coiler was set to (the spring as coiled, before pressing to solid). */
  coiledFreeLength: measured('coiled free length used'),
  /** Free length measured after set removal (after pressing to solid). */
  freeLengthAfterSet: measured('free length after set removal'),
  forces: z.array(firstOffForceSchema).max(8).default([]),
  outerDiameter: measured('outside diameter'),
  measuredOn: z.string({ error: 'the date measured is missing' })
    .regex(/^\d{4}-(0[1-9]|1[0-2])-(0[1-9]|[12]\d|3[01])$/, 'the date measured, as YYYY-MM-DD'),
  measuredBy: z.string({ error: 'who measured is missing' }).trim().min(1, 'who measured is missing').max(80),
  notes: z.string().max(2000).default(''),
}).strict();

export type FirstOffFields = z.output<typeof firstOffFieldsSchema>;
export type FirstOffFieldsInput = z.input<typeof firstOffFieldsSchema>;

/** A record as the API takes it: the job it belongs to and the measured values. */
export const firstOffInputSchema = firstOffFieldsSchema.extend({ jobId: z.number().int().positive() }).strict();
export type FirstOffInput = z.input<typeof firstOffInputSchema>;

/** A stored record, in the units it was entered in (the job's). */
export interface FirstOffRecord extends FirstOffFields {
  id: number;
  jobId: number;
  jobNumber: string;
  /** The job's revision when the record was entered: the spec the first pieces were made to. */
  jobRevision: number;
  /** Set taken at set removal: coiled free length used − free length after set removal. */
  set: number;
  recordedAt: string;
  units: UnitSystem;
}
