/** Links the app may hand to the system browser: parsed http(s) URLs with a host, nothing else. */
export function isExternalLink(url: string): boolean {
  let parsed: URL;
  try {
    parsed = new URL(url);
  } catch {
    return false;
  }
  return (parsed.protocol === 'http:' || parsed.protocol === 'https:') && parsed.hostname !== '';
}

/**
 * Opens a link with the given opener (shell.openExternal in the app) when the policy allows it.
 * Returns whether it was handed over; a failing opener is reported, not thrown.
 */
export function openExternalLink(
  url: string,
  open: (url: string) => Promise<void> | void,
  onError: (error: unknown) => void = () => undefined,
): boolean {
  if (!isExternalLink(url)) return false;
  try {
    void Promise.resolve(open(new URL(url).href)).catch(onError);
  } catch (e) {
    onError(e);
  }
  return true;
}
