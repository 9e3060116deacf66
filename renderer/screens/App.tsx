import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { usePlatform } from '../api';
import { CommandProvider, commandOfKey, commandOfMenu, typing, useCommand, useCommandBus } from '../hooks/commands';
import type { LeaveGuard, Navigation, Route } from '../hooks/navigation';
import { NavigationContext, openingKey } from '../hooks/navigation';
import { ShopDataProvider } from '../hooks/shop-data';
import { Header } from './Header';
import { LeaveDialog, ShortcutsDialog } from './ShellDialogs';
import { JobsScreen } from './jobs/JobsScreen';
import { Workspace } from './workspace/Workspace';
import { SettingsScreen } from './settings/SettingsScreen';
import { DataScreen } from './data/DataScreen';
import { MenuDataProgress } from './data/MenuDataProgress';
import { CustomersScreen } from './customers/CustomersScreen';
import { DesignScreen } from './design/DesignScreen';
import { RequestSheetScreen } from './requests/RequestSheetScreen';

export function App() {
  return (
    <CommandProvider>
      <ShopDataProvider>
        <Shell />
      </ShopDataProvider>
    </CommandProvider>
  );
}

const sameRoute = (a: Route, b: Route): boolean =>
  a.screen === b.screen && (a.screen !== 'job' || (b.screen === 'job' && a.key === b.key));

function Shell() {
  const platform = usePlatform();
  const bus = useCommandBus();
  const [route, setRoute] = useState<Route>({ screen: 'jobs' });
  const [lastJob, setLastJob] = useState<{ route: Route & { screen: 'job' }; label: string } | null>(null);
  const [blocked, setBlocked] = useState<Route | null>(null);
  const [help, setHelp] = useState(false);
  const guard = useRef<LeaveGuard | null>(null);
  const routeRef = useRef(route);
  routeRef.current = route;

  const go = useCallback(async (to: Route) => {
    if (sameRoute(routeRef.current, to)) return;
    if (guard.current && !(await guard.current())) {
      setBlocked(to);
      return;
    }
    setRoute(to);
  }, []);

  const nav = useMemo<Navigation>(() => ({
    route,
    go: (to) => void go(to),
    openJob: (id) => void go({ screen: 'job', id, key: `job-${id}` }),
    newJob: () => void go({ screen: 'job', id: null, key: openingKey() }),
    setJobLabel: (label, id) => {
      const current = routeRef.current;
      if (current.screen !== 'job') return;
      setLastJob({ route: { ...current, id }, label });
    },
    setLeaveGuard: (g) => { guard.current = g; },
  }), [route, go]);

  useCommand('jobs', () => nav.go({ screen: 'jobs' }));
  useCommand('settings', () => nav.go({ screen: 'settings' }));
  useCommand('data', () => nav.go({ screen: 'data' }));
  useCommand('new-job', () => nav.newJob());
  useCommand('job', () => (lastJob ? nav.go(lastJob.route) : nav.newJob()));
  useCommand('shortcuts', () => setHelp(true));
  // The job list serves "find" while it is open; from anywhere else it first brings the list up.
  useCommand('find', () => nav.go({ screen: 'jobs' }), true);
  // Nothing to save on this screen; taking the key keeps the browser's own save dialog away.
  useCommand('save', () => undefined, true);

  useEffect(() => platform.onKey((e) => {
    const command = commandOfKey(e);
    if (command && bus.publish(command)) e.preventDefault();
  }), [platform, bus]);
  useEffect(() => platform.onMenuCommand((menu) => {
    const command = commandOfMenu(menu);
    // The menu's Undo/Redo in a field undo the typing there, as the platform's own Edit menu would.
    if ((command === 'undo' || command === 'redo') && typing(document.activeElement)) document.execCommand(command);
    else if (command === 'data-changed') bus.broadcast(command);
    else if (command) bus.publish(command);
  }), [platform, bus]);

  return (
    <NavigationContext.Provider value={nav}>
      <a className="skip-link" href="#main">Skip to the screen</a>
      <div className="shell">
        <Header route={route} jobLabel={lastJob?.label ?? null} onJob={() => bus.publish('job')} onShortcuts={() => setHelp(true)} />
        <main id="main" className="shell__main" tabIndex={-1}>
          <MenuDataProgress andTheWindows={route.screen !== 'data'} />
          {route.screen === 'jobs' ? <JobsScreen /> : null}
          {route.screen === 'job' ? <Workspace key={route.key} jobId={route.id} /> : null}
          {route.screen === 'settings' ? <SettingsScreen /> : null}
          {route.screen === 'data' ? <DataScreen /> : null}
          {route.screen === 'customers' ? <CustomersScreen /> : null}
          {route.screen === 'design' ? <DesignScreen /> : null}
          {route.screen === 'requests' ? <RequestSheetScreen /> : null}
        </main>
      </div>
      <ShortcutsDialog open={help} onClose={() => setHelp(false)} />
      <LeaveDialog
        open={blocked !== null}
        onStay={() => setBlocked(null)}
        onDiscard={() => {
          const to = blocked;
          setBlocked(null);
          guard.current = null;
          if (to) setRoute(to);
        }}
      />
    </NavigationContext.Provider>
  );
}
