/** Reads and writes nested values by the paths errors use: "machines[2].wireRange.max". */
export function splitPath(path: string): (string | number)[] {
  const parts: (string | number)[] = [];
  for (const m of path.matchAll(/([^.[\]]+)|\[(\d+)\]/g)) parts.push(m[2] !== undefined ? Number(m[2]) : m[1]!);
  return parts;
}

export function getAt(root: unknown, path: string): unknown {
  let v: unknown = root;
  for (const p of splitPath(path)) {
    if (v === null || typeof v !== 'object') return undefined;
    v = (v as Record<string | number, unknown>)[p];
  }
  return v;
}

/** A copy of `root` with the value at `path` replaced (undefined removes the key); parents are created as needed. */
export function setAt<T>(root: T, path: string, value: unknown): T {
  const parts = splitPath(path);
  const put = (node: unknown, i: number): unknown => {
    const key = parts[i]!;
    const base: Record<string | number, unknown> | unknown[] = Array.isArray(node) ? [...node]
      : node !== null && typeof node === 'object' ? { ...(node as object) } : typeof key === 'number' ? [] : {};
    const next = i === parts.length - 1 ? value : put((base as Record<string | number, unknown>)[key], i + 1);
    if (next === undefined && !Array.isArray(base)) delete (base as Record<string | number, unknown>)[key];
    else (base as Record<string | number, unknown>)[key] = next;
    return base;
  };
  return put(root, 0) as T;
}
