import { z } from 'zod';
import type { QuantityMap } from '../units';
import {
  coilBodyQuantities, coilBodyShape, cyclicDutySchema, lengthDutyQuantities, lengthLoadQuantities, orderFieldsShape,
  orderQuantities, positive, staticDutySchema, toleranceShape,
} from './common';
import { checkBounds, kindBounds } from './bounds';

export const compressionEndsSchema = z.enum(['closed-ground', 'closed', 'open-ground', 'open']);

/** Buckling end conditions with their EN 13906-1 seating coefficient ν (see core/springs/compression/buckling). */
export const seatingSchema = z.enum(['both-fixed', 'fixed-hinged', 'both-hinged', 'fixed-free']);

export const compressionLoadSchema = z
  .object({
    length: positive,
    force: positive.optional(),
    ...toleranceShape,
  })
  .strict()
  .refine((l) => l.tolerancePercent === undefined || l.force !== undefined, {
    message: 'a tolerance needs a force to apply to',
    path: ['tolerancePercent'],
  });

/**
 * Dimensions the drawing leaves to the maker (EN 15800's compensating parameters). With a specified
 * force, the maker needs some of them free to hit the force; see core/review.
 */
export const freeParameterSchema = z.enum(['wireDiameter', 'diameter', 'coils', 'freeLength']);

export const compressionSpecSchema = z
  .object({
    kind: z.literal('compression'),
    ...coilBodyShape,
    totalCoils: positive.optional(),
    activeCoils: positive.optional(),
    ends: compressionEndsSchema,
    freeLength: positive,
    loads: z.array(compressionLoadSchema).max(8).default([]),
    seating: seatingSchema.default('both-fixed'),
    duty: z.discriminatedUnion('type', [staticDutySchema, cyclicDutySchema]).default({ type: 'static' }),
    freeParameters: z.array(freeParameterSchema).max(4).default([]),
    ...orderFieldsShape,
  })
  .strict()
  .superRefine(checkBounds(kindBounds.compression));

export type CompressionSpec = z.infer<typeof compressionSpecSchema>;
export type CompressionSpecInput = z.input<typeof compressionSpecSchema>;
export type CompressionEnds = z.infer<typeof compressionEndsSchema>;
export type FreeParameter = z.infer<typeof freeParameterSchema>;
export type Seating = z.infer<typeof seatingSchema>;

/** What each number of a compression spec measures (see coilBodyQuantities). */
export const compressionSpecQuantities: QuantityMap = {
  ...coilBodyQuantities, ...orderQuantities,
  totalCoils: 'count', activeCoils: 'count', freeLength: 'length',
  loads: lengthLoadQuantities, duty: lengthDutyQuantities,
};
