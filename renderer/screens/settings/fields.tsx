import { useEffect, useState } from 'react';
import type { ReactNode } from 'react';
import type { Choice } from '../../components/form/inputs';
import { CheckField, SelectField, TextField } from '../../components/form/inputs';
import { numberText, parseNumber } from '../../model/numbers';
import { useSettingsDraft } from './draft';

interface Props {
  path: string;
  label: ReactNode;
  hint?: ReactNode;
  wide?: boolean;
}

export function SText({ path, label, hint, wide, type, placeholder }: Props & { type?: 'text' | 'email' | 'tel' | 'date'; placeholder?: string }) {
  const d = useSettingsDraft();
  const v = d.get(path);
  return <TextField path={path} label={label} hint={hint} wide={wide} type={type} placeholder={placeholder}
    value={typeof v === 'string' ? v : ''} onChange={(t) => d.set(path, t)} />;
}

const sameValue = (text: string, value: unknown): boolean => {
  if (typeof value === 'string') return text === value;
  const p = parseNumber(text);
  return p.ok && p.value === value;
};

/**
 * A number kept as text while it is typed ("1." must survive), stored as a number once it parses. Empty
 * text leaves an optional number out (a nullable one null); a required one keeps "" so the schema names the field.
 */
export function SNumber({ path, label, hint, unit, optional, nullable }: Props & { unit?: string; optional?: boolean; nullable?: boolean }) {
  const d = useSettingsDraft();
  const value = d.get(path);
  const [text, setText] = useState(() => (typeof value === 'number' ? numberText(value) : typeof value === 'string' ? value : ''));
  useEffect(() => {
    setText((t) => (sameValue(t, value) ? t : typeof value === 'number' ? numberText(value) : typeof value === 'string' ? value : ''));
  }, [value]);
  const change = (t: string) => {
    setText(t);
    const p = parseNumber(t);
    d.set(path, p.ok ? (p.value ?? (nullable ? null : optional ? undefined : t)) : t);
  };
  return <TextField path={path} label={label} hint={hint} unit={unit} numeric value={text} onChange={change} />;
}

export function SSelect<T extends string>({ path, label, hint, wide, choices, asNumber }: Props & { choices: readonly Choice<T>[]; asNumber?: boolean }) {
  const d = useSettingsDraft();
  const v = d.get(path);
  return <SelectField path={path} label={label} hint={hint} wide={wide} choices={choices}
    value={(v === undefined ? '' : String(v)) as T} onChange={(t) => d.set(path, asNumber ? Number(t) : t)} />;
}

export function SCheck({ path, label, hint }: Props) {
  const d = useSettingsDraft();
  return <CheckField path={path} label={label} hint={hint} checked={d.get(path) === true} onChange={(on) => d.set(path, on)} />;
}

/** A list section's rows: each row a card with its fields and a remove button, then an add button. */
export function Rows({ path, noun, blank, title, children }: {
  path: string; noun: string; blank: () => Record<string, unknown>; title(row: Record<string, unknown>, i: number): string;
  children(prefix: string, i: number): ReactNode;
}) {
  const d = useSettingsDraft();
  const rows = (d.get(path) as Record<string, unknown>[] | undefined) ?? [];
  return (
    <div className="rows">
      {rows.map((row, i) => (
        <fieldset className="row-card" key={i}>
          <legend>{title(row, i)}</legend>
          <div className="grid grid--5">{children(`${path}[${i}]`, i)}</div>
          <button type="button" className="button button--quiet row-card__remove" aria-label={`Remove ${title(row, i)}`}
            onClick={() => d.set(path, rows.filter((_, j) => j !== i))}>Remove</button>
        </fieldset>
      ))}
      <button type="button" className="button button--small" onClick={() => d.set(path, [...rows, blank()])}>Add {noun}</button>
    </div>
  );
}
