import { useEffect, useMemo, useRef, useState } from 'react';
import type { ApiError } from '../../../core/api';
import type { Settings } from '../../../core/settings/schema';
import { parseSettingsPatch } from '../../../core/settings/schema';
import { useApi } from '../../api';
import type { FormHandle } from '../../components/form/scope';
import { FormScope } from '../../components/form/scope';
import { ScreenHeading } from '../../components/ScreenHeading';
import { useCommand } from '../../hooks/commands';
import { useNavigation } from '../../hooks/navigation';
import { useShopData } from '../../hooks/shop-data';
import { friendlyError } from '../../model/errors';
import { setAt, getAt } from '../../model/paths';
import { CostingSection } from './CostingSection';
import { DesignStepsSection } from './DesignStepsSection';
import type { SettingsDraft } from './draft';
import { SettingsDraftContext } from './draft';
import { FinishesSection, MachinesSection } from './MachinesSection';
import { DefaultsSection, NumberingSection, ProfileSection } from './ProfileSection';
import { MaterialPricesSection, WireStockSection } from './StockSection';
import { TolerancesSection } from './TolerancesSection';
import { QuoteTermsSection } from './QuoteTermsSection';

const sections = [
  ['settings-profile', 'Shop profile'], ['settings-defaults', 'Defaults'], ['settings-machines', 'Machines & rates'],
  ['settings-prices', 'Material prices'], ['settings-finishes', 'Finishes'], ['settings-stock', 'Wire stock'],
  ['settings-tolerances', 'Tolerances'], ['settings-costing', 'Costing'], ['settings-quote-terms', 'Quote terms'], ['settings-design', 'Design search'],
  ['settings-numbering', 'Numbering'],
] as const;

/** Every path in the draft, so each error finds the field it belongs to. */
function pathsOf(value: unknown, prefix = ''): string[] {
  if (value === null || typeof value !== 'object') return prefix ? [prefix] : [];
  const entries = Array.isArray(value) ? value.map((v, i) => [`${prefix}[${i}]`, v] as const)
    : Object.entries(value).map(([k, v]) => [prefix ? `${prefix}.${k}` : k, v] as const);
  return [...(prefix ? [prefix] : []), ...entries.flatMap(([p, v]) => pathsOf(v, p))];
}

const copy = (s: Settings): SettingsDraft => JSON.parse(JSON.stringify(s)) as SettingsDraft;

export function SettingsScreen() {
  const shop = useShopData();
  if (!shop.settings) return <p className="screen" role="status">{shop.error ? shop.error.message : 'Reading the shop settings…'}</p>;
  return <SettingsEditor saved={shop.settings} />;
}

function SettingsEditor({ saved }: { saved: Settings }) {
  const api = useApi();
  const shop = useShopData();
  const nav = useNavigation();
  const [draft, setDraft] = useState<SettingsDraft>(() => copy(saved));
  const [serverError, setServerError] = useState<ApiError | null>(null);
  const [state, setState] = useState<'idle' | 'saving' | 'saved'>('idle');
  const form = useRef<FormHandle | null>(null);
  const dirty = useMemo(() => JSON.stringify(draft) !== JSON.stringify(saved), [draft, saved]);
  const dirtyRef = useRef(dirty);
  dirtyRef.current = dirty;
  useEffect(() => {
    nav.setLeaveGuard(async () => !dirtyRef.current);
    return () => nav.setLeaveGuard(null);
  }, [nav]);

  const local = useMemo(() => {
    const r = parseSettingsPatch(draft);
    return r.ok ? [] : r.errors.map((e) => friendlyError(e));
  }, [draft]);
  const errors = useMemo(() => [...local, ...(serverError?.details ?? (serverError && serverError.path ? [serverError] : [])).map((e) => friendlyError(e))], [local, serverError]);
  const fields = useMemo(() => pathsOf(draft), [draft]);
  const access = useMemo(() => ({
    draft, get: (p: string) => getAt(draft, p),
    set: (p: string, v: unknown) => { setDraft((d) => setAt(d, p, v)); setState('idle'); setServerError(null); },
  }), [draft]);

  const save = async () => {
    if (local.length > 0) {
      form.current?.revealAll();
      const first = local[0];
      if (first) form.current?.focus(first.path);
      return;
    }
    setState('saving');
    const r = await api.saveSettings({ settings: draft });
    if (!r.ok) { setServerError(r.error); setState('idle'); form.current?.focus(r.error.path); return; }
    shop.setSettings(r.value);
    setDraft(copy(r.value));
    setState('saved');
  };
  useCommand('save', () => void save());

  const status = state === 'saving' ? 'Saving…' : state === 'saved' && !dirty ? 'Settings saved.'
    : errors.length > 0 ? `${errors.length} field${errors.length === 1 ? '' : 's'} to correct before saving`
      : dirty ? 'Changes not saved yet' : 'No changes';
  return (
    <section className="screen screen--settings" aria-labelledby="settings-title">
      <div className="screen__head">
        <ScreenHeading id="settings-title">Shop settings</ScreenHeading>
        <div className="screen__actions">
          <p className="save-status" role="status" aria-live="polite">{status}</p>
          <button type="button" className="button" disabled={!dirty} onClick={() => { setDraft(copy(saved)); setServerError(null); }}>Discard changes</button>
          <button type="button" className="button button--primary" disabled={!dirty || state === 'saving'} onClick={() => void save()} aria-keyshortcuts="Control+S">Save settings</button>
        </div>
      </div>
      <div className="settings-layout">
        <nav className="settings-nav" aria-label="Settings sections">
          <ul>{sections.map(([id, label]) => <li key={id}><a href={`#${id}`}>{label}</a></li>)}</ul>
        </nav>
        <SettingsDraftContext.Provider value={access}>
          <FormScope scope="settings" errors={errors} fields={fields} handle={(h) => { form.current = h; }}>
            {(unplaced) => (
              <form className="settings-form" aria-label="Shop settings" noValidate onSubmit={(e) => { e.preventDefault(); void save(); }}>
                {unplaced.length > 0 ? (
                  <div className="form-errors" role="alert">{unplaced.map((e, i) => <p key={i}><code>{e.path}</code> {e.message}</p>)}</div>
                ) : null}
                {serverError && !serverError.path ? <p className="error-text" role="alert">{serverError.message}</p> : null}
                <ProfileSection />
                <DefaultsSection />
                <MachinesSection />
                <MaterialPricesSection />
                <FinishesSection />
                <WireStockSection />
                <TolerancesSection />
                <CostingSection />
                <QuoteTermsSection />
                <DesignStepsSection />
                <NumberingSection />
              </form>
            )}
          </FormScope>
        </SettingsDraftContext.Provider>
      </div>
    </section>
  );
}
