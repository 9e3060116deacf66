import type { CoilwrightBridge } from '../../core/api/method-names';

/** `window.coilwright`, as the Electron preload exposes it. Only this folder reads window globals. */
export type ShellBridge = CoilwrightBridge;

export function shellBridge(): ShellBridge | undefined {
  if (typeof window === 'undefined') return undefined;
  const bridge = (window as unknown as { coilwright?: ShellBridge }).coilwright;
  return bridge && typeof bridge.api === 'object' ? bridge : undefined;
}
