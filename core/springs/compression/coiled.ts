import type { CompressionReport } from './report';

/**
 * The free length to coil to: longer than the finished one by the expected set when set removal is
 * needed and the set model reaches it; the finished free length otherwise (set found by trials then).
 */
export function coiledFreeLength(r: CompressionReport): number {
  const set = r.setRemoval;
  return set.required && set.coiledFreeLength !== null ? set.coiledFreeLength : r.freeLength;
}
