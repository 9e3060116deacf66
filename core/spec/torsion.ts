import { z } from 'zod';
import type { QuantityMap } from '../units';
import {
  coilBodyQuantities, coilBodyShape, nonNegative, orderFieldsShape, orderQuantities, positive, staticDutySchema, toleranceShape,
} from './common';
import { checkBounds, kindBounds } from './bounds';

export const legFormSchema = z.enum(['tangent', 'radial', 'hooked']);

/** A leg: length from the point where it leaves the body, its form, and the radius of its bend (if bent). */
export const torsionLegSchema = z
  .object({ length: positive, form: legFormSchema.default('tangent'), bendRadius: positive.optional() })
  .strict();

/** A working position: deflection from the free position in degrees, and the torque the drawing asks for. */
export const torsionLoadSchema = z
  .object({ angle: positive.max(3600), torque: positive.optional(), ...toleranceShape })
  .strict()
  .refine((l) => l.tolerancePercent === undefined || l.torque !== undefined, {
    message: 'a tolerance needs a torque to apply to', path: ['tolerancePercent'],
  });

export const torsionCyclicDutySchema = z
  .object({
    type: z.literal('cyclic'),
    /** The two working deflections (degrees from free) it cycles between. */
    between: z.tuple([nonNegative.max(3600), nonNegative.max(3600)]),
    cycles: positive,
    peened: z.boolean().default(false),
    frequency: positive.optional(),
  })
  .strict();

export const torsionSpecSchema = z
  .object({
    kind: z.literal('torsion'),
    ...coilBodyShape,
    bodyCoils: positive,
    legs: z.tuple([torsionLegSchema, torsionLegSchema]),
    /** Angle between the legs when free, degrees; a drawing dimension. */
    freeAngle: nonNegative.max(360).optional(),
    freeAngleTolerance: positive.max(90).optional(),
    windDirection: z.enum(['right', 'left']),
    /** "closing" winds the coils tighter (the usual way to load); "opening" unwinds them. */
    loadDirection: z.enum(['closing', 'opening']).default('closing'),
    arborDiameter: positive.optional(),
    loads: z.array(torsionLoadSchema).max(8).default([]),
    duty: z.discriminatedUnion('type', [staticDutySchema, torsionCyclicDutySchema]).default({ type: 'static' }),
    ...orderFieldsShape,
  })
  .strict()
  .superRefine(checkBounds(kindBounds.torsion));

export type TorsionSpec = z.infer<typeof torsionSpecSchema>;
export type TorsionSpecInput = z.input<typeof torsionSpecSchema>;
export type LegForm = z.infer<typeof legFormSchema>;

/** What each number of a torsion spec measures (see coilBodyQuantities); working positions are angles. */
export const torsionSpecQuantities: QuantityMap = {
  ...coilBodyQuantities, ...orderQuantities,
  bodyCoils: 'count', legs: { length: 'length', bendRadius: 'length' },
  freeAngle: 'angle', freeAngleTolerance: 'angle', arborDiameter: 'length',
  loads: { angle: 'angle', torque: 'torque', tolerancePercent: 'percent' },
  duty: { between: 'angle', cycles: 'count', frequency: 'frequency' },
};
