import { createContext, useContext } from 'react';

/** The settings as edited: the stored document with whatever has been typed into it (text where a number will not parse). */
export type SettingsDraft = Record<string, unknown>;

export interface DraftAccess {
  draft: SettingsDraft;
  get(path: string): unknown;
  set(path: string, value: unknown): void;
}

export const SettingsDraftContext = createContext<DraftAccess | null>(null);

export function useSettingsDraft(): DraftAccess {
  const access = useContext(SettingsDraftContext);
  if (!access) throw new Error('a settings field outside the settings screen');
  return access;
}
