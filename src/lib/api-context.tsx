/** Hands the app's `PanelpointApi` to the features' query hooks; tests pass a fake. */
import { createContext, useContext, type ReactNode } from 'react';
import type { PanelpointApi } from './api';

const ApiContext = createContext<PanelpointApi | null>(null);

export function ApiProvider({ api, children }: { api: PanelpointApi; children: ReactNode }) {
  return <ApiContext.Provider value={api}>{children}</ApiContext.Provider>;
}

/** The API in scope; throws when a component is rendered outside ApiProvider (a programming error). */
export function useApi(): PanelpointApi {
  const api = useContext(ApiContext);
  if (!api) throw new Error('useApi: no ApiProvider above this component');
  return api;
}
