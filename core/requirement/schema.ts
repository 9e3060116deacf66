import { z } from 'zod';
import { positive, serviceTemperatureSchema, staticDutySchema, unitSystemSchema } from '../spec/common';
import { compressionEndsSchema, seatingSchema } from '../spec/compression';

/**
 * What the customer asks a spring to do, rather than its geometry: the space it must fit, the forces it
 * must give, its duty and the shop's choices. Values are in the requirement's own unit system.
 */

const tolerancePercent = positive.max(100);

/** A force the spring must give at a length, within ± tolerancePercent (default: the trade's ±10 %). */
export const loadPointSchema = z.object({
  length: positive,
  force: positive,
  tolerancePercent: tolerancePercent.optional(),
}).strict();

export const envelopeSchema = z.object({
  /** The hole the spring works in; the clearance rule in core/design/clearance applies. */
  bore: positive.optional(),
  maxOuterDiameter: positive.optional(),
  /** The rod or pin the spring works over; the clearance rule applies. */
  rod: positive.optional(),
  minInnerDiameter: positive.optional(),
  maxSolidLength: positive.optional(),
  maxFreeLength: positive.optional(),
}).strict();

export const twoLoadsSchema = z.object({
  type: z.literal('two-loads'),
  loads: z.tuple([loadPointSchema, loadPointSchema]),
}).strict();

export const loadAndRateSchema = z.object({
  type: z.literal('load-and-rate'),
  load: loadPointSchema,
  rate: positive,
  rateTolerancePercent: tolerancePercent.optional(),
}).strict();

export const requirementCyclicDutySchema = z.object({
  type: z.literal('cyclic'),
  between: z.tuple([positive, positive]),
  cycles: positive,
  /** Whether the customer accepts shot peening; the search then also tries peened designs. */
  peeningAllowed: z.boolean().default(false),
  frequency: positive.optional(),
}).strict();

export const wireSizeSourceSchema = z.enum(['stock', 'priced', 'preferred']);
export const gradeFamilySchema = z.enum(['cold-drawn-carbon', 'hardened-tempered', 'austenitic-stainless', 'non-ferrous']);

const quantity = z.number().int().positive().max(10_000_000);

export const requirementChoicesSchema = z.object({
  /** Grades allowed by id; with families, a grade must be in both when both are given. */
  grades: z.array(z.string().min(1)).min(1).max(40).optional(),
  families: z.array(gradeFamilySchema).min(1).max(4).optional(),
  ends: z.array(compressionEndsSchema).min(1).max(4).default(['closed-ground', 'closed', 'open-ground', 'open']),
  /** Which wire sizes to try: the shop's stock, the standard's sizes the price list covers, or every standard size. */
  wireSizes: wireSizeSourceSchema.default('stock'),
  finish: z.string().min(1).max(64).optional(),
  quantities: z.array(quantity).min(1).max(12).optional(),
  /** The break the designs are ranked at; one of `quantities` (default: the first). */
  mainQuantity: quantity.optional(),
  toleranceGrade: z.union([z.literal(1), z.literal(2), z.literal(3)]).optional(),
}).strict();

export const compressionRequirementSchema = z.object({
  kind: z.literal('compression'),
  version: z.literal(1).optional(),
  units: unitSystemSchema,
  reference: z.string().max(120).optional(),
  envelope: envelopeSchema.default({}),
  function: z.discriminatedUnion('type', [twoLoadsSchema, loadAndRateSchema]),
  /** Largest stress ratio at solid (corrected stress ÷ allowable before set removal) the customer accepts. */
  maxStressRatio: positive.optional(),
  duty: z.discriminatedUnion('type', [staticDutySchema, requirementCyclicDutySchema]).default({ type: 'static' }),
  serviceTemperature: serviceTemperatureSchema.optional(),
  seating: seatingSchema.default('both-fixed'),
  choices: requirementChoicesSchema.default({ ends: ['closed-ground', 'closed', 'open-ground', 'open'], wireSizes: 'stock' }),
  notes: z.string().max(4000).optional(),
}).strict();

export type CompressionRequirement = z.infer<typeof compressionRequirementSchema>;
export type CompressionRequirementInput = z.input<typeof compressionRequirementSchema>;
export type LoadPoint = z.infer<typeof loadPointSchema>;
export type WireSizeSource = z.infer<typeof wireSizeSourceSchema>;

