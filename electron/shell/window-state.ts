import { readFileSync, renameSync, writeFileSync } from 'node:fs';

export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** Where the main window was: position (when still on a screen), size, and whether it was maximised. */
export interface WindowState {
  x?: number;
  y?: number;
  width: number;
  height: number;
  maximized: boolean;
}

export const DEFAULT_WINDOW_STATE: WindowState = { width: 1280, height: 820, maximized: false };
const MIN = { width: 800, height: 560 };
/** A window must show at least this much of itself on some screen, or it opens at the default place. */
const VISIBLE = 120;

const isInt = (v: unknown): v is number => typeof v === 'number' && Number.isInteger(v) && Math.abs(v) < 100_000;

function overlap(a: Rect, b: Rect): { w: number; h: number } {
  return {
    w: Math.min(a.x + a.width, b.x + b.width) - Math.max(a.x, b.x),
    h: Math.min(a.y + a.height, b.y + b.height) - Math.max(a.y, b.y),
  };
}

const onSomeScreen = (rect: Rect, screens: Rect[]): boolean =>
  screens.some((s) => {
    const o = overlap(rect, s);
    return o.w >= VISIBLE && o.h >= VISIBLE;
  });

/** Turns whatever the file held into a usable state; anything odd falls back to the default. */
export function sanitizeWindowState(raw: unknown, screens: Rect[]): WindowState {
  if (typeof raw !== 'object' || raw === null) return { ...DEFAULT_WINDOW_STATE };
  const r = raw as Record<string, unknown>;
  if (!isInt(r.width) || !isInt(r.height)) return { ...DEFAULT_WINDOW_STATE };
  const size = { width: Math.max(MIN.width, r.width), height: Math.max(MIN.height, r.height) };
  const maximized = r.maximized === true;
  if (isInt(r.x) && isInt(r.y) && onSomeScreen({ x: r.x, y: r.y, ...size }, screens)) {
    return { x: r.x, y: r.y, ...size, maximized };
  }
  return { ...size, maximized };
}

export function readWindowState(file: string, screens: Rect[]): WindowState {
  try {
    return sanitizeWindowState(JSON.parse(readFileSync(file, 'utf8')), screens);
  } catch {
    return { ...DEFAULT_WINDOW_STATE };
  }
}

/** Written beside and renamed over, so a crash mid-write leaves the old file. */
export function writeWindowState(file: string, state: WindowState): void {
  const temp = `${file}.tmp`;
  writeFileSync(temp, `${JSON.stringify(state)}\n`);
  renameSync(temp, file);
}

export interface Measurable {
  getNormalBounds(): Rect;
  isMaximized(): boolean;
}

export function windowStateOf(window: Measurable): WindowState {
  const b = window.getNormalBounds();
  return { x: b.x, y: b.y, width: b.width, height: b.height, maximized: window.isMaximized() };
}
