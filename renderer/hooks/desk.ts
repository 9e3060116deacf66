/**
 * This desk's name for its working copies (`desk` on an autosave). A job's working copy belongs to the desk that
 * autosaved first, and the store refuses another desk's saves while it is open (`edited-elsewhere`). The name is
 * kept in the window's local storage, so the same computer and program after a restart is the same desk and goes
 * on in the working copy it left open; another computer, browser or desktop install is another desk. Two windows
 * of one program on one computer are one desk. Where storage is refused (a private window), each load is a desk.
 */
const KEY = 'coilwright.desk';
const SHAPE = /^[A-Za-z0-9_-]{1,64}$/;

const newDesk = (): string => `desk-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 10)}`;

let current: string | null = null;

export function deskId(): string {
  if (current) return current;
  let desk = newDesk();
  try {
    const kept = window.localStorage.getItem(KEY);
    if (kept && SHAPE.test(kept)) desk = kept;
    else window.localStorage.setItem(KEY, desk);
  } catch {
    /* storage refused: this load is a desk of its own */
  }
  current = desk;
  return desk;
}
