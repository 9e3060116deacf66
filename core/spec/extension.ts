import { z } from 'zod';
import type { QuantityMap } from '../units';
import {
  coilBodyQuantities, coilBodyShape, cyclicDutySchema, lengthDutyQuantities, lengthLoadQuantities, nonNegative,
  orderFieldsShape, orderQuantities, positive, staticDutySchema, toleranceShape,
} from './common';
import { checkBounds, kindBounds } from './bounds';

/** End forms of extension springs (EN 13906-2 Annex A names the same families). */
export const extensionEndFormSchema = z.enum(['machine-loop', 'full-loop', 'crossover-loop', 'side-loop', 'extended-hook']);

/** An end: its form alone, or with the loop's opening gap, an extended hook's straight length and the side-bend radius. */
export const extensionEndSchema = z.union([
  extensionEndFormSchema,
  z.object({
    form: extensionEndFormSchema,
    gap: nonNegative.optional(),
    extension: positive.optional(),
    bendRadius: positive.optional(),
  }).strict(),
]);

export const extensionLoadSchema = z
  .object({ length: positive, force: positive.optional(), ...toleranceShape })
  .strict()
  .refine((l) => l.tolerancePercent === undefined || l.force !== undefined, {
    message: 'a tolerance needs a force to apply to', path: ['tolerancePercent'],
  });

/** Lengths (loads, free length) are inside the ends, as extension springs are measured. */
export const extensionSpecSchema = z
  .object({
    kind: z.literal('extension'),
    ...coilBodyShape,
    bodyCoils: positive,
    ends: z.tuple([extensionEndSchema, extensionEndSchema]),
    /** The drawing's free length inside the ends, when it gives one; checked against the one the ends make. */
    freeLength: positive.optional(),
    /** The drawing's body length, when it gives one instead of (or as well as) the free length; checked against (Nb + 1)·d. */
    bodyLength: positive.optional(),
    /** Force the coils are wound together with; omit to have the preferred window's centre proposed. */
    initialTension: nonNegative.optional(),
    loads: z.array(extensionLoadSchema).max(8).default([]),
    /** Relative position of the two loops, degrees (0 = in line). */
    loopAngle: z.number().finite().min(0).max(360).optional(),
    loopAngleTolerance: positive.max(180).optional(),
    /** The assembly limits the extension (a stop, a cable, a chain). */
    mechanicalStop: z.boolean().default(false),
    duty: z.discriminatedUnion('type', [staticDutySchema, cyclicDutySchema]).default({ type: 'static' }),
    ...orderFieldsShape,
  })
  .strict()
  .superRefine(checkBounds(kindBounds.extension));

export type ExtensionSpec = z.infer<typeof extensionSpecSchema>;
export type ExtensionSpecInput = z.input<typeof extensionSpecSchema>;
export type ExtensionEndForm = z.infer<typeof extensionEndFormSchema>;
export type ExtensionEndInput = z.infer<typeof extensionEndSchema>;

/** What each number of an extension spec measures (see coilBodyQuantities). */
export const extensionSpecQuantities: QuantityMap = {
  ...coilBodyQuantities, ...orderQuantities,
  bodyCoils: 'count', ends: { gap: 'length', extension: 'length', bendRadius: 'length' },
  freeLength: 'length', bodyLength: 'length', initialTension: 'force', loads: lengthLoadQuantities,
  loopAngle: 'angle', loopAngleTolerance: 'angle', duty: lengthDutyQuantities,
};
