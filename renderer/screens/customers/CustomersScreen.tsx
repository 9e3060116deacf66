import { useMemo, useRef, useState } from 'react';
import type { ApiError, Customer, CustomerInput } from '../../../core/api';
import { customerInputSchema } from '../../../core/api';
import { parseWith } from '../../../core/validation';
import { useApi } from '../../api';
import { TextAreaField, TextField } from '../../components/form/inputs';
import type { FormHandle } from '../../components/form/scope';
import { FormScope } from '../../components/form/scope';
import { ScreenHeading } from '../../components/ScreenHeading';
import { useShopData } from '../../hooks/shop-data';
import { friendlyError } from '../../model/errors';

interface Draft {
  id?: number;
  name: string;
  contact: string;
  email: string;
  phone: string;
  address: string;
  paymentTerms: string;
}

const FIELDS = ['name', 'contact', 'email', 'phone', 'addressLines', 'paymentTerms'];
const blank: Draft = { name: '', contact: '', email: '', phone: '', address: '', paymentTerms: '' };
const draftOf = (c: Customer): Draft => ({ ...c, address: c.addressLines.join('\n') });
const inputOf = (d: Draft): CustomerInput => ({
  ...(d.id === undefined ? {} : { id: d.id }), name: d.name, contact: d.contact, email: d.email, phone: d.phone,
  addressLines: d.address.split('\n').map((l) => l.trim()).filter((l) => l !== ''), paymentTerms: d.paymentTerms,
});

/** The customers quotes are addressed to: add one, or pick one to edit its contact, address and payment terms. */
export function CustomersScreen() {
  const shop = useShopData();
  const [editing, setEditing] = useState<Draft | null>(null);
  const [note, setNote] = useState('');
  const open = (d: Draft | null) => { setEditing(d); setNote(''); };
  return (
    <section className="screen" aria-labelledby="customers-title">
      <div className="screen__head">
        <ScreenHeading id="customers-title">Customers</ScreenHeading>
        <div className="screen__actions">
          <p className="save-status" role="status" aria-live="polite">{note}</p>
          <button type="button" className="button button--primary" onClick={() => open({ ...blank })}>Add customer</button>
        </div>
      </div>
      <p className="muted">The contact, address and payment terms print on every quote for the customer; empty payment terms print the shop’s.</p>
      <div className="customers-layout">
        <CustomerList customers={shop.customers} current={editing?.id} onPick={(c) => open(draftOf(c))} />
        {editing ? (
          <CustomerForm key={editing.id ?? 'new'} initial={editing} onClose={() => open(null)}
            onSaved={(saved) => { shop.refresh(); setEditing(draftOf(saved)); setNote(`${saved.name} saved.`); }} />
        ) : <p className="notice">Pick a customer to edit, or add one.</p>}
      </div>
    </section>
  );
}

function CustomerList({ customers, current, onPick }: { customers: Customer[]; current: number | undefined; onPick(c: Customer): void }) {
  if (customers.length === 0) return <p className="notice">No customers yet: add the first, or name one on a job.</p>;
  return (
    <table className="table customers-table" aria-label="Customers">
      <thead><tr><th scope="col">Name</th><th scope="col">Contact</th><th scope="col">E-mail</th><th scope="col">Phone</th><th scope="col">Payment terms</th></tr></thead>
      <tbody>
        {customers.map((c) => (
          <tr key={c.id} className={c.id === current ? "is-selected" : undefined}>
            <td><button type="button" className="link-button" onClick={() => onPick(c)}>{c.name}</button></td>
            <td>{c.contact}</td><td>{c.email}</td><td>{c.phone}</td><td>{c.paymentTerms || <span className="muted">shop’s</span>}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

function CustomerForm({ initial, onSaved, onClose }: { initial: Draft; onSaved(saved: Customer): void; onClose(): void }) {
  const api = useApi();
  const [draft, setDraft] = useState(initial);
  const [serverError, setServerError] = useState<ApiError | null>(null);
  const [status, setStatus] = useState('');
  const form = useRef<FormHandle | null>(null);
  const local = useMemo(() => {
    const r = parseWith(customerInputSchema, inputOf(draft));
    return r.ok ? [] : r.errors.map((e) => friendlyError(e));
  }, [draft]);
  const errors = useMemo(() => [...local, ...(serverError ? (serverError.details ?? [serverError]).map((e) => friendlyError(e)) : [])], [local, serverError]);
  const set = (patch: Partial<Draft>) => { setDraft((d) => ({ ...d, ...patch })); setServerError(null); setStatus(''); };
  const save = async () => {
    if (local.length > 0) { form.current?.revealAll(); form.current?.focus(local[0]!.path); return; }
    setStatus('Saving…');
    const r = await api.saveCustomer(inputOf(draft));
    if (!r.ok) { setServerError(r.error); setStatus(''); form.current?.focus(r.error.path); return; }
    setStatus('');
    onSaved(r.value);
  };
  return (
    <FormScope scope="customer" errors={errors} fields={FIELDS} handle={(h) => { form.current = h; }}>
      {(unplaced) => (
        <form className="panel customer-form" aria-label={draft.id === undefined ? 'New customer' : `Customer ${initial.name}`} noValidate
          onSubmit={(e) => { e.preventDefault(); void save(); }}>
          <h2 className="panel__title">{draft.id === undefined ? 'New customer' : initial.name}</h2>
          {unplaced.map((e) => <p key={e.path + e.message} className="error-text" role="alert">{e.message}</p>)}
          <div className="grid grid--2">
            <TextField path="name" label="Name" value={draft.name} onChange={(v) => set({ name: v })} wide />
            <TextField path="contact" label="Contact (quotes are addressed to)" value={draft.contact} onChange={(v) => set({ contact: v })} />
            <TextField path="email" label="E-mail" type="email" value={draft.email} onChange={(v) => set({ email: v })} />
            <TextField path="phone" label="Phone" type="tel" value={draft.phone} onChange={(v) => set({ phone: v })} />
            <TextField path="paymentTerms" label="Payment terms" value={draft.paymentTerms} placeholder="the shop’s terms"
              onChange={(v) => set({ paymentTerms: v })} wide />
          </div>
          <TextAreaField path="addressLines" label="Address (one line each, up to 6)" rows={4} value={draft.address} onChange={(v) => set({ address: v })} />
          <div className="screen__actions">
            <p className="save-status" role="status" aria-live="polite">{status}</p>
            <button type="button" className="button" onClick={onClose}>Close</button>
            <button type="submit" className="button button--primary">{draft.id === undefined ? 'Add customer' : 'Save customer'}</button>
          </div>
        </form>
      )}
    </FormScope>
  );
}
