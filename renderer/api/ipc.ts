import type { Api, ApiResult } from '../../core/api';
import { methodNames } from '../../core/api';
import type { ShellBridge } from './bridge';
import { shellBridge } from './bridge';
import { isApiResult, transportFailure } from './result';

/** The API over Electron IPC, through the one function per method the preload exposes. */
export function createIpcApi(bridge: ShellBridge | undefined = shellBridge()): Api {
  const call = async (name: string, input: unknown): Promise<ApiResult<unknown>> => {
    const fn = (bridge?.api as unknown as Record<string, ((input: unknown) => Promise<unknown>) | undefined> | undefined)?.[name];
    if (typeof fn !== 'function') return transportFailure(`The desktop shell does not offer "${name}".`);
    try {
      const result = await fn(input ?? {});
      return isApiResult(result) ? result : transportFailure(`"${name}" came back without a result.`);
    } catch (e) {
      return transportFailure(`"${name}" failed in the desktop shell: ${(e as Error).message}`);
    }
  };
  return Object.fromEntries(methodNames.map((name) => [name, (input: unknown) => call(name, input)])) as unknown as Api;
}
