import { z } from 'zod';
import type { QuantityMap } from '../units';
import { ISO_2859_AQLS } from './bounds';
import { SPEC_VERSION } from './versions';

/** Schema pieces shared by every spring kind. Values are in the spec's own unit system. */
export const positive = z.number().finite().positive();
export const nonNegative = z.number().finite().nonnegative();

export const unitSystemSchema = z.enum(['metric', 'inch']);

export const materialOverridesSchema = z
  .object({
    shearModulus: positive.optional(),
    elasticModulus: positive.optional(),
    tensileStrength: positive.optional(),
    density: positive.optional(),
  })
  .strict();

export const serviceTemperatureSchema = z
  .object({ min: z.number().finite(), max: z.number().finite() })
  .strict()
  .refine((t) => t.max >= t.min, { message: 'max must not be below min', path: ['max'] });

export const staticDutySchema = z.object({ type: z.literal('static') }).strict();

/** Order-level choices the shop plans and prices with; all optional so a bare engineering spec stays valid. */
export const orderFieldsShape = {
  quantities: z.array(z.number().int().positive()).min(1).max(12).optional(),
  toleranceGrade: z.union([z.literal(1), z.literal(2), z.literal(3)]).optional(),
  finish: z.string().min(1).max(64).optional(),
  bakeSpecification: z.string().min(1).max(120).optional(),
  aql: positive.refine((v) => ISO_2859_AQLS.some((a) => Math.abs(a - v) <= a * 1e-9), {
    message: `an AQL from ISO 2859-1's list: ${ISO_2859_AQLS.join(', ')}`, params: { code: 'aql-not-iso-2859' },
  }).optional(),
  directionOfWind: z.enum(['right', 'left', 'either']).optional(),
  shotPeen: z.boolean().optional(),
  serviceTemperature: serviceTemperatureSchema.optional(),
};

/** Checked after the upgrade steps have run, so only the current version reaches the schema. */
export const specVersionSchema = z.literal(SPEC_VERSION).optional();

/** Wire, one coil diameter and mill-certificate overrides: the same fields for every kind. */
export const coilBodyShape = {
  version: specVersionSchema,
  units: unitSystemSchema,
  material: z.string().min(1),
  wireDiameter: positive,
  outerDiameter: positive.optional(),
  innerDiameter: positive.optional(),
  meanDiameter: positive.optional(),
  materialOverrides: materialOverridesSchema.optional(),
  notes: z.string().max(4000).optional(),
};

/** A force the drawing asks for, with its tolerance (± %). */
export const toleranceShape = { tolerancePercent: positive.max(100).optional() };

export const cyclicDutySchema = z
  .object({
    type: z.literal('cyclic'),
    between: z.tuple([positive, positive]),
    cycles: positive,
    peened: z.boolean().default(false),
    frequency: positive.optional(),
  })
  .strict();

/**
 * What each number of a spec measures, declared once: the engine converts a spec in with it, the form's
 * unit switch converts what was typed with it, and the unit test walks every number against it.
 */
export const coilBodyQuantities: QuantityMap = {
  version: 'ordinal', wireDiameter: 'length', outerDiameter: 'length', innerDiameter: 'length', meanDiameter: 'length',
  materialOverrides: { shearModulus: 'stress', elasticModulus: 'stress', tensileStrength: 'stress', density: 'density' },
};

export const orderQuantities: QuantityMap = {
  quantities: 'count', toleranceGrade: 'ordinal', aql: 'percent',
  serviceTemperature: { min: 'temperature', max: 'temperature' },
};

/** A test point along the axis: its length, the force asked there and the tolerance on that force. */
export const lengthLoadQuantities: QuantityMap = { length: 'length', force: 'force', tolerancePercent: 'percent' };

/** Cyclic duty between two working lengths (compression, extension). */
export const lengthDutyQuantities: QuantityMap = { between: 'length', cycles: 'count', frequency: 'frequency' };
