import { useState } from 'react';
import type { ApiError } from '../../../core/api';
import { useApi } from '../../api';
import { useNavigation } from '../../hooks/navigation';

/** "New job from this one": the store copies the job under a new number; the new job opens. */
export function useCopyJob(): { copy(id: number): Promise<boolean>; busy: boolean; error: ApiError | null } {
  const api = useApi();
  const nav = useNavigation();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<ApiError | null>(null);
  const copy = async (id: number) => {
    setBusy(true);
    setError(null);
    const r = await api.copyJob({ id });
    setBusy(false);
    if (r.ok) nav.openJob(r.value.id);
    else setError(r.error);
    return r.ok;
  };
  return { copy, busy, error };
}
