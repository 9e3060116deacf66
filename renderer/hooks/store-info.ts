import { useEffect, useState } from 'react';
import type { StoreInfo } from '../../core/api';
import { useApi } from '../api';
import { useCommandBus } from './commands';

/** How the store open is named for people: the file, or host/database on a server. */
export const storeLabel = (info: StoreInfo): string =>
  info.backend === 'postgres' ? `PostgreSQL ${info.name}` : info.name;

/** The store open now, read again whenever data changes (another store opened, a restore); names the window after it. */
export function useStoreInfo(): StoreInfo | null {
  const api = useApi();
  const bus = useCommandBus();
  const [info, setInfo] = useState<StoreInfo | null>(null);
  const [tick, setTick] = useState(0);
  useEffect(() => bus.subscribe('data-changed', () => setTick((t) => t + 1)), [bus]);
  useEffect(() => {
    let live = true;
    void api.storeInfo({}).then((r) => {
      if (!live || !r.ok) return;
      setInfo(r.value);
      document.title = `Coilwright — ${storeLabel(r.value)}`;
    });
    return () => { live = false; };
  }, [api, tick]);
  return info;
}

/** How often an open job list asks whether another desk changed the store (a cheap call: no query of the jobs). */
const CHANGE_POLL_MS = 3000;

/** Calls `onChange` when another desk commits a change to the store while this screen is open. */
export function useStoreChanges(onChange: () => void): void {
  const api = useApi();
  useEffect(() => {
    let mark: string | null = null;
    let live = true;
    const look = () => void api.storeInfo({}).then((r) => {
      if (!live || !r.ok) return;
      if (mark !== null && r.value.changeMark !== mark) onChange();
      mark = r.value.changeMark;
    });
    look();
    const timer = setInterval(look, CHANGE_POLL_MS);
    return () => {
      live = false;
      clearInterval(timer);
    };
  }, [api, onChange]);
}
