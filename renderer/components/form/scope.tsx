import { createContext, useCallback, useContext, useMemo, useRef, useState } from 'react';
import type { ReactNode } from 'react';
import type { FormError } from '../../model/errors';
import { errorsByField, resolveField } from '../../model/errors';

/** One form's errors, visited fields and inputs, so every field shows its own message and can be focused. */
export interface FormScopeValue {
  scope: string;
  idFor(path: string): string;
  /** The error to show beside the field now (a missing value only once the field was visited). */
  shownError(path: string): FormError | undefined;
  /** What the reader understood of the field's text ("read "2 000" as 2000 pcs"), if it was not a plain number. */
  understood(path: string): string | undefined;
  /** Fields a drawing rarely fills leave the Tab order until the estimator asks for every field. */
  compact: boolean;
  visit(path: string): void;
  register(path: string, element: HTMLElement | null): void;
}

const FormScopeContext = createContext<FormScopeValue | null>(null);

export const fieldId = (scope: string, path: string): string => `${scope}-${path.replace(/[^A-Za-z0-9]+/g, '-')}`;

export interface FormHandle {
  /** Moves the keyboard to the field a path names (its nearest field); false when the form has none. */
  focus(path: string): boolean;
  /** Shows every message, also those of fields not visited yet (after an attempt to save). */
  revealAll(): void;
}

interface FormScopeProps {
  scope: string;
  errors: readonly FormError[];
  /** Paths the form has a field for; errors on other paths go to `unplaced`. */
  fields: readonly string[];
  handle?: (handle: FormHandle) => void;
  /** What was understood of fields typed other than as plain numbers, by path. */
  understood?: readonly { path: string; message: string }[];
  compact?: boolean;
  children: (unplaced: FormError[]) => ReactNode;
}

const NONE: readonly { path: string; message: string }[] = [];

export function FormScope({ scope, errors, fields, handle, understood = NONE, compact = false, children }: FormScopeProps) {
  const elements = useRef(new Map<string, HTMLElement>());
  const [visited, setVisited] = useState<ReadonlySet<string>>(new Set());
  const [revealed, setRevealed] = useState(false);
  const known = useMemo(() => new Set(fields), [fields]);
  const { byField, unplaced } = useMemo(() => errorsByField(errors, known), [errors, known]);
  const visit = useCallback((path: string) => setVisited((v) => (v.has(path) ? v : new Set(v).add(path))), []);
  const register = useCallback((path: string, el: HTMLElement | null) => {
    if (el) elements.current.set(path, el);
    else elements.current.delete(path);
  }, []);
  const notes = useMemo(() => new Map(understood.map((u) => [u.path, u.message])), [understood]);
  const value = useMemo<FormScopeValue>(() => ({
    scope,
    compact,
    understood: (path) => notes.get(path),
    idFor: (path) => fieldId(scope, path),
    shownError: (path) => {
      const e = byField.get(path);
      return e && (!e.missing || revealed || visited.has(path)) ? e : undefined;
    },
    visit, register,
  }), [scope, byField, revealed, visited, visit, register, notes, compact]);
  handle?.({
    focus(path) {
      const field = resolveField(path, new Set(elements.current.keys()));
      const el = field === null ? undefined : elements.current.get(field);
      if (!el) return false;
      el.focus();
      el.scrollIntoView({ block: 'center' });
      return true;
    },
    revealAll: () => setRevealed(true),
  });
  return <FormScopeContext.Provider value={value}>{children(unplaced.filter((e) => !e.missing || revealed))}</FormScopeContext.Provider>;
}

/** The Tab stop of a control a drawing rarely needs: none while the form keeps the compact order. */
export function useRareTabStop(): number | undefined {
  const form = useContext(FormScopeContext);
  return form?.compact ? -1 : undefined;
}

/** What a field needs from its form: id, the message to show, and the hooks for visits and focus. */
export function useFormField(path: string) {
  const form = useContext(FormScopeContext);
  if (!form) throw new Error('a form field outside <FormScope>');
  const { register, visit } = form;
  const ref = useCallback((el: HTMLElement | null) => register(path, el), [register, path]);
  const onBlur = useCallback(() => visit(path), [visit, path]);
  const id = form.idFor(path);
  const error = form.shownError(path);
  return { id, errorId: `${id}-error`, error, understood: error ? undefined : form.understood(path), compact: form.compact, onBlur, ref };
}
