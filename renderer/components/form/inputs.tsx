import type { ReactNode } from 'react';
import { describedBy, FieldFrame } from './Field';
import { useFormField } from './scope';

interface BaseProps {
  path: string;
  label: ReactNode;
  hint?: ReactNode;
  wide?: boolean;
  disabled?: boolean;
  /** A field a drawing rarely gives: out of the compact Tab order (still reachable by mouse, Alt shortcut or "every field"). */
  rare?: boolean;
}

/** The Tab stop of a field: none for a rare one while the form keeps the compact order. */
const tabStop = (f: { compact: boolean }, rare: boolean | undefined): number | undefined => (f.compact && rare ? -1 : undefined);

interface TextProps extends BaseProps {
  value: string;
  onChange(value: string): void;
  unit?: string;
  /** A number: decimal keypad, figures aligned right. */
  numeric?: boolean;
  type?: 'text' | 'date' | 'email' | 'tel';
  list?: string;
  placeholder?: string;
  autoFocus?: boolean;
}

/** A text or number field; numbers stay text so whatever is typed survives until it parses. */
export function TextField({ path, label, hint, wide, value, onChange, unit, numeric, type = 'text', list, placeholder, disabled, autoFocus, rare }: TextProps) {
  const f = useFormField(path);
  const hintId = hint ? `${f.id}-hint` : undefined;
  const understoodId = f.understood ? `${f.id}-understood` : undefined;
  return (
    <FieldFrame id={f.id} errorId={f.errorId} label={label} error={f.error} hint={hint} hintId={hintId} unit={unit} wide={wide}
      understood={f.understood} understoodId={understoodId}>
      <input
        id={f.id} ref={f.ref} type={type} value={value} list={list} placeholder={placeholder} disabled={disabled}
        inputMode={numeric ? 'decimal' : undefined} autoComplete="off" spellCheck={false} autoFocus={autoFocus}
        className={numeric ? 'input input--number' : 'input'} data-path={path} tabIndex={tabStop(f, rare)}
        aria-invalid={f.error ? true : undefined} aria-describedby={describedBy(f.error && f.errorId, understoodId, hintId)}
        onChange={(e) => onChange(e.target.value)} onBlur={f.onBlur}
      />
    </FieldFrame>
  );
}

export interface Choice<T extends string> {
  value: T;
  label: string;
}

interface SelectProps<T extends string> extends BaseProps {
  value: T;
  choices: readonly Choice<T>[];
  onChange(value: T): void;
}

export function SelectField<T extends string>({ path, label, hint, wide, value, choices, onChange, disabled, rare }: SelectProps<T>) {
  const f = useFormField(path);
  const hintId = hint ? `${f.id}-hint` : undefined;
  return (
    <FieldFrame id={f.id} errorId={f.errorId} label={label} error={f.error} hint={hint} hintId={hintId} wide={wide}>
      <select
        id={f.id} ref={f.ref} value={value} disabled={disabled} className="input" data-path={path} tabIndex={tabStop(f, rare)}
        aria-invalid={f.error ? true : undefined} aria-describedby={describedBy(f.error && f.errorId, hintId)}
        onChange={(e) => onChange(e.target.value as T)} onBlur={f.onBlur}
      >
        {choices.map((c) => <option key={c.value} value={c.value}>{c.label}</option>)}
      </select>
    </FieldFrame>
  );
}

interface CheckProps extends Omit<BaseProps, 'wide'> {
  checked: boolean;
  onChange(checked: boolean): void;
}

export function CheckField({ path, label, hint, checked, onChange, disabled, rare }: CheckProps) {
  const f = useFormField(path);
  const hintId = hint ? `${f.id}-hint` : undefined;
  return (
    <div className={`field field--check${f.error ? ' field--error' : ''}`}>
      <input
        id={f.id} ref={f.ref} type="checkbox" checked={checked} disabled={disabled} data-path={path} tabIndex={tabStop(f, rare)}
        aria-invalid={f.error ? true : undefined} aria-describedby={describedBy(f.error && f.errorId, hintId)}
        onChange={(e) => onChange(e.target.checked)} onBlur={f.onBlur}
      />
      <label htmlFor={f.id} className="field__label">{label}</label>
      {hint ? <p className="field__hint" id={hintId}>{hint}</p> : null}
      {f.error ? <p className="field__error" id={f.errorId}>{f.error.message}</p> : null}
    </div>
  );
}

interface AreaProps extends BaseProps {
  value: string;
  rows?: number;
  onChange(value: string): void;
}

export function TextAreaField({ path, label, hint, value, rows = 3, onChange, disabled, rare }: AreaProps) {
  const f = useFormField(path);
  const hintId = hint ? `${f.id}-hint` : undefined;
  return (
    <FieldFrame id={f.id} errorId={f.errorId} label={label} error={f.error} hint={hint} hintId={hintId} wide>
      <textarea
        id={f.id} ref={f.ref} value={value} rows={rows} disabled={disabled} className="input" data-path={path} tabIndex={tabStop(f, rare)}
        aria-invalid={f.error ? true : undefined} aria-describedby={describedBy(f.error && f.errorId, hintId)}
        onChange={(e) => onChange(e.target.value)} onBlur={f.onBlur}
      />
    </FieldFrame>
  );
}
