import { describe, expect, it, vi } from 'vitest';
import type { IpcMainLike } from '../../electron/ipc';
import { parsePdfFile, safePdfFileName } from '../../electron/shell/pdf-file';
import { registerPdfIpc } from '../../electron/shell/pdf-ipc';
import { ipcEvent } from './electron-mock';

const pdfBase64 = Buffer.from('%PDF-1.7\n% a quote\n').toString('base64');
const trusted = ipcEvent('app://coilwright/index.html');

function setup() {
  const handlers = new Map<string, (event: unknown, raw: unknown) => Promise<unknown>>();
  const ipcMain: IpcMainLike = { handle: (c, l) => void handlers.set(c, l as never) };
  const previews = {
    preview: vi.fn(async () => ({ ok: true as const, value: { opened: true as const } })),
    save: vi.fn(async () => ({ ok: true as const, value: { saved: '/tmp/Q-1.pdf' } })),
  };
  registerPdfIpc(ipcMain, previews, () => undefined);
  return { handlers, previews };
}

describe('safePdfFileName', () => {
  it('strips folders and reserved characters and ends in .pdf', () => {
    expect(safePdfFileName('Quote Q-26-0012')).toBe('Quote Q-26-0012.pdf');
    expect(safePdfFileName('../../etc/passwd')).toBe('-..-etc-passwd.pdf');
    expect(safePdfFileName('C:\\Windows\\x.PDF')).toBe('C--Windows-x.pdf');
    expect(safePdfFileName('a<b>:"c"|?*.pdf')).toBe('a-b---c----.pdf');
    expect(safePdfFileName('...')).toBe('document.pdf');
  });
});

describe('parsePdfFile', () => {
  it('accepts base64 PDF bytes', () => {
    const parsed = parsePdfFile({ base64: pdfBase64, fileName: 'Q-1' });
    expect(parsed).toMatchObject({ ok: true, value: { fileName: 'Q-1.pdf' } });
    expect(parsed.ok && parsed.value.bytes.subarray(0, 5).toString()).toBe('%PDF-');
  });

  it('names the bad field', () => {
    expect(parsePdfFile({ base64: 'not base64!', fileName: 'x' })).toMatchObject({ ok: false, error: { path: 'base64' } });
    expect(parsePdfFile({ base64: pdfBase64 })).toMatchObject({ ok: false, error: { path: 'fileName' } });
    expect(parsePdfFile({ base64: pdfBase64, fileName: 'x', extra: 1 })).toMatchObject({ ok: false, error: { code: 'invalid-unrecognized_keys' } });
    expect(parsePdfFile(null)).toMatchObject({ ok: false });
  });

  it('refuses bytes that are not a PDF', () => {
    const html = Buffer.from('<html><script>alert(1)</script>').toString('base64');
    expect(parsePdfFile({ base64: html, fileName: 'x.pdf' })).toMatchObject({ ok: false, error: { code: 'not-a-pdf', path: 'base64' } });
  });
});

describe('registerPdfIpc', () => {
  it('refuses untrusted senders', async () => {
    const { handlers, previews } = setup();
    for (const channel of ['pdf:preview', 'pdf:save']) {
      const result = await handlers.get(channel)!(ipcEvent(null), { base64: pdfBase64, fileName: 'x' });
      expect(result).toMatchObject({ ok: false, error: { code: 'untrusted-sender' } });
      expect(await handlers.get(channel)!(ipcEvent('https://evil.example/'), { base64: pdfBase64, fileName: 'x' }))
        .toMatchObject({ ok: false, error: { code: 'untrusted-sender' } });
    }
    expect(previews.preview).not.toHaveBeenCalled();
    expect(previews.save).not.toHaveBeenCalled();
  });

  it('validates before previewing or saving', async () => {
    const { handlers, previews } = setup();
    expect(await handlers.get('pdf:preview')!(trusted, { base64: '', fileName: 'x' })).toMatchObject({ ok: false, error: { path: 'base64' } });
    expect(previews.preview).not.toHaveBeenCalled();
    expect(await handlers.get('pdf:preview')!(trusted, { base64: pdfBase64, fileName: 'Q/1' })).toEqual({ ok: true, value: { opened: true } });
    expect(previews.preview).toHaveBeenCalledWith(expect.objectContaining({ fileName: 'Q-1.pdf', bytes: expect.any(Buffer) }));
    expect(await handlers.get('pdf:save')!(trusted, { base64: pdfBase64, fileName: 'Q-1' })).toEqual({ ok: true, value: { saved: '/tmp/Q-1.pdf' } });
  });
});
