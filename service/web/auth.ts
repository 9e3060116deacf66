import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { IncomingMessage } from 'node:http';

export const TOKEN_COOKIE = 'cw_token';
export const TOKEN_HEADER = 'x-coilwright-token';

/** A fresh secret for one run of the server. */
export const newToken = (): string => randomBytes(24).toString('hex');

export function sameToken(given: string | undefined, token: string): boolean {
  if (given === undefined) return false;
  const a = Buffer.from(given);
  const b = Buffer.from(token);
  return a.length === b.length && timingSafeEqual(a, b);
}

export function cookieValue(req: IncomingMessage, name: string): string | undefined {
  for (const part of (req.headers.cookie ?? '').split(';')) {
    const eq = part.indexOf('=');
    if (eq > 0 && part.slice(0, eq).trim() === name) return part.slice(eq + 1).trim();
  }
  return undefined;
}

/** The request carries the token in the session cookie or in the header (for scripts and tests). */
export function isAuthorized(req: IncomingMessage, token: string): boolean {
  const header = req.headers[TOKEN_HEADER];
  return sameToken(cookieValue(req, TOKEN_COOKIE), token) || sameToken(typeof header === 'string' ? header : undefined, token);
}

/** Only readable by the server, and never sent with requests started by another site. */
export const sessionCookie = (token: string): string => `${TOKEN_COOKIE}=${token}; HttpOnly; SameSite=Strict; Path=/`;
