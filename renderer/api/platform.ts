import type { ApiResult, RequestSheet } from '../../core/api';
import { shellBridge } from './bridge';
import { createStoreFiles } from './store-files';
import type { StoreFiles } from './store-files';

/** Everything the UI needs from the page or the shell besides the API; the screens never reach for globals. */
export interface Platform {
  /** Offers bytes (base64) or text as a file to keep. */
  saveFile(file: { fileName: string; mimeType: string; text?: string; base64?: string }): void;
  /** Shows a PDF: the shell's preview window in the app (or its save dialog if the preview fails), a download in a browser. */
  showPdf(file: { base64: string; fileName: string }): void;
  /** While `pending()` is true, closing or reloading the window asks first. Returns the remover. */
  guardUnload(pending: () => boolean): () => void;
  /** Keys pressed anywhere in the window. Returns the remover. */
  onKey(listener: (event: KeyboardEvent) => void): () => void;
  /** Commands from the application menu (desktop only). Returns the remover. */
  onMenuCommand(listener: (command: string) => void): () => void;
  readText(file: File): Promise<string>;
  readDataUrl(file: File): Promise<string>;
  /**
   * The desktop shell's open dialog for a request sheet (main reads the file and answers with its cells;
   * null when cancelled). Absent in a browser, where the page uploads the file the user picked.
   */
  openRequestSheet?: () => Promise<ApiResult<RequestSheet | null>>;
  /** Whether the desktop shell (rather than a browser tab) carries the UI. */
  desktop: boolean;
  /** Backup and restore of the whole store, without the page naming a file. */
  storeFiles: StoreFiles;
}

function bytesOf(base64: string): Uint8Array<ArrayBuffer> {
  const binary = atob(base64);
  const out = new Uint8Array(binary.length);
  for (let i = 0; i < binary.length; i++) out[i] = binary.charCodeAt(i);
  return out;
}

function download(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  a.rel = 'noopener';
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}

export function createPlatform(): Platform {
  const bridge = shellBridge();
  return {
    desktop: bridge !== undefined,
    ...(bridge ? { openRequestSheet: () => bridge.openRequestSheet() } : {}),
    storeFiles: createStoreFiles(bridge, download),
    saveFile({ fileName, mimeType, text, base64 }) {
      const body = base64 !== undefined ? bytesOf(base64) : (text ?? '');
      download(new Blob([body], { type: mimeType }), fileName);
    },
    showPdf({ base64, fileName }) {
      if (bridge) {
        void bridge.previewPdf({ base64, fileName }).then((r) => (r.ok ? undefined : bridge.savePdf({ base64, fileName })));
        return;
      }
      download(new Blob([bytesOf(base64)], { type: 'application/pdf' }), fileName);
    },
    guardUnload(pending) {
      const listener = (event: BeforeUnloadEvent) => {
        if (!pending()) return;
        event.preventDefault();
        // Chromium still needs returnValue set to show its prompt.
        event.returnValue = '';
      };
      window.addEventListener('beforeunload', listener);
      return () => window.removeEventListener('beforeunload', listener);
    },
    onKey(listener) {
      window.addEventListener('keydown', listener);
      return () => window.removeEventListener('keydown', listener);
    },
    onMenuCommand(listener) {
      return bridge ? bridge.onMenuCommand(listener) : () => undefined;
    },
    readText: (file) => file.text(),
    readDataUrl: (file) => new Promise((resolve, reject) => {
      const reader = new FileReader();
      reader.onload = () => resolve(String(reader.result));
      reader.onerror = () => reject(reader.error ?? new Error('the file could not be read'));
      reader.readAsDataURL(file);
    }),
  };
}

/** The element index.html gives the app to render into. */
export function mountPoint(): HTMLElement {
  const root = document.getElementById('root');
  if (!root) throw new Error('index.html has no #root element');
  return root;
}
