import type { ReactNode } from 'react';
import type { FormError } from '../../model/errors';

interface FieldFrameProps {
  id: string;
  errorId: string;
  label: ReactNode;
  error: FormError | undefined;
  hint?: ReactNode;
  hintId?: string;
  unit?: string;
  wide?: boolean;
  /** What was understood of the text typed, shown under the field. */
  understood?: string | undefined;
  understoodId?: string;
  children: ReactNode;
}

/** Label above, input with its unit, and the message right beside the input it concerns. */
export function FieldFrame({ id, errorId, label, error, hint, hintId, unit, wide, understood, understoodId, children }: FieldFrameProps) {
  return (
    <div className={`field${error ? ' field--error' : ''}${wide ? ' field--wide' : ''}`}>
      <label htmlFor={id} className="field__label">
        {label}
        {unit ? <span className="sr-only"> ({unit})</span> : null}
      </label>
      <div className="field__control">
        {children}
        {unit ? <span className="field__unit" aria-hidden="true">{unit}</span> : null}
      </div>
      {hint ? <p className="field__hint" id={hintId}>{hint}</p> : null}
      {understood ? <p className="field__understood" id={understoodId}>{understood}</p> : null}
      {error ? <p className="field__error" id={errorId}>{error.message}</p> : null}
    </div>
  );
}

export function describedBy(...ids: (string | false | undefined)[]): string | undefined {
  const list = ids.filter((x): x is string => typeof x === 'string' && x !== '');
  return list.length > 0 ? list.join(' ') : undefined;
}
