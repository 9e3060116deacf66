import { useId } from 'react';
import type { ReactNode, Ref } from 'react';

/** Labelled controls outside a validated form (filters, search, pickers). */
export function PlainSelect<T extends string>({ label, value, choices, onChange }: {
  label: string; value: T; choices: readonly { value: T; label: string }[]; onChange(value: T): void;
}) {
  const id = useId();
  return (
    <div className="field field--plain">
      <label htmlFor={id} className="field__label">{label}</label>
      <select id={id} className="input" value={value} onChange={(e) => onChange(e.target.value as T)}>
        {choices.map((c) => <option key={c.value} value={c.value}>{c.label}</option>)}
      </select>
    </div>
  );
}

export function PlainInput({ label, value, onChange, type = 'text', inputRef, hint, placeholder, numeric, suggestions }: {
  label: ReactNode; value: string; onChange(value: string): void; type?: 'text' | 'search';
  inputRef?: Ref<HTMLInputElement>; hint?: string; placeholder?: string; numeric?: boolean;
  /** Values the browser offers as the user types (e.g. the customers already in the store). */
  suggestions?: readonly string[];
}) {
  const id = useId();
  return (
    <div className="field field--plain">
      <label htmlFor={id} className="field__label">{label}</label>
      <input
        id={id} ref={inputRef} type={type} className={numeric ? 'input input--number' : 'input'} value={value}
        placeholder={placeholder} autoComplete="off" spellCheck={false} inputMode={numeric ? 'numeric' : undefined}
        aria-describedby={hint ? `${id}-hint` : undefined} onChange={(e) => onChange(e.target.value)}
        list={suggestions ? `${id}-list` : undefined}
      />
      {suggestions ? <datalist id={`${id}-list`}>{suggestions.map((s) => <option key={s} value={s} />)}</datalist> : null}
      {hint ? <p className="field__hint" id={`${id}-hint`}>{hint}</p> : null}
    </div>
  );
}
