import { z } from 'zod';
import { method } from './contract';
import { firstOffInputSchema } from '../first-off/record';
import type { FirstOffRecord } from '../first-off/record';
import type { SetCalibration } from '../process/set-calibration';

export { firstOffInputSchema };
export type { FirstOffInput, FirstOffRecord } from '../first-off/record';
export type { SetCalibration } from '../process/set-calibration';

export const jobFirstOffSchema = z.object({ jobId: z.number().int().positive() }).strict();
export const setCalibrationSchema = z.object({ spec: z.unknown() }).strict();

/** First-off results: record them against a job, list them, and calibrate a new spring's coiled free length by them. */
export const firstOffMethods = {
  recordFirstOff: method<typeof firstOffInputSchema, FirstOffRecord>(firstOffInputSchema),
  listFirstOff: method<typeof jobFirstOffSchema, FirstOffRecord[]>(jobFirstOffSchema),
  setCalibration: method<typeof setCalibrationSchema, SetCalibration>(setCalibrationSchema),
};
