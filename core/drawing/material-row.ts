import { findGrade } from '../materials';
import type { TableRow } from './table';

/** The wire grade by its name across the whole data block (a grade name is longer than a value cell). */
export function materialRow(gradeId: string): TableRow {
  return { cells: [findGrade(gradeId)?.name ?? gradeId] };
}
