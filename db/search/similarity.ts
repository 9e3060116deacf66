import type { DimensionName, JobShape, MatchWords, SimilarJob } from '../../core/api/store';

/**
 * How far a past job is from the spring asked about. With a = asked, p = past, per dimension:
 *
 *   distance = 3.0·|ln(p.d/a.d)| + 2.0·|ln(p.D/a.D)| + 1.0·|ln(p.L0/a.L0)|
 *            + 1.0·|ln(p.na/a.na)| + 1.5·|ln(p.rate/a.rate)| + material
 *   material = 0 for the same grade, 0.25 for another grade of the same family, 1.0 otherwise
 *   score    = exp(−distance)            (1 for the same spring; 10 % off in d alone gives 0.75)
 *
 * Log ratios make "10 % bigger" and "10 % smaller" count the same at any size. The weights follow what
 * a past job is reused for: wire size picks the coiler, wire stock and tooling; the mean diameter picks
 * the arbor and tools; free length and coils set the cycle; the rate is what the customer checks. They
 * are judgement, not data: change them here; the pre-filter (db/search/similar) derives its box from them.
 */
export const WEIGHTS = { wireDiameter: 3, meanDiameter: 2, freeLength: 1, activeCoils: 1, rate: 1.5 } as const;
export const MATERIAL_PENALTY = { sameFamily: 0.25, otherFamily: 1 } as const;

export type ShapePoint = Pick<JobShape, 'wireDiameter' | 'meanDiameter' | 'freeLength' | 'activeCoils' | 'rate' | 'material' | 'materialFamily'>;

export type Weighted = keyof typeof WEIGHTS;

export function materialMatch(asked: ShapePoint, past: ShapePoint): SimilarJob['differences']['material'] {
  if (asked.material === past.material) return 'same';
  return asked.materialFamily === past.materialFamily ? 'same family' : 'other family';
}

export function distance(asked: ShapePoint, past: ShapePoint): number {
  let sum = 0;
  for (const key of Object.keys(WEIGHTS) as Weighted[]) {
    sum += WEIGHTS[key] * Math.abs(Math.log(past[key] / asked[key]));
  }
  const material = materialMatch(asked, past);
  return sum + (material === 'same' ? 0 : material === 'same family' ? MATERIAL_PENALTY.sameFamily : MATERIAL_PENALTY.otherFamily);
}

const dimensions: readonly DimensionName[] = ['wireDiameter', 'meanDiameter', 'outerDiameter', 'freeLength', 'activeCoils', 'rate'];
const labels: Record<DimensionName, string> = {
  wireDiameter: 'd', meanDiameter: 'D', outerDiameter: 'OD', freeLength: 'L0', activeCoils: 'coils', rate: 'rate',
};

/** "same" within half a percent, else a signed whole percentage with a true minus sign: "+3 %", "−8 %". */
export function percentText(relative: number): string {
  const pct = Math.round(relative * 100);
  if (pct === 0) return 'same';
  return `${pct > 0 ? '+' : '\u2212'}${Math.abs(pct)} %`;
}

const summaryDimensions: readonly DimensionName[] = ['wireDiameter', 'outerDiameter', 'freeLength', 'activeCoils', 'rate'];

/** Per-dimension differences of a past job against the asked one, and the one-line summary. */
export function describeDifferences(asked: JobShape, past: JobShape): Pick<SimilarJob, 'differences' | 'relative' | 'summary'> {
  const relative = {} as Record<DimensionName, number>;
  const texts = {} as Record<DimensionName, string>;
  for (const key of dimensions) {
    relative[key] = past[key] / asked[key] - 1;
    texts[key] = percentText(relative[key]);
  }
  const material = materialMatch(asked, past);
  const parts = summaryDimensions.map((key) => `${labels[key]} ${texts[key]}`);
  parts.push(material === 'same' ? 'material same' : `material ${material} (${past.material})`);
  return { differences: { ...texts, material }, relative, summary: parts.join(', ') };
}

/**
 * Distance limits of the words an estimator reads (judgement, like the weights). The rate follows the wire
 * and diameter, so 5 % heavier wire at the same OD (rate about +24 %) is a distance near 0.48: "close";
 * "very close" is a few percent off in one dimension; past 1.5 the job tells little about this one.
 */
export const MATCH_WORDS: readonly { upTo: number; words: MatchWords }[] = [
  { upTo: 0.01, words: 'same spring' },
  { upTo: 0.15, words: 'very close' },
  { upTo: 0.6, words: 'close' },
  { upTo: 1.5, words: 'loosely similar' },
  { upTo: Infinity, words: 'far' },
];

const larger: Record<Weighted, readonly [string, string, string]> = {
  wireDiameter: ['wire', 'heavier', 'lighter'],
  meanDiameter: ['mean diameter', 'larger', 'smaller'],
  freeLength: ['length', 'longer', 'shorter'],
  activeCoils: ['active coils', 'more', 'fewer'],
  rate: ['rate', 'stiffer', 'softer'],
};

/** The dimension (or the material) that adds most to the distance, in words: "wire 9 % heavier". */
function biggestDifference(asked: ShapePoint, past: ShapePoint): string | null {
  let worst: { weight: number; text: string } | null = null;
  for (const key of Object.keys(WEIGHTS) as Weighted[]) {
    const ratio = past[key] / asked[key];
    const weight = WEIGHTS[key] * Math.abs(Math.log(ratio));
    const pct = Math.round(Math.abs(ratio - 1) * 100);
    if (pct === 0 || (worst && worst.weight >= weight)) continue;
    const [name, up, down] = larger[key];
    worst = { weight, text: `${name} ${pct} % ${ratio > 1 ? up : down}` };
  }
  const material = materialMatch(asked, past);
  const penalty = material === 'same' ? 0 : material === 'same family' ? MATERIAL_PENALTY.sameFamily : MATERIAL_PENALTY.otherFamily;
  if (penalty > 0 && (!worst || penalty >= worst.weight)) {
    return material === 'same family' ? `another grade of the same family (${past.material})` : `another material (${past.material})`;
  }
  return worst?.text ?? null;
}

/** "very close", "close"… for a distance, with the biggest difference named. */
export function matchInWords(asked: ShapePoint, past: ShapePoint, d: number): SimilarJob['match'] {
  const words = (MATCH_WORDS.find((m) => d <= m.upTo) ?? MATCH_WORDS[MATCH_WORDS.length - 1]!).words;
  const biggest = words === 'same spring' ? null : biggestDifference(asked, past);
  return { words, biggest, text: biggest ? `${words}: ${biggest}` : words };
}
