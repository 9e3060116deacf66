/**
 * The version of the analysis behind the numbers the store indexes for search (wire, mean diameter,
 * free or body length, active coils, rate). Raise it with any change to the analysis that can move one
 * of them: jobs indexed by an older version then show as stale, and `db reindex` recomputes them.
 */
export const ENGINE_VERSION = 1;
