import { z } from 'zod';
import {
  materialOverridesSchema, orderFieldsShape, positive, specVersionSchema, staticDutySchema,
  unitSystemSchema,
} from './common';

export const compressionEndsSchema = z.enum(['closed-ground', 'closed', 'open-ground', 'open']);

/** Buckling end conditions with their EN 13906-1 seating coefficient ν (see core/springs/compression/buckling). */
export const seatingSchema = z.enum(['both-fixed', 'fixed-hinged', 'both-hinged', 'fixed-free']);

export const compressionLoadSchema = z
  .object({
    length: positive,
    force: positive.optional(),
    tolerancePercent: positive.max(100).optional(),
  })
  .strict()
  .refine((l) => l.tolerancePercent === undefined || l.force !== undefined, {
    message: 'a tolerance needs a force to apply to',
    path: ['tolerancePercent'],
  });

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
 * Dimensions the drawing leaves to the maker (EN 15800's compensating parameters). With a specified
 * force, the maker needs some of them free to hit the force; see core/review.
 */
export const freeParameterSchema = z.enum(['wireDiameter', 'diameter', 'coils', 'freeLength']);

export const compressionSpecSchema = z
  .object({
    version: specVersionSchema,
    kind: z.literal('compression'),
    units: unitSystemSchema,
    material: z.string().min(1),
    wireDiameter: positive,
    outerDiameter: positive.optional(),
    innerDiameter: positive.optional(),
    meanDiameter: positive.optional(),
    totalCoils: positive.optional(),
    activeCoils: positive.optional(),
    ends: compressionEndsSchema,
    freeLength: positive,
    loads: z.array(compressionLoadSchema).max(8).default([]),
    seating: seatingSchema.default('both-fixed'),
    duty: z.discriminatedUnion('type', [staticDutySchema, cyclicDutySchema]).default({ type: 'static' }),
    freeParameters: z.array(freeParameterSchema).max(4).default([]),
    materialOverrides: materialOverridesSchema.optional(),
    notes: z.string().max(4000).optional(),
    ...orderFieldsShape,
  })
  .strict();

export type CompressionSpec = z.infer<typeof compressionSpecSchema>;
export type CompressionSpecInput = z.input<typeof compressionSpecSchema>;
export type CompressionEnds = z.infer<typeof compressionEndsSchema>;
export type FreeParameter = z.infer<typeof freeParameterSchema>;
export type Seating = z.infer<typeof seatingSchema>;
