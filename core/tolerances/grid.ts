/**
 * Reading printed trade tables between their rows and columns. Which method applies is a shop setting:
 * "linear" interpolates between neighbouring nodes; "nearest" reads the closest printed node (ties go to
 * the larger node).
 */
export type Interpolation = 'linear' | 'nearest';

/** A node of one axis and its weight in the reading. */
export interface Weighted {
  node: number;
  weight: number;
}

const ON_NODE = 1e-9;

/** Weights of the printed nodes (ascending) for x, or null when x lies outside them. */
export function axisWeights(nodes: readonly number[], x: number, method: Interpolation): Weighted[] | null {
  const first = nodes[0];
  const last = nodes[nodes.length - 1];
  if (first === undefined || last === undefined) return null;
  const slack = ON_NODE * Math.max(1, Math.abs(last));
  if (x < first - slack || x > last + slack) return null;
  const exact = nodes.findIndex((n) => Math.abs(n - x) <= slack);
  if (exact >= 0) return [{ node: exact, weight: 1 }];
  const upper = nodes.findIndex((n) => n > x);
  const hi = nodes[upper] as number;
  const lo = nodes[upper - 1] as number;
  const t = (x - lo) / (hi - lo);
  if (method === 'nearest') return [{ node: t >= 0.5 ? upper : upper - 1, weight: 1 }];
  return [{ node: upper - 1, weight: 1 - t }, { node: upper, weight: t }];
}

/** Every combination of per-axis weights, with the product weight: the cells a reading touches. */
export function combine(axes: readonly Weighted[][]): { nodes: number[]; weight: number }[] {
  return axes.reduce<{ nodes: number[]; weight: number }[]>(
    (acc, axis) => acc.flatMap((c) => axis.map((w) => ({ nodes: [...c.nodes, w.node], weight: c.weight * w.weight }))),
    [{ nodes: [], weight: 1 }],
  );
}
