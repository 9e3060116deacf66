import { z } from 'zod';
import { positive, serviceTemperatureSchema, staticDutySchema, unitSystemSchema } from '../spec/common';
import { legFormSchema } from '../spec/torsion';
import { gradeFamilySchema, wireSizeSourceSchema } from './schema';

const quantity = z.number().int().positive().max(10_000_000);
const torquePoint = z.object({ torque: positive, tolerancePercent: positive.max(100).optional() }).strict();

/**
 * A torsion spring asked for by what it does: two torques at two leg positions `stroke` degrees apart (the
 * second further wound), the legs the assembly needs, the arbor it works on, and the shop's choices. The
 * free position (how far the first position is wound from free) is the design's to choose.
 */
export const torsionRequirementSchema = z.object({
  kind: z.literal('torsion'),
  version: z.literal(1).optional(),
  units: unitSystemSchema,
  reference: z.string().max(120).optional(),
  envelope: z.object({
    arbor: positive.optional(),
    maxOuterDiameter: positive.optional(),
    /** Body length when wound to the second position. */
    maxBodyLength: positive.optional(),
  }).strict().default({}),
  legs: z.tuple([
    z.object({ length: positive, form: legFormSchema.default('tangent') }).strict(),
    z.object({ length: positive, form: legFormSchema.default('tangent') }).strict(),
  ]),
  function: z.object({
    type: z.literal('two-torques'),
    torques: z.tuple([torquePoint, torquePoint]),
    /** Degrees from the first working position to the second. */
    stroke: positive.max(3600),
  }).strict(),
  windDirection: z.enum(['right', 'left']).default('right'),
  duty: z.discriminatedUnion('type', [
    staticDutySchema,
    z.object({ type: z.literal('cyclic'), cycles: positive, peeningAllowed: z.boolean().default(false) }).strict(),
  ]).default({ type: 'static' }),
  serviceTemperature: serviceTemperatureSchema.optional(),
  choices: z.object({
    grades: z.array(z.string().min(1)).min(1).max(40).optional(),
    families: z.array(gradeFamilySchema).min(1).max(4).optional(),
    wireSizes: wireSizeSourceSchema.default('stock'),
    finish: z.string().min(1).max(64).optional(),
    quantities: z.array(quantity).min(1).max(12).optional(),
    mainQuantity: quantity.optional(),
    toleranceGrade: z.union([z.literal(1), z.literal(2), z.literal(3)]).optional(),
  }).strict().default({ wireSizes: 'stock' }),
  notes: z.string().max(4000).optional(),
}).strict();

export type TorsionRequirement = z.infer<typeof torsionRequirementSchema>;
