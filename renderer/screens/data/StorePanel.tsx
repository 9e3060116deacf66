import { useId, useState } from 'react';
import { useApi } from '../../api';
import { useCommandBus } from '../../hooks/commands';
import { useShopData } from '../../hooks/shop-data';
import { storeLabel, useStoreInfo } from '../../hooks/store-info';

/**
 * Which store this window works in and who saves are recorded as by. A PostgreSQL store is opened by its
 * connection string; the program remembers it for its next start in its own settings file, with the password
 * left out (the field empties after opening). The password comes from PGPASSWORD or ~/.pgpass at each start.
 */
export function StorePanel() {
  const api = useApi();
  const bus = useCommandBus();
  const shop = useShopData();
  const info = useStoreInfo();
  const connectionId = useId();
  const nameId = useId();
  const [connection, setConnection] = useState('');
  const [name, setName] = useState('');
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  const openServer = async () => {
    setBusy(true);
    const r = await api.openServerStore({ connection });
    setBusy(false);
    setConnection('');
    if (!r.ok) return setMessage({ ok: false, text: r.error.message });
    const kept = r.value.nextStart
      ? ` The next start opens it again${r.value.nextStart.passwordLeftOut ? '; its password was not saved, so give it in PGPASSWORD or ~/.pgpass' : ''}.`
      : '';
    setMessage({ ok: true, text: `Now working in ${storeLabel(r.value)}.${kept}` });
    shop.refresh();
    bus.broadcast('data-changed');
  };
  const forget = async () => {
    const r = await api.forgetServerStore({});
    if (!r.ok) return setMessage({ ok: false, text: r.error.message });
    setMessage({ ok: true, text: 'The next start opens this computer\'s own store file. This window stays in the server store until then.' });
    bus.broadcast('data-changed');
  };
  const signIn = async () => {
    const r = await api.signIn({ name });
    if (!r.ok) return setMessage({ ok: false, text: r.error.message });
    setMessage({ ok: true, text: `Saves from this window are now recorded as by ${r.value.author}.` });
    bus.broadcast('data-changed');
  };

  return (
    <section className="panel" aria-labelledby="store-title" data-testid="store-panel">
      <h2 id="store-title" className="panel__title">The job store</h2>
      {info && (
        <p data-testid="store-open">
          Working in <strong>{storeLabel(info)}</strong>; saves are recorded as by <strong>{info.author || 'no one named'}</strong>.
          {info.readOnly ? ` Read-only: ${info.readOnly}.` : ''}
        </p>
      )}
      <div className="field">
        <label htmlFor={nameId} className="field__label">Sign your work as</label>
        <input id={nameId} value={name} maxLength={80} onChange={(e) => setName(e.target.value)} placeholder="your name" />
      </div>
      <button type="button" className="button" disabled={name.trim() === ''} onClick={() => void signIn()}>Sign in</button>
      <div className="field">
        <label htmlFor={connectionId} className="field__label">Open a shared store on a PostgreSQL server</label>
        <input id={connectionId} type="password" autoComplete="off" value={connection} onChange={(e) => setConnection(e.target.value)}
          placeholder="postgres://user@host:5432/shop" />
      </div>
      <p className="muted" data-testid="store-help">Several desks can work in one server store at once. Coilwright opens the
        same store at its next start: it keeps the connection string in its own settings file on this computer, never in
        the job store, and always without the password. The password comes from the PGPASSWORD environment variable or
        the standard ~/.pgpass file (%APPDATA%\postgresql\pgpass.conf on Windows), which the PostgreSQL client reads at
        each start. The window names the store by its host and database only.</p>
      <button type="button" className="button button--primary" disabled={busy || connection.trim() === ''}
        onClick={() => void openServer()}>Open server store</button>
      {info?.nextStart && (
        <p data-testid="store-next-start">
          Next start: <code>{info.nextStart.location}</code>{info.nextStart.passwordLeftOut ? ' (password not saved)' : ''}.{' '}
          <button type="button" className="button" onClick={() => void forget()}>Start in this computer&apos;s own store next time</button>
        </p>
      )}
      {message && <p className={message.ok ? 'ok-text' : 'error-text'} role={message.ok ? 'status' : 'alert'}>{message.text}</p>}
    </section>
  );
}
