import type Database from 'better-sqlite3';
import { SHAPE_KINDS, shapeTable } from './0009-list-and-shape-indexes';

/** The jobs columns of a shape, in the order of the mixed coordinates below. */
export const SHAPE_COLUMNS = ['d', 'mean_diameter', 'free_length', 'active_coils', 'rate'] as const;

/**
 * The weight of each column's log in the mixed coordinates: the similar-jobs weights (db/search/similarity.ts)
 * as they stood when this index was made. Written here, not imported, so the stored coordinates keep their
 * meaning if those weights change; the search then widens its box to stay exact (db/search/similar.ts).
 */
export const INDEX_WEIGHTS = [3, 2, 1, 1, 1.5] as const;

/**
 * Each mixed coordinate is a signed sum of the weighted logs: m_j = Σ_k MIX[j][k]·w_k·ln(x_k). With every
 * sign ±1, |m_j(p) − m_j(a)| ≤ Σ_k w_k·|ln(p_k/a_k)|, the geometric distance, so the box |Δm_j| ≤ r holds
 * every job within r. The box in the plain logs is a cube around the distance's ball (a cross-polytope),
 * far larger than it in five dimensions; signed sums cut its corners. Of the 5×5 sign matrices this one has
 * the largest determinant (48), so its box is the smallest such one. Measured on the bench's million-job
 * store: 86 jobs in the box per search at the tenth-nearest distance, against 1 535 in the plain box and
 * 46 within the distance.
 */
export const MIX = [
  [1, 1, 1, 1, 1],
  [1, 1, -1, -1, -1],
  [1, -1, 1, 1, -1],
  [1, -1, 1, -1, 1],
  [1, -1, -1, 1, 1],
] as const;

/** The SQL of mixed coordinate j over a row named `row`: SQLite's ln of each positive shape column. */
function coordinateSql(j: number, row: string): string {
  return MIX[j]!.map((sign, k) => `${sign < 0 ? '-' : '+'} ${INDEX_WEIGHTS[k]} * ln(${row}.${SHAPE_COLUMNS[k]})`).join(' ')
    .replace(/^\+ /, '');
}

/** min and max of each coordinate (the same point), then the exact numbers the search scores. */
function shapeValues(row: string): string {
  const coordinates = MIX.map((_, j) => `${coordinateSql(j, row)}, ${coordinateSql(j, row)}`).join(',\n    ');
  return `${row}.id, ${coordinates},
    ${row}.material, ${row}.material_family, ${row}.d, ${row}.mean_diameter, ${row}.free_length, ${row}.active_coils, ${row}.rate`;
}

function shapeTables(): string {
  const tables = SHAPE_KINDS.map((kind) => `
    DROP TABLE ${shapeTable(kind)};
    CREATE VIRTUAL TABLE ${shapeTable(kind)} USING rtree(
      id, m1_min, m1_max, m2_min, m2_max, m3_min, m3_max, m4_min, m4_max, m5_min, m5_max,
      +material TEXT, +family TEXT, +d REAL, +dm REAL, +l0 REAL, +na REAL, +rate REAL
    );
    INSERT INTO ${shapeTable(kind)} SELECT ${shapeValues('jobs')} FROM jobs WHERE kind = '${kind}' ORDER BY id;`).join('\n');
  const put = SHAPE_KINDS.map((kind) => `INSERT INTO ${shapeTable(kind)} SELECT ${shapeValues('new')} WHERE new.kind = '${kind}';`)
    .join('\n      ');
  const remove = SHAPE_KINDS.map((kind) => `DELETE FROM ${shapeTable(kind)} WHERE id = old.id;`).join('\n      ');
  return `
    DROP TRIGGER jobs_shape_insert;
    DROP TRIGGER jobs_shape_update;
    DROP TRIGGER jobs_shape_delete;
    ${tables}
    CREATE TRIGGER jobs_shape_insert AFTER INSERT ON jobs BEGIN
      ${put}
    END;
    CREATE TRIGGER jobs_shape_update AFTER UPDATE OF d, mean_diameter, free_length, active_coils, rate, kind, material, material_family ON jobs BEGIN
      ${remove}
      ${put}
    END;
    CREATE TRIGGER jobs_shape_delete AFTER DELETE ON jobs BEGIN
      ${remove}
    END;`;
}

/**
 * Each kind's R*Tree (migration 0009) holds mixed coordinates instead of the five plain numbers, so the
 * similar-jobs search reads about a twentieth of the jobs it read at a million (db/search/similar.ts).
 * The exact numbers stay beside them for the score. A million-job store rebuilds its three trees once here.
 */
export function updateToVersion0020(db: Database.Database): void {
  db.exec(shapeTables());
}
