import { useEffect, useState } from 'react';
import type { StoreInfo } from '../../core/api';
import { useApi } from '../api';
import { useCommandBus } from './commands';

/** How the store open is named for people: the file, or host/database on a server. */
export const storeLabel = (info: StoreInfo): string =>
  info.backend === 'postgres' ? `PostgreSQL ${info.name}` : info.name;

/** The store as the header names it: a file by its name alone (the whole path is in the title and on the Data screen). */
export const storeShortLabel = (info: StoreInfo): string =>
  info.backend === 'postgres' ? storeLabel(info) : info.name.split(/[\\/]/).pop() || info.name;

/** The store's damage check as the status line says it: quietly while it runs, a warning once it failed. */
export function damageCheckStatus(info: StoreInfo): { tone: 'quiet' | 'warning'; text: string; detail: string } | null {
  const check = info.damageCheck;
  if (check?.state === 'running') {
    return { tone: 'quiet', text: 'checking the store…', detail: `A damage check of the store is running (since ${check.since}); work goes on meanwhile.` };
  }
  if (check?.state !== 'failed') return null;
  return {
    tone: 'warning',
    text: 'Store damaged: read-only, restore a backup',
    detail: `The damage check found damage (${check.problem}). Nothing more can be saved while it is open: `
      + 'restore your latest backup in its place (File > Restore, or Data & backups); the damaged store is kept beside it.',
  };
}

/** How often the status line asks again while the store's damage check runs. */
const CHECK_POLL_MS = 2000;

/** The store open now, read again whenever data changes (another store opened, a restore); names the window after it. */
export function useStoreInfo(): StoreInfo | null {
  const api = useApi();
  const bus = useCommandBus();
  const [info, setInfo] = useState<StoreInfo | null>(null);
  const [tick, setTick] = useState(0);
  useEffect(() => bus.subscribe('data-changed', () => setTick((t) => t + 1)), [bus]);
  const checking = info?.damageCheck?.state === 'running';
  useEffect(() => {
    if (!checking) return undefined;
    const timer = setTimeout(() => setTick((t) => t + 1), CHECK_POLL_MS);
    return () => clearTimeout(timer);
  }, [checking, tick]);
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
