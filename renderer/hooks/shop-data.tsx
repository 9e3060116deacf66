import { createContext, useCallback, useContext, useEffect, useMemo, useState } from 'react';
import type { ReactNode } from 'react';
import type { ApiError, Customer } from '../../core/api';
import type { GradeSummary } from '../../core/materials';
import type { Settings } from '../../core/settings/schema';
import { useApi } from '../api';
import { takeDecimalMark } from '../model/numbers';
import { takeShopTimeZone } from '../model/shop-days';
import { useCommand } from './commands';

/** What many screens read from the store: the shop's settings, the wire grades and the customers. */
export interface ShopData {
  settings: Settings | null;
  grades: GradeSummary[];
  customers: Customer[];
  error: ApiError | null;
  /** Reads settings and customers again (after a save, an import or a restore). */
  refresh(): void;
  /** Takes settings just saved, without asking the store again. */
  setSettings(settings: Settings): void;
}

const ShopDataContext = createContext<ShopData | null>(null);

export function ShopDataProvider({ children }: { children: ReactNode }) {
  const api = useApi();
  const [settings, setShopSettings] = useState<Settings | null>(null);
  const setSettings = useCallback((s: Settings) => {
    takeDecimalMark(s.defaults.decimalMark);
    takeShopTimeZone(s.defaults.timeZone);
    setShopSettings(s);
  }, []);
  const [grades, setGrades] = useState<GradeSummary[]>([]);
  const [customers, setCustomers] = useState<Customer[]>([]);
  const [error, setError] = useState<ApiError | null>(null);
  const [tick, setTick] = useState(0);
  useEffect(() => {
    let live = true;
    void Promise.all([api.getSettings({}), api.listGrades({}), api.listCustomers({})]).then(([s, g, c]) => {
      if (!live) return;
      if (s.ok) setSettings(s.value);
      if (g.ok) setGrades(g.value);
      if (c.ok) setCustomers(c.value);
      setError(!s.ok ? s.error : !g.ok ? g.error : !c.ok ? c.error : null);
    });
    return () => { live = false; };
  }, [api, tick, setSettings]);
  const refresh = useCallback(() => setTick((t) => t + 1), []);
  useCommand('data-changed', refresh);
  const value = useMemo(() => ({ settings, grades, customers, error, refresh, setSettings }), [settings, grades, customers, error, refresh, setSettings]);
  return <ShopDataContext.Provider value={value}>{children}</ShopDataContext.Provider>;
}

export function useShopData(): ShopData {
  const data = useContext(ShopDataContext);
  if (!data) throw new Error('useShopData outside <ShopDataProvider>');
  return data;
}
