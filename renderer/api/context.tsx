import { createContext, useContext } from 'react';
import type { ReactNode } from 'react';
import type { Api } from '../../core/api';
import type { Platform } from './platform';

interface Services {
  api: Api;
  platform: Platform;
}

const ServicesContext = createContext<Services | null>(null);

/** Gives every screen the injected API (IPC in the app, HTTP in a browser) and the page services. */
export function ApiProvider({ api, platform, children }: Services & { children: ReactNode }) {
  return <ServicesContext.Provider value={{ api, platform }}>{children}</ServicesContext.Provider>;
}

function useServices(): Services {
  const services = useContext(ServicesContext);
  if (!services) throw new Error('useApi outside <ApiProvider>');
  return services;
}

export const useApi = (): Api => useServices().api;
export const usePlatform = (): Platform => useServices().platform;
