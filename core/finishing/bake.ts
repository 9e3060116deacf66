/**
 * Hydrogen-embrittlement relief after electroplating. The tool never chooses a bake: it lists what each
 * specification says, and checks the one the customer named against the strength and the planned bake.
 */
export { bakeGuidance, parseBakeCondition, parseBakeSpecification } from './bake-guidance';
export type { BakeOptions } from './bake-guidance';
export { checkBakeSpecification } from './bake-check';
export type { CheckOptions, PlannedBake } from './bake-check';
export { bakeSpecifications, bakeSpecNames, bakeSpecTitles } from './bake-specs';
export type { BakeSpecId } from './bake-specs';
export type { BakeStatement, BakeStatus } from './bake-rules';
export { hardnessFromHv, hardnessFromTensile } from './bake-hardness';
export type { HardnessEstimate } from './bake-hardness';
