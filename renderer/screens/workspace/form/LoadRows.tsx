import { TextField } from '../../../components/form/inputs';
import { useRareTabStop } from '../../../components/form/scope';

export const MAX_LOADS = 8;

interface Column<K extends string> {
  key: K;
  label(n: number): string;
  unit: string;
  /** A column a drawing rarely fills (out of the compact Tab order). */
  rare?: boolean;
}

interface LoadRowsProps<K extends string, R extends Record<K, string>> {
  rows: R[];
  columns: Column<K>[];
  /** "test length" or "working angle": the words of the add and remove buttons. */
  noun: string;
  tag: string;
  onChange(rows: R[]): void;
  blank(): R;
}

/** Rows of test points (a length or angle with an optional force or torque and its tolerance). */
export function LoadRows<K extends string, R extends Record<K, string>>({ rows, columns, noun, tag, onChange, blank }: LoadRowsProps<K, R>) {
  const rareStop = useRareTabStop();
  const set = (i: number, key: K, v: string) => onChange(rows.map((r, j) => (j === i ? { ...r, [key]: v } : r)));
  return (
    <div className="loads" role="group" aria-label={`${noun}s`}>
      {rows.map((row, i) => (
        <div className="loads__row" key={i}>
          <span className="loads__tag" aria-hidden="true">{tag}{i + 1}</span>
          {columns.map((c) => (
            <TextField key={c.key} path={`spec.loads[${i}].${c.key}`} label={c.label(i + 1)} unit={c.unit} numeric rare={c.rare} value={row[c.key]}
              onChange={(v) => set(i, c.key, v)} />
          ))}
          <button type="button" className="button button--quiet loads__remove" tabIndex={rareStop} aria-label={`Remove ${noun} ${tag}${i + 1}`}
            onClick={() => onChange(rows.filter((_, j) => j !== i))}>Remove</button>
        </div>
      ))}
      <button type="button" className="button button--small" tabIndex={rareStop} disabled={rows.length >= MAX_LOADS}
        onClick={() => onChange([...rows, blank()])}>Add a {noun}</button>
    </div>
  );
}
