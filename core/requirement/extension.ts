import { z } from 'zod';
import { nonNegative, positive, serviceTemperatureSchema, staticDutySchema, unitSystemSchema } from '../spec/common';
import { gradeFamilySchema, twoLoadsSchema, wireSizeSourceSchema } from './schema';

/** Loop ends the search tries: both ends alike; an extended hook needs a length the customer gives on a drawing. */
export const extensionLoopSchema = z.enum(['machine-loop', 'full-loop', 'crossover-loop', 'side-loop']);

const quantity = z.number().int().positive().max(10_000_000);

/**
 * An extension spring asked for by what it does: two forces at two lengths inside the ends, an optional
 * window for the initial tension, the space it hangs in and the shop's choices. Units as the requirement says.
 */
export const extensionRequirementSchema = z.object({
  kind: z.literal('extension'),
  version: z.literal(1).optional(),
  units: unitSystemSchema,
  reference: z.string().max(120).optional(),
  envelope: z.object({
    bore: positive.optional(),
    maxOuterDiameter: positive.optional(),
    /** Free length inside the ends. */
    maxFreeLength: positive.optional(),
  }).strict().default({}),
  function: twoLoadsSchema,
  initialTension: z.object({ min: nonNegative.optional(), max: positive.optional() }).strict().optional(),
  duty: z.discriminatedUnion('type', [
    staticDutySchema,
    z.object({ type: z.literal('cyclic'), between: z.tuple([positive, positive]), cycles: positive, frequency: positive.optional() }).strict(),
  ]).default({ type: 'static' }),
  serviceTemperature: serviceTemperatureSchema.optional(),
  /** The assembly limits the extension (a stop, a cable, a chain). */
  mechanicalStop: z.boolean().default(false),
  choices: z.object({
    grades: z.array(z.string().min(1)).min(1).max(40).optional(),
    families: z.array(gradeFamilySchema).min(1).max(4).optional(),
    ends: z.array(extensionLoopSchema).min(1).max(4).default(['machine-loop', 'full-loop']),
    wireSizes: wireSizeSourceSchema.default('stock'),
    finish: z.string().min(1).max(64).optional(),
    quantities: z.array(quantity).min(1).max(12).optional(),
    mainQuantity: quantity.optional(),
    toleranceGrade: z.union([z.literal(1), z.literal(2), z.literal(3)]).optional(),
  }).strict().default({ ends: ['machine-loop', 'full-loop'], wireSizes: 'stock' }),
  notes: z.string().max(4000).optional(),
}).strict();

export type ExtensionRequirement = z.infer<typeof extensionRequirementSchema>;
export type ExtensionLoop = z.infer<typeof extensionLoopSchema>;
