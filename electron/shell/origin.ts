/** Where the desktop UI lives: app://coilwright/ (a privileged standard scheme, never file://). */
export const APP_SCHEME = 'app';
export const APP_HOST = 'coilwright';
export const APP_ORIGIN = `${APP_SCHEME}://${APP_HOST}`;
export const APP_START_URL = `${APP_ORIGIN}/index.html`;

function parse(url: string): URL | null {
  try {
    return new URL(url);
  } catch {
    return null;
  }
}

/**
 * True only for URLs of our own origin. Compared on the parsed scheme and host, never on a prefix
 * ("app://coilwright.evil/" must not pass); Node gives non-special schemes an opaque origin, so
 * URL.origin cannot be used here.
 */
export function isAppUrl(url: string): boolean {
  const parsed = parse(url);
  return parsed !== null && parsed.protocol === `${APP_SCHEME}:` && parsed.host === APP_HOST;
}
