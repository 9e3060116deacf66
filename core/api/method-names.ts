/**
 * The plain lists the sandboxed preload builds its bridge from. The preload cannot load npm packages, so
 * this file imports nothing at run time (types only): no zod, no contract objects.
 */
import type { Api, MethodName } from './index';
import type { ApiResult } from './contract';
import type { RequestSheet } from '../request-sheet/preview';
import type { JobStatus } from './store-schemas';

/** Every contract method, in the contract's order (a test holds this equal to Object.keys(contract)). */
export const apiMethodNames = [
  'calculate', 'listGrades',
  'createJob', 'updateJob', 'getJob', 'listJobs', 'findJobs', 'similarJobs', 'jobRevisions', 'restoreRevision', 'keepWorkingRevision',
  'setJobStatus', 'copyJob', 'archiveJob', 'deleteJob', 'undoDeleteJob', 'listCustomers', 'saveCustomer', 'getSettings', 'saveSettings', 'issueQuote', 'listQuotes', 'getQuote',
  'addAttachment', 'listAttachments', 'getAttachment', 'exportJobs', 'importJobs', 'reindexJobs', 'storeInfo', 'signIn', 'openServerStore', 'forgetServerStore',
  'manufacturingPlan', 'costEstimate', 'jobCostChanges', 'acceptJobCost', 'printTraveller', 'printQuote', 'reprintQuote',
  'recordFirstOff', 'listFirstOff', 'setCalibration',
  'designSprings', 'adoptDesign', 'jobRequirement',
  'readRequestSheet', 'previewRequestSheet', 'importRequestSheet', 'listEnquiries', 'enquiryJobs',
] as const;

type Listed = (typeof apiMethodNames)[number];
type SameNames = [MethodName] extends [Listed] ? ([Listed] extends [MethodName] ? true : false) : false;
const namesMatchContract: SameNames = true;
void namesMatchContract;

/** The IPC channel of one API method; prefixed so no method can collide with the shell's own channels. */
export const apiChannel = (name: string): string => `api:${name}`;

export const MENU_COMMAND_CHANNEL = 'menu-command';
export const PDF_PREVIEW_CHANNEL = 'pdf:preview';
export const PDF_SAVE_CHANNEL = 'pdf:save';
export const DATA_ACTION_CHANNEL = 'data:action';
/** Main to the window: how far the data action running in main is, then how it ended. */
export const DATA_PROGRESS_CHANNEL = 'data:progress';
/** The window asks main to stop the data action it names (backup, export or import; a restore runs to its end). */
export const DATA_CANCEL_CHANNEL = 'data:cancel';
/** The desktop shell's open dialog for a request sheet: main reads the file chosen and answers with its cells. */
export const REQUEST_SHEET_CHANNEL = 'file:request-sheet';

/**
 * What the window may ask the shell to do with files, by name only: main shows the file dialog, asks
 * before a restore, and runs it. The window never sees or gives a path.
 */
export const dataActionNames = ['backup', 'restore', 'importJobs', 'exportJobs'] as const;
export type DataActionName = (typeof dataActionNames)[number];

/** The actions a Cancel can stop: each leaves nothing behind when stopped (no file, no imported job). */
export const cancellableDataActions = ['backup', 'exportJobs', 'importJobs'] as const;
export type CancellableDataAction = (typeof cancellableDataActions)[number];

/** What a stopped action says, in the app and in a browser alike. */
export const dataActionCancelled: Record<CancellableDataAction, string> = {
  backup: 'Backup cancelled: nothing was saved.',
  exportJobs: 'Export cancelled: nothing was saved.',
  importJobs: 'Import cancelled: nothing was imported.',
};

/**
 * What the window may add to an action's name: choices of the Data screen, never a path (main's dialog
 * chooses the file). `format` only suggests the save dialog's file name; the name chosen decides.
 */
export interface DataActionOptions {
  format?: 'json' | 'csv';
  status?: JobStatus;
  renumber?: boolean;
}

/** Who started an action: the File menu, or a button of the window (which shows its own bar). */
export type DataActionSource = 'menu' | 'window';

/**
 * Main's word to the window about the running data action: how far it is (`total` 0 while it cannot say,
 * as in a restore), then how it ended. Sent at most once per whole percent.
 */
export type DataActionEvent =
  | { action: DataActionName; from: DataActionSource; state: 'running'; done: number; total: number; cancellable: boolean }
  | { action: DataActionName; from: DataActionSource; state: 'ended'; outcome: DataActionOutcome['outcome']; message: string };

/**
 * How an action ended: done or failed (main's dialog said so too), cancelled by the user part way,
 * or not started (a dialog was dismissed, or another data action was running).
 */
export interface DataActionOutcome {
  outcome: 'done' | 'failed' | 'cancelled' | 'not-started';
  message: string;
}

/** What the menu asks the renderer to do. Backup, restore, import and export run in main; then 'data-changed'. */
export const menuCommands = [
  'new-job', 'open-job', 'find-similar', 'save', 'undo', 'redo', 'print-quote', 'print-traveller', 'settings', 'data-changed',
] as const;
export type MenuCommand = (typeof menuCommands)[number];

/** A finished PDF from a document method, as it crosses the bridge. */
export interface PdfFile {
  base64: string;
  fileName: string;
}

/** `window.coilwright` in the desktop app: the API, menu commands and PDF handling, nothing else. */
export interface CoilwrightBridge {
  api: Api;
  /** Calls back with each menu command; returns the function that stops listening. */
  onMenuCommand(callback: (command: MenuCommand) => void): () => void;
  previewPdf(file: PdfFile): Promise<ApiResult<{ opened: true }>>;
  /** Asks where to save; `saved` is null when the user cancelled. */
  savePdf(file: PdfFile): Promise<ApiResult<{ saved: string | null }>>;
  /** Runs a File-menu data action in main (its dialogs and confirmation included); resolves when it is over. */
  runDataAction(name: DataActionName, options?: DataActionOptions): Promise<ApiResult<{ finished: DataActionName } & DataActionOutcome>>;
  /** Calls back with main's progress and end of each data action; returns the function that stops listening. */
  onDataProgress(callback: (event: DataActionEvent) => void): () => void;
  /** Stops the named action if it is running; `cancelled` is false when it was not (or had just ended). */
  cancelDataAction(name: CancellableDataAction): Promise<ApiResult<{ cancelled: boolean }>>;
  /** Shows main's open dialog for a request sheet and reads the file chosen; null when the user cancelled. */
  openRequestSheet(): Promise<ApiResult<RequestSheet | null>>;
}
