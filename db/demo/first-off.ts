import type { FirstOffFieldsInput } from '../../core/first-off/record';

/**
 * DEMO first-off records (invented measurements): the door closer spring was coiled to about the model's
 * 92.25 mm and its first pieces took a little more set than the model's 2.25 mm, so its smaller sister job's
 * plan shows a calibrated coiled free length.
 */
export const demoFirstOff: { partNumber: string; daysAgo: number; record: FirstOffFieldsInput }[] = [
  { partNumber: 'ODH-CLOSER-1', daysAgo: 12, record: {
    units: 'metric', coiledFreeLength: 92.3, freeLengthAfterSet: 89.72, forces: [], outerDiameter: 32.08,
    measuredBy: 'DEMO inspector', notes: 'Demo record: first 5 pieces, coiler 2, wire lot D-4471.', measuredOn: '' } },
  { partNumber: 'ODH-CLOSER-1', daysAgo: 11, record: {
    units: 'metric', coiledFreeLength: 92.35, freeLengthAfterSet: 89.8, forces: [], outerDiameter: 32.1,
    measuredBy: 'DEMO inspector', notes: 'Demo record: after re-setting the coiler, 5 pieces.', measuredOn: '' } },
];
