import { useRef } from 'react';

/** The previous value while the new one has the same JSON, so memoised children see no change. */
export function useStable<T>(value: T): T {
  const ref = useRef<{ key: string; value: T } | null>(null);
  const key = JSON.stringify(value);
  if (ref.current === null || ref.current.key !== key) ref.current = { key, value };
  return ref.current.value;
}
