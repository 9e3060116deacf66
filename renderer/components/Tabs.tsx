import { useRef } from 'react';
import type { KeyboardEvent, ReactNode } from 'react';

export interface TabDef<T extends string> {
  id: T;
  label: ReactNode;
  /** Shown after the label, e.g. a count or a warning mark. */
  badge?: ReactNode;
}

interface TabsProps<T extends string> {
  label: string;
  idPrefix: string;
  tabs: readonly TabDef<T>[];
  active: T;
  onSelect(id: T): void;
}

/**
 * A tab row: Tab reaches the active tab, arrows and Home/End move between tabs (ARIA tabs pattern). Only the
 * active panel is in the page, so only its tab names the panel it controls.
 */
export function TabList<T extends string>({ label, idPrefix, tabs, active, onSelect }: TabsProps<T>) {
  const refs = useRef(new Map<T, HTMLButtonElement>());
  const move = (e: KeyboardEvent, index: number) => {
    const last = tabs.length - 1;
    const next = e.key === 'ArrowRight' ? (index === last ? 0 : index + 1)
      : e.key === 'ArrowLeft' ? (index === 0 ? last : index - 1)
        : e.key === 'Home' ? 0 : e.key === 'End' ? last : null;
    if (next === null) return;
    e.preventDefault();
    const tab = tabs[next]!;
    onSelect(tab.id);
    refs.current.get(tab.id)?.focus();
  };
  return (
    <div role="tablist" aria-label={label} className="tabs">
      {tabs.map((t, i) => (
        <button
          key={t.id} type="button" role="tab" id={`${idPrefix}-tab-${t.id}`} aria-controls={t.id === active ? `${idPrefix}-panel-${t.id}` : undefined}
          aria-selected={t.id === active} tabIndex={t.id === active ? 0 : -1} className="tabs__tab"
          ref={(el) => { if (el) refs.current.set(t.id, el); else refs.current.delete(t.id); }}
          onClick={() => onSelect(t.id)} onKeyDown={(e) => move(e, i)}
        >
          {t.label}{t.badge ? <span className="tabs__badge">{t.badge}</span> : null}
        </button>
      ))}
    </div>
  );
}

export function TabPanel({ idPrefix, id, children }: { idPrefix: string; id: string; children: ReactNode }) {
  return (
    <div role="tabpanel" id={`${idPrefix}-panel-${id}`} aria-labelledby={`${idPrefix}-tab-${id}`} className="tabpanel">
      {children}
    </div>
  );
}
