import { describe, expect, it, vi } from 'vitest';
import { isExternalLink, openExternalLink } from '../../electron/shell/external-links';

describe('the external-link policy', () => {
  it('allows parsed http and https URLs', () => {
    expect(isExternalLink('https://example.com/wire-data')).toBe(true);
    expect(isExternalLink('http://example.com')).toBe(true);
    expect(isExternalLink('HTTPS://EXAMPLE.COM/')).toBe(true);
  });

  it('refuses file:, javascript:, data:, custom schemes and malformed input', () => {
    for (const url of ['file:///C:/Windows/system32/calc.exe', 'javascript:alert(1)', 'data:text/html,<b>x</b>',
      'app://coilwright/index.html', 'ms-settings:', 'smb://server/share', 'mailto:a@b.c', 'vbscript:x',
      'http//missing-colon', 'https://', '', '   ', 'example.com', '//example.com/x']) {
      expect(isExternalLink(url), url).toBe(false);
    }
  });

  it('calls the opener only for allowed links, with the normalised URL', () => {
    const open = vi.fn();
    expect(openExternalLink('https://Example.com/a b', open)).toBe(true);
    expect(open).toHaveBeenCalledWith('https://example.com/a%20b');
    expect(openExternalLink('file:///etc/passwd', open)).toBe(false);
    expect(open).toHaveBeenCalledTimes(1);
  });

  it('reports a failing opener instead of throwing', async () => {
    const onError = vi.fn();
    openExternalLink('https://example.com', () => Promise.reject(new Error('no browser')), onError);
    openExternalLink('https://example.com', () => { throw new Error('sync failure'); }, onError);
    await vi.waitFor(() => expect(onError).toHaveBeenCalledTimes(2));
  });
});
