import { describedBy } from '../../../components/form/Field';
import { useFormField } from '../../../components/form/scope';

/** One characteristic of the inspection block: what the traveller prints for it, and the value measured. */
export interface MeasuredLine {
  path: string;
  label: string;
  unit: string;
  nominal: string;
  limits: string;
  gauge: string;
}

/** A row of the first-off table; its message sits in the cell right under the value it concerns. */
export function MeasuredRow({ line, value, onChange }: { line: MeasuredLine; value: string; onChange(v: string): void }) {
  const f = useFormField(line.path);
  return (
    <tr className={f.error ? 'is-invalid' : undefined}>
      <th scope="row"><label htmlFor={f.id}>{line.label}</label></th>
      <td className="num nowrap">{line.nominal}</td>
      <td className="nowrap">{line.limits}</td>
      <td className="muted">{line.gauge}</td>
      <td className={`first-off__measured${f.error ? ' field--error' : ''}`}>
        <div className="field__control">
          <input id={f.id} ref={f.ref} className="input input--number" inputMode="decimal" autoComplete="off" spellCheck={false}
            value={value} data-path={line.path} aria-invalid={f.error ? true : undefined}
            aria-describedby={describedBy(f.error && f.errorId)} onChange={(e) => onChange(e.target.value)} onBlur={f.onBlur} />
          <span className="field__unit" aria-hidden="true">{line.unit}</span>
        </div>
        {f.error ? <p className="field__error" id={f.errorId}>{f.error.message}</p> : null}
      </td>
    </tr>
  );
}
