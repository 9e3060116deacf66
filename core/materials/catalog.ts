/** The wire grade library: every grade, frozen at load, and a lookup by id. */
import { astmCarbonGrades } from './astm-carbon';
import { astmStainlessNonferrousGrades } from './astm-stainless-nonferrous';
import { en10270part1Grades } from './en10270-1';
import { en10270part2Grades } from './en10270-2';
import { en10270part3Grades } from './en10270-3';
import type { WireGrade } from './types';

function deepFreeze<T>(value: T): T {
  if (value !== null && typeof value === 'object') {
    Object.freeze(value);
    for (const inner of Object.values(value)) deepFreeze(inner);
  }
  return value;
}

export const wireGrades: readonly WireGrade[] = deepFreeze([
  ...astmCarbonGrades,
  ...astmStainlessNonferrousGrades,
  ...en10270part1Grades,
  ...en10270part2Grades,
  ...en10270part3Grades,
]);

const byId = new Map(wireGrades.map((g) => [g.id, g]));
if (byId.size !== wireGrades.length) throw new Error('duplicate wire grade id in the library');

export function findGrade(id: string): WireGrade | undefined {
  return byId.get(id);
}
