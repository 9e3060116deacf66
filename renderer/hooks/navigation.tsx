import { createContext, useContext } from 'react';

export type Route =
  | { screen: 'jobs' }
  /** `key` tells one opening of the workspace from the next (a new job keeps its key once saved). */
  | { screen: 'job'; id: number | null; key: string }
  | { screen: 'settings' }
  | { screen: 'data' }
  | { screen: 'customers' }
  | { screen: 'design' }
  | { screen: 'requests' };

/** Decides whether the screen may be left now; false keeps the estimator where they are. */
export type LeaveGuard = () => Promise<boolean>;

export interface Navigation {
  route: Route;
  go(route: Route): void;
  openJob(id: number): void;
  newJob(): void;
  /** The workspace names the job it holds (its number once saved) for the header. */
  setJobLabel(label: string, id: number | null): void;
  setLeaveGuard(guard: LeaveGuard | null): void;
}

export const NavigationContext = createContext<Navigation | null>(null);

export function useNavigation(): Navigation {
  const nav = useContext(NavigationContext);
  if (!nav) throw new Error('useNavigation outside the app shell');
  return nav;
}

let opened = 0;
export const openingKey = (): string => `opening-${++opened}`;
