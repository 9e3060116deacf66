/**
 * The one Content-Security-Policy, sent as a response header by the app:// protocol and by the web
 * transport. React's style props are set through the CSSOM, which CSP does not restrict, so no
 * 'unsafe-inline' is needed for them. Images may also come from data: URLs, so the shop's logo (kept as a
 * data URL in settings) can be shown.
 */
export const CONTENT_SECURITY_POLICY =
  "default-src 'self'; script-src 'self'; img-src 'self' data:; object-src 'none'; base-uri 'none'; frame-ancestors 'none'";

/** Headers every UI response carries. */
export const uiHeaders: Readonly<Record<string, string>> = {
  'content-security-policy': CONTENT_SECURITY_POLICY,
  'x-content-type-options': 'nosniff',
  'referrer-policy': 'no-referrer',
};

/**
 * A PDF is shown by Chromium's viewer, which the page policy (object-src 'none') would block; a PDF
 * runs no script of ours, so it only gets the framing rule.
 */
export const pdfHeaders: Readonly<Record<string, string>> = {
  'content-security-policy': "frame-ancestors 'none'",
  'x-content-type-options': 'nosniff',
  'referrer-policy': 'no-referrer',
};
