import type { z } from 'zod';
import type { ApiResult, Contract, MethodOutput } from '../../core/api';
import type { StoreInfo, storeMethods } from '../../core/api/store';
import type { OpenOptions, Store } from '../../db';
import type { StoreChoiceKeeper } from '../host/store-choice';
import {
  addAttachment, createJob, openPgStore, exportJobs, findJobs, getAttachment, getJob, getQuote, getSettings,
  importJobs, jobRevisions, keepWorkingRevision, reindexJobs, listAttachments, listCustomers, listJobs, listQuotes, restoreRevision,
  saveCustomer, saveSettings, setJobStatus, similarJobs, updateJob, copyJob, archiveJob, deleteJob, undoDeleteJob, StoreError,
} from '../../db';

/** Issuing a quote prices the job: the document handlers answer it. */
type StoreMethodName = Exclude<keyof typeof storeMethods, 'issueQuote'>;

/** Handlers checked against the contract: each takes its method's parsed input and returns its output type. */
export type TypedHandlers<K extends keyof Contract> = {
  [P in K]: (input: z.output<Contract[P]['input']>) => ApiResult<MethodOutput<Contract[P]>> | Promise<ApiResult<MethodOutput<Contract[P]>>>;
};

/** The store the handlers work on; restore swaps it for the restored one. */
export interface StoreContext {
  store: Store;
  openOptions?: OpenOptions;
  /** Where the desktop app or the browser host remembers the store chosen on the Data screen; none on the command line. */
  choice?: StoreChoiceKeeper | undefined;
}

const success = <T>(value: T): ApiResult<T> => ({ ok: true, value });

export function storeInfo(store: Store, choice?: StoreChoiceKeeper): StoreInfo {
  return {
    backend: store.dialect, name: store.file, author: store.author, readOnly: store.readOnly ?? null, changeMark: store.changeMark(),
    nextStart: choice?.remembered() ?? null,
  };
}

export function storeHandlers(ctx: StoreContext): TypedHandlers<StoreMethodName> {
  return {
    createJob: (input) => createJob(ctx.store, input),
    updateJob: (input) => updateJob(ctx.store, input),
    getJob: (input) => getJob(ctx.store, input),
    listJobs: (input) => listJobs(ctx.store, input),
    findJobs: (input) => findJobs(ctx.store, input),
    similarJobs: (input) => similarJobs(ctx.store, input),
    jobRevisions: (input) => jobRevisions(ctx.store, input.id),
    restoreRevision: (input) => restoreRevision(ctx.store, input),
    keepWorkingRevision: (input) => keepWorkingRevision(ctx.store, input),
    setJobStatus: (input) => setJobStatus(ctx.store, input),
    copyJob: (input) => copyJob(ctx.store, input.id),
    archiveJob: (input) => archiveJob(ctx.store, input),
    deleteJob: (input) => deleteJob(ctx.store, input.id),
    undoDeleteJob: (input) => undoDeleteJob(ctx.store, input.id),
    listCustomers: () => ({ ok: true, value: listCustomers(ctx.store) }),
    saveCustomer: (input) => saveCustomer(ctx.store, input),
    getSettings: () => getSettings(ctx.store),
    saveSettings: (input) => saveSettings(ctx.store, input.settings),
    listQuotes: (input) => listQuotes(ctx.store, input),
    getQuote: (input) => getQuote(ctx.store, input),
    addAttachment: (input) => addAttachment(ctx.store, input),
    listAttachments: (input) => listAttachments(ctx.store, input.jobId),
    getAttachment: (input) => getAttachment(ctx.store, input.id),
    exportJobs: (input) => exportJobs(ctx.store, input),
    importJobs: (input) => importJobs(ctx.store, input),
    reindexJobs: (input) => reindexJobs(ctx.store, input),
    storeInfo: () => success(storeInfo(ctx.store, ctx.choice)),
    signIn: (input) => {
      ctx.store.author = input.name;
      return success(storeInfo(ctx.store, ctx.choice));
    },
    openServerStore: (input) => {
      const opened = openPgStore(input.connection, { author: ctx.store.author, ...(ctx.openOptions?.clock ? { clock: ctx.openOptions.clock } : {}) });
      ctx.store.close();
      ctx.store = opened;
      // Opened first, remembered after: a string that does not connect is never kept for the next start.
      try {
        ctx.choice?.remember(input.connection);
      } catch (e) {
        const why = e instanceof StoreError ? e.message : String(e);
        return { ok: false, error: { code: 'store-choice-not-saved', message: `${opened.file} is open now, but the next start cannot open it again: ${why}`, path: 'connection' } };
      }
      return success(storeInfo(opened, ctx.choice));
    },
    forgetServerStore: () => {
      ctx.choice?.forget();
      return success(storeInfo(ctx.store, ctx.choice));
    },
  };
}
