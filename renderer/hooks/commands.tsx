import { createContext, useContext, useEffect, useMemo, useRef } from 'react';
import type { ReactNode } from 'react';

/** Commands the keyboard and the application menu both give; screens subscribe to the ones they serve. */
export type Command =
  | 'jobs' | 'job' | 'settings' | 'data' | 'new-job' | 'shortcuts'
  | 'save' | 'undo' | 'redo' | 'find' | 'find-similar' | 'print-quote' | 'print-traveller'
  /** The store changed under the UI (a restore or an import from the menu): read it again. */
  | 'data-changed';

/** The application menu's commands (core/api/method-names) as commands of the UI. */
export function commandOfMenu(menu: string): Command | null {
  const map: Record<string, Command> = {
    'new-job': 'new-job', 'open-job': 'find', 'find-similar': 'find-similar', save: 'save', undo: 'undo', redo: 'redo', 'print-quote': 'print-quote',
    'print-traveller': 'print-traveller', settings: 'settings', 'data-changed': 'data-changed',
  };
  return map[menu] ?? null;
}

interface Bus {
  /** True when a screen took the command. */
  publish(command: Command): boolean;
  /** Every server of the command, not only the latest (for notices like "data-changed"). */
  broadcast(command: Command): void;
  /** A fallback serves the command only while no other server has it. */
  subscribe(command: Command, handler: () => void, fallback?: boolean): () => void;
}

interface Server {
  handler: () => void;
  fallback: boolean;
}

const BusContext = createContext<Bus | null>(null);

export function CommandProvider({ children }: { children: ReactNode }) {
  const servers = useRef(new Map<Command, Server[]>());
  const bus = useMemo<Bus>(() => ({
    publish(command) {
      const list = servers.current.get(command) ?? [];
      const chosen = list.filter((s) => !s.fallback).at(-1) ?? list.at(-1);
      if (!chosen) return false;
      chosen.handler();
      return true;
    },
    broadcast(command) {
      for (const s of servers.current.get(command) ?? []) s.handler();
    },
    subscribe(command, handler, fallback = false) {
      const server = { handler, fallback };
      servers.current.set(command, [...(servers.current.get(command) ?? []), server]);
      return () => servers.current.set(command, (servers.current.get(command) ?? []).filter((s) => s !== server));
    },
  }), []);
  return <BusContext.Provider value={bus}>{children}</BusContext.Provider>;
}

export function useCommandBus(): Bus {
  const bus = useContext(BusContext);
  if (!bus) throw new Error('useCommandBus outside <CommandProvider>');
  return bus;
}

/** Serves a command while the component is mounted; the most recently mounted server wins, fallbacks last. */
export function useCommand(command: Command, handler: () => void, fallback = false): void {
  const bus = useCommandBus();
  const ref = useRef(handler);
  ref.current = handler;
  useEffect(() => bus.subscribe(command, () => ref.current(), fallback), [bus, command, fallback]);
}

/** The key (with modifiers) that gives each command; shown in the shortcuts list. */
export const shortcuts: { command: Command; keys: string; what: string }[] = [
  { command: 'jobs', keys: 'Alt+1', what: 'Job list' },
  { command: 'job', keys: 'Alt+2', what: 'The job open now (or a new one)' },
  { command: 'settings', keys: 'Alt+3', what: 'Shop settings' },
  { command: 'data', keys: 'Alt+4', what: 'Backup, restore, import and export' },
  { command: 'new-job', keys: 'Alt+N', what: 'New job' },
  { command: 'find', keys: 'Ctrl+F or /', what: 'Search the job list' },
  { command: 'find-similar', keys: 'Alt+S', what: 'Past jobs like the spring being edited' },
  { command: 'save', keys: 'Ctrl+S', what: 'Save now (the job also saves itself as you type)' },
  { command: 'undo', keys: 'Ctrl+Z', what: 'Undo: in a text field the typing, elsewhere back one saved revision' },
  { command: 'redo', keys: 'Ctrl+Shift+Z or Ctrl+Y', what: 'Redo' },
  { command: 'shortcuts', keys: 'F1', what: 'This list' },
];

/** A field whose text the browser's own undo steps back through. */
const textEntry = (target: EventTarget | null): boolean => {
  const el = target as HTMLInputElement | null;
  return !!el && (el.tagName === 'TEXTAREA' || (el.tagName === 'INPUT' && ['text', 'search', 'email', 'tel', 'url', ''].includes(el.type)));
};

export const typing = (target: EventTarget | null): boolean => {
  const el = target as HTMLElement | null;
  return !!el && (el.tagName === 'INPUT' || el.tagName === 'TEXTAREA' || el.tagName === 'SELECT' || el.isContentEditable);
};

/** The command a key press gives, if any. */
export function commandOfKey(e: KeyboardEvent): Command | null {
  const ctrl = e.ctrlKey || e.metaKey;
  const key = e.key.toLowerCase();
  if (e.altKey && !ctrl) {
    const byKey: Record<string, Command> = { '1': 'jobs', '2': 'job', '3': 'settings', '4': 'data', n: 'new-job', s: 'find-similar' };
    // Alt+digit arrives with e.key of a symbol on some layouts; e.code stays "Digit1".
    const digit = /^Digit([1-4])$/.exec(e.code)?.[1];
    return byKey[digit ?? key] ?? null;
  }
  if (ctrl && !e.altKey) {
    if (key === 's') return 'save';
    // In a text field Ctrl+Z undoes the typing (the browser's own undo), not a saved revision.
    if ((key === 'z' || key === 'y') && textEntry(e.target)) return null;
    if (key === 'z') return e.shiftKey ? 'redo' : 'undo';
    if (key === 'y') return 'redo';
    if (key === 'f') return 'find';
    return null;
  }
  if (e.key === 'F1') return 'shortcuts';
  if (e.key === '/' && !typing(e.target)) return 'find';
  return null;
}
