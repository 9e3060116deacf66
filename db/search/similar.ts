import type { JobShape, SimilarJob } from '../../core/api/store';
import { similarJobsSchema } from '../../core/api/store';
import { invalid, success } from '../errors';
import type { StoreResult } from '../errors';
import { checkSpec } from '../jobs/input';
import type { JobRow } from '../jobs/rows';
import { JOB_FROM, SUMMARY_COLUMNS, toSummary } from '../jobs/rows';
import type { Store } from '../store';
import { parseWith } from '../../core/validation';
import type { Spec } from '../../core/spec';
import type { ShapePoint } from './similarity';
import type { Weighted } from './similarity';
import { WEIGHTS, describeDifferences, distance, matchInWords } from './similarity';
import { lastQuotedPrice } from './last-quoted';
import { SHAPE_POINTS } from '../pg/migrations/0016-search-at-scale';
import { INDEX_WEIGHTS, MIX } from '../migrations/0020-mixed-shape-coordinates';

interface Candidate extends ShapePoint {
  id: number;
}

const SHAPE_COLUMNS = `id, d AS "wireDiameter", dm AS "meanDiameter", l0 AS "freeLength", na AS "activeCoils", rate, material,
  family AS "materialFamily"`;

/** Each kind's own R*Tree (migration 0009): a search reads only the jobs of the kind asked about. */
const SHAPE_TABLES: Record<Spec['kind'], string> = {
  compression: 'job_shape_compression', extension: 'job_shape_extension', torsion: 'job_shape_torsion',
};

/** The shape's numbers in the order of the R*Tree's mixed coordinates (migration 0020's SHAPE_COLUMNS). */
const BOX_DIMENSIONS = ['wireDiameter', 'meanDiameter', 'freeLength', 'activeCoils', 'rate'] as const;

/** Jobs inside the box around the asked spring: one range per mixed coordinate (migration 0020). */
export const boxSql = (kind: Spec['kind']): string => `SELECT ${SHAPE_COLUMNS} FROM ${SHAPE_TABLES[kind]}
  WHERE ${MIX.map((_, j) => `m${j + 1}_min <= ? AND m${j + 1}_max >= ?`).join(' AND ')}`;

/**
 * How far each mixed coordinate may lie from the asked spring's for a job within `radius`. With index weights
 * v and search weights w, |Δm_j| ≤ Σ v_k·|Δln x_k| ≤ max(v_k/w_k)·Σ w_k·|Δln x_k|, so the box holds every job
 * within the radius even if the search weights have changed since the index was made. The margin covers the
 * last bits of ln in SQLite and here; the R*Tree rounds each stored coordinate outward by itself.
 */
export const indexStretch = (weights: Record<Weighted, number>): number =>
  Math.max(...BOX_DIMENSIONS.map((key, k) => INDEX_WEIGHTS[k]! / weights[key]));
const INDEX_STRETCH = indexStretch(WEIGHTS);
const COORDINATE_MARGIN = 1e-6;

export function mixedCoordinates(a: JobShape): number[] {
  return MIX.map((signs) => signs.reduce((sum, sign, k) => sum + sign * INDEX_WEIGHTS[k]! * Math.log(a[BOX_DIMENSIONS[k]!]), 0));
}

/** The jobs table's column of each shape dimension (PostgreSQL reads the jobs table through its index). */
const PG_COLUMNS: Record<(typeof BOX_DIMENSIONS)[number], string> = {
  wireDiameter: 'd', meanDiameter: 'mean_diameter', freeLength: 'free_length', activeCoils: 'active_coils', rate: 'rate',
};
const PG_GEOMETRY_SQL = BOX_DIMENSIONS.map((key) => `${WEIGHTS[key]} * abs(ln(${PG_COLUMNS[key]} / ?))`).join(' + ');

/**
 * The same box on PostgreSQL, through the kind's GiST index (migration 0016) on (ln d, ln rate) and
 * (ln D, ln L0): the two points are the index's own expressions, so the planner reads the index alone
 * (it carries every number scored); the coils range and the geometric distance filter inside it.
 */
export const pgBoxSql = (kind: Spec['kind']): string => `SELECT id, d AS "wireDiameter", mean_diameter AS "meanDiameter",
    free_length AS "freeLength", active_coils AS "activeCoils", rate, material, material_family AS "materialFamily"
  FROM jobs WHERE kind = '${kind}'
    AND ${SHAPE_POINTS[0]} <@ box(point(?, ?), point(?, ?)) AND ${SHAPE_POINTS[1]} <@ box(point(?, ?), point(?, ?))
    AND active_coils BETWEEN ? AND ? AND ${PG_GEOMETRY_SQL} <= ?`;

/** Every job of the kind, read from its shape table: the full scan, and the baseline the search is measured against. */
export const scanSql = (kind: Spec['kind']): string => `SELECT ${SHAPE_COLUMNS} FROM ${SHAPE_TABLES[kind]}`;

const KIND_COUNT_SQL = 'SELECT coalesce(sum(n), 0) AS n FROM job_counts WHERE kind = ?';

/** Past this radius the box holds nearly every job of the kind; reading them all is simpler. */
const MAX_RADIUS = 6;

/**
 * Where the search starts. Jobs within distance r grow about as N·r⁴ (four independent dimensions: the
 * rate follows from them), so a radius that finds about `limit` jobs among N of the kind scales as
 * (limit/N)^¼. DENSITY_RADIUS is that radius for one job per job of the kind, measured on the bench's
 * generated stores: the tenth nearest job lies at a median distance of 0.38 among 940 000 compression jobs
 * and 0.67 among 94 000 (6.6 · (10/N)^¼ both), 0.67 among 5 000 extension and 0.95 among 1 000 torsion jobs
 * (the material term keeps small kinds from spreading as r⁴ says), so the start sits a little below the
 * median and one or two boxes answer. The search stays exact whatever the start; only its cost depends on it.
 */
const DENSITY_RADIUS = 6;
const START_RADIUS_RANGE = [0.05, 0.6] as const;

export function startRadius(limit: number, jobsOfKind: number): number {
  if (jobsOfKind <= 0) return START_RADIUS_RANGE[1];
  const r = DENSITY_RADIUS * (limit / jobsOfKind) ** 0.25;
  return Math.min(START_RADIUS_RANGE[1], Math.max(START_RADIUS_RANGE[0], r));
}

/** The box of `radius` around the asked spring in the mixed coordinates: a low and a high end for each. */
function boxParams(a: JobShape, radius: number): number[] {
  const reach = radius * INDEX_STRETCH + COORDINATE_MARGIN;
  return mixedCoordinates(a).flatMap((m) => [m + reach, m - reach]);
}

/** The PostgreSQL box in log space: each point's coordinates within r/w of the asked spring's, w its weight. */
function pgBoxParams(a: JobShape, radius: number): unknown[] {
  const reach = radius + COORDINATE_MARGIN;
  const range = (key: Weighted) => [Math.log(a[key]) - reach / WEIGHTS[key], Math.log(a[key]) + reach / WEIGHTS[key]] as const;
  const [dLo, dHi] = range('wireDiameter');
  const [rLo, rHi] = range('rate');
  const [mLo, mHi] = range('meanDiameter');
  const [lLo, lHi] = range('freeLength');
  const spread = Math.exp(reach / WEIGHTS.activeCoils);
  return [dLo, rLo, dHi, rHi, mLo, lLo, mHi, lHi, a.activeCoils / spread, a.activeCoils * spread,
    ...BOX_DIMENSIONS.map((key) => a[key]), reach];
}

/** Jobs of the kind within the box of `radius` around the asked spring, on either backend. */
function inBox(store: Store, kind: Spec['kind'], asked: JobShape, radius: number): Candidate[] {
  if (store.dialect === 'postgres') return store.sql(pgBoxSql(kind)).all(...pgBoxParams(asked, radius)) as Candidate[];
  return store.sql(boxSql(kind)).all(...boxParams(asked, radius)) as Candidate[];
}

/** The kind's shape table, or null for a kind the store does not index (no job of it can exist). */
function kindOf(asked: JobShape): Spec['kind'] | null {
  return Object.hasOwn(SHAPE_TABLES, asked.kind) ? asked.kind as Spec['kind'] : null;
}

type Scored = { id: number; distance: number };

function topScored(asked: JobShape, candidates: Candidate[], limit: number, exclude?: number): Scored[] {
  const scored: Scored[] = [];
  for (const c of candidates) {
    if (c.id !== exclude) scored.push({ id: c.id, distance: distance(asked, c) });
  }
  scored.sort((x, y) => x.distance - y.distance || x.id - y.id);
  return scored.slice(0, limit);
}

/**
 * The nearest past jobs, exactly. A job left out by the query of radius r is farther than r, so once
 * the limit-th best found is within r nothing left out can beat it. Until then the radius grows, by
 * how many found jobs were within it, but never past the limit-th distance found so far: a query of
 * that radius finds every job at least as near, so the loop always ends with the exact answer.
 */
export function nearestJobs(store: Store, asked: JobShape, limit: number, exclude?: number): Scored[] {
  const kind = kindOf(asked);
  if (kind === null) return [];
  const jobsOfKind = (store.sql(KIND_COUNT_SQL).get(kind) as { n: number }).n;
  let radius = startRadius(limit, jobsOfKind);
  while (radius <= MAX_RADIUS) {
    const top = topScored(asked, inBox(store, kind, asked, radius), limit, exclude);
    const kth = top.length === limit ? top[limit - 1]!.distance : Infinity;
    if (kth <= radius) return top;
    const within = top.filter((s) => s.distance <= radius).length;
    radius = Math.min(kth, radius * widening(within, limit));
  }
  return topScored(asked, store.sql(scanSql(kind)).all() as Candidate[], limit, exclude);
}

/**
 * How much to widen when too few jobs lie within the radius. Jobs found grow about as r⁴ (four
 * independent dimensions: rate follows from the others), so aim a little past the limit, but never
 * more than double: an overshoot reads thousands of jobs for nothing.
 */
function widening(within: number, limit: number): number {
  if (within === 0) return 2;
  return Math.min(2, Math.max(1.2, 1.1 * (limit / within) ** 0.25));
}

/** The same ranking by scoring every job of the kind: the baseline the pre-filter is measured against. */
export function nearestJobsByScan(store: Store, asked: JobShape, limit: number, exclude?: number): Scored[] {
  const kind = kindOf(asked);
  return kind === null ? [] : topScored(asked, store.sql(scanSql(kind)).all() as Candidate[], limit, exclude);
}

function hits(store: Store, asked: JobShape, scored: Scored[], quantity: number | undefined): SimilarJob[] {
  if (scored.length === 0) return [];
  const rows = store.sql(`SELECT ${SUMMARY_COLUMNS} FROM ${JOB_FROM} WHERE j.id IN (${scored.map(() => '?').join(',')})`)
    .all(...scored.map((s) => s.id)) as JobRow[];
  const byId = new Map(rows.map((r) => [r.id, toSummary(r)]));
  return scored.map((s) => {
    const job = byId.get(s.id)!;
    return {
      id: s.id, number: job.number, job, score: Math.exp(-s.distance), distance: s.distance, ...describeDifferences(asked, job.shape),
      match: matchInWords(asked, job.shape, s.distance), lastQuoted: lastQuotedPrice(store, s.id, quantity ?? job.orderQuantity),
    };
  });
}

/** Past jobs of the same kind nearest to a spec, best first, each with how it differs. */
export function similarJobs(store: Store, raw: unknown): StoreResult<SimilarJob[]> {
  const parsed = parseWith(similarJobsSchema, raw);
  if (!parsed.ok) return invalid(parsed.errors);
  const checked = checkSpec(parsed.value.spec, ['spec']);
  if (!checked.ok) return invalid(checked.errors);
  const asked = checked.value.shape;
  const { limit, excludeJobId, quantity } = parsed.value;
  return success(hits(store, asked, nearestJobs(store, asked, limit, excludeJobId), quantity));
}
