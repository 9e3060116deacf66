import { engineMethods } from './engine';
import { storeMethods } from './store';
import { shopMethods } from './shop';
import { documentMethods } from './documents';
import { firstOffMethods } from './first-off';
import { designMethods } from './design';
import { requestSheetMethods } from './request-sheet';
import type { MethodInput, MethodOutput, ApiResult } from './contract';

export * from './contract';
export * from './store';
export type { PrintedPdf } from './documents';
export type { JobCostReview } from './shop';
export * from './first-off';
export * from './request-sheet';

/** The one contract: every method the app, the web transport and the CLI reach, with its input schema. */
export const contract = {
  ...engineMethods,
  ...storeMethods,
  ...shopMethods,
  ...documentMethods,
  ...firstOffMethods,
  ...designMethods,
  ...requestSheetMethods,
};

export type Contract = typeof contract;
export type MethodName = keyof Contract;

/** The API as the renderer sees it, whatever carries it (IPC, HTTP, in-process). */
export type Api = {
  [K in MethodName]: (input: MethodInput<Contract[K]>) => Promise<ApiResult<MethodOutput<Contract[K]>>>;
};

export const methodNames = Object.keys(contract) as MethodName[];
