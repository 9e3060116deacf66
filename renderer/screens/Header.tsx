import type { Route } from '../hooks/navigation';
import { useNavigation } from '../hooks/navigation';
import { damageCheckStatus, storeLabel, storeShortLabel, useStoreInfo } from '../hooks/store-info';

interface HeaderProps {
  route: Route;
  jobLabel: string | null;
  /** Back to the job open last, or a new one. */
  onJob(): void;
  onShortcuts(): void;
}

/** The shop bar: wordmark, the four places of the app, and the keyboard list. */
export function Header({ route, jobLabel, onJob, onShortcuts }: HeaderProps) {
  const nav = useNavigation();
  const store = useStoreInfo();
  const current = (screen: Route['screen']) => (route.screen === screen ? 'page' : undefined);
  const check = store ? damageCheckStatus(store) : null;
  return (
    <header className="topbar">
      <div className="topbar__mark" aria-hidden="true">
        <svg viewBox="0 0 32 32" width="26" height="26"><path d="M9 7h14M9 25h14" stroke="currentColor" strokeWidth="2.4" strokeLinecap="round" /><path d="M10 10l12 3-12 3 12 3-12 3" fill="none" stroke="#f3efe6" strokeWidth="2" strokeLinejoin="round" /></svg>
        <span>Coilwright</span>
      </div>
      <nav className="topbar__nav" aria-label="Screens">
        <button type="button" className="topbar__link" aria-current={current('jobs')} onClick={() => nav.go({ screen: 'jobs' })}>
          Jobs <kbd>Alt+1</kbd>
        </button>
        <button type="button" className="topbar__link" aria-current={current('job')} onClick={onJob}>
          {jobLabel ?? 'New job'} <kbd>Alt+2</kbd>
        </button>
        <button type="button" className="topbar__link" aria-current={current('settings')} onClick={() => nav.go({ screen: 'settings' })}>
          Shop settings <kbd>Alt+3</kbd>
        </button>
        <button type="button" className="topbar__link" aria-current={current('customers')} onClick={() => nav.go({ screen: 'customers' })}>
          Customers
        </button>
        <button type="button" className="topbar__link" aria-current={current('design')} onClick={() => nav.go({ screen: 'design' })}>
          Design from requirement
        </button>
        <button type="button" className="topbar__link" aria-current={current('requests')} onClick={() => nav.go({ screen: 'requests' })}>
          Request sheets
        </button>
        <button type="button" className="topbar__link" aria-current={current('data')} onClick={() => nav.go({ screen: 'data' })}>
          Data &amp; backups <kbd>Alt+4</kbd>
        </button>
      </nav>
      {store && (
        <span className="topbar__store" data-testid="store-name" title={`${storeLabel(store)}: saves are recorded as by ${store.author || 'no one named'}`}>
          {storeShortLabel(store)}
        </span>
      )}
      {check && (
        <span className={`topbar__check topbar__check--${check.tone}`} data-testid="store-check" title={check.detail}
          role={check.tone === 'warning' ? 'alert' : 'status'}>
          {check.text}
        </span>
      )}
      <div className="topbar__tools">
        <button type="button" className="button button--on-dark" onClick={() => nav.newJob()}>New job <kbd>Alt+N</kbd></button>
        <button type="button" className="button button--on-dark" onClick={onShortcuts}>Keys <kbd>F1</kbd></button>
      </div>
    </header>
  );
}
