import type { Api, ApiResult } from '../../core/api';
import { methodNames } from '../../core/api';
import { isApiResult, transportFailure } from './result';

/** The API over the loopback web transport: POST /api/<method>, the session cookie set by the page URL. */
export function createHttpApi(base = ''): Api {
  const call = async (name: string, input: unknown): Promise<ApiResult<unknown>> => {
    let response: Response;
    try {
      response = await fetch(`${base}/api/${name}`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify(input ?? {}),
        credentials: 'same-origin',
      });
    } catch (e) {
      return transportFailure(`No answer from the Coilwright service (${(e as Error).message}). Is it still running?`);
    }
    let body: unknown;
    try {
      body = await response.json();
    } catch {
      return transportFailure(`The service answered ${response.status} ${response.statusText} without a result.`);
    }
    return isApiResult(body) ? body : transportFailure(`The service answered ${response.status} with something that is not a result.`);
  };
  return Object.fromEntries(methodNames.map((name) => [name, (input: unknown) => call(name, input)])) as unknown as Api;
}
