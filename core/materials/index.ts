/** The wire grade library: data by standard, strength and moduli by diameter, and static allowables. */
export { wireGrades, findGrade } from './catalog';
export { tensileStrengthAt } from './lookup';
export type { StrengthAt } from './lookup';
export { wireProperties } from './properties';
export { gradeSummaries } from './summaries';
export type { GradeSummary, StrengthSourceSummary } from './summaries';
export {
  EN_EXTENSION_STATIC_FRACTION, EN_TORSION_STATIC_FRACTION, extensionAllowables, staticAllowables, torsionAllowables,
} from './allowables';
export type { ExtensionAllowable, StaticAllowable } from './allowables';
export type * from './types';
